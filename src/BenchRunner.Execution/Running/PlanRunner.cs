using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Execution.Bench;
using BenchRunner.Execution.LimitRecords;
using BenchRunner.Execution.Plans;
using BenchRunner.Instruments.Adapters;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Connections;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Profiles;
using BenchRunner.Instruments.Resilience;
using BenchRunner.Execution.Events;
using BenchRunner.Core.Runs;

namespace BenchRunner.Execution.Running;

/// <summary>
/// Carries out a validated plan on a bench: connects the roles the plan needs (each behind the
/// resilience rules), runs the steps in order, commits every sweep the moment it is acquired,
/// evaluates every check, and gives the verdict. Before every generator level it enforces the
/// bench's declared safety limits. Cancellation stops cleanly: the run is marked stopped and
/// everything acquired so far is kept.
/// </summary>
public sealed partial class PlanRunner
{
    /// <summary>What a stopped run records as why, unless its <see cref="RunContext.StopReason"/> says otherwise.</summary>
    public const string StoppedByOperator = "stopped by the operator";

    /// <summary>The caution shown with every refused setting.</summary>
    public const string InputCaution =
        "Never exceed an analyser input's maximum level: add attenuation or lower the level, and use a DC block where DC may be present.";

    private readonly BenchDefinition _bench;
    private readonly TransportFactory _transports;
    private readonly TimeProvider _time;
    private readonly InstrumentResilienceOptions _resilience;

    /// <summary>Creates a runner for <paramref name="bench"/>.</summary>
    /// <param name="bench">The bench the plan runs on.</param>
    /// <param name="transports">Creates the connections the bench names (with <c>sim:</c> registered for the virtual bench).</param>
    /// <param name="time">The clock for waits, timeouts and timestamps.</param>
    /// <param name="resilience">Timeouts, retries and breaker; defaults when null.</param>
    public PlanRunner(BenchDefinition bench, TransportFactory transports, TimeProvider? time = null, InstrumentResilienceOptions? resilience = null)
    {
        _bench = bench ?? throw new ArgumentNullException(nameof(bench));
        _transports = transports ?? throw new ArgumentNullException(nameof(transports));
        _time = time ?? TimeProvider.System;
        _resilience = resilience ?? new InstrumentResilienceOptions();
    }

    /// <summary>The bench the runner runs on.</summary>
    public BenchDefinition Bench => _bench;

    /// <summary>
    /// Runs <paramref name="plan"/>, publishing every event into <paramref name="events"/>, and returns how it ended;
    /// instrument failures end it with <see cref="RunStatus.Error"/>. The outcome's run id is null: ids belong to the recorder.
    /// </summary>
    public Task<RunOutcome> RunAsync(TestPlan plan, RunContext context, RunEventPipeline events, CancellationToken cancellationToken) =>
        RunCoreAsync(plan, context, events, again: null, cancellationToken);

    /// <summary>
    /// Runs <paramref name="plan"/> as one run of many passes: the steps before its first sweep (or overload check, or
    /// repeat block) once, then the remaining steps again and again while <paramref name="again"/>,
    /// called after each pass with what the pass acquired and judged, returns true. Every sweep and check
    /// of every pass belongs to the one run; the verdict is that of the last pass.
    /// </summary>
    public Task<RunOutcome> RunRepeatedlyAsync(TestPlan plan, RunContext context, RunEventPipeline events,
        Func<RunPass, CancellationToken, ValueTask<bool>> again, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(again);
        return RunCoreAsync(plan, context, events, again, cancellationToken);
    }

    private async Task<RunOutcome> RunCoreAsync(TestPlan plan, RunContext context, RunEventPipeline events,
        Func<RunPass, CancellationToken, ValueTask<bool>>? again, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(context);
        ArgumentNullException.ThrowIfNull(events);
        using var state = new RunState(events, _time, cancellationToken, context.StopAtNextStep);
        try
        {
            await state.EmitAsync(now => new RunStarted(now, Header(plan, context))).ConfigureAwait(false);
            foreach (var role in plan.Roles)
            {
                await ConnectAsync(role.Role, state, cancellationToken).ConfigureAwait(false);
            }

            int once = again is null ? 0 : OnceStepCount(plan.Steps);
            await RunStepsAsync([.. plan.Steps.Take(once)], state).ConfigureAwait(false);
            IReadOnlyList<PlanStep> body = [.. plan.Steps.Skip(once)];
            int pass = 0, passStart;
            bool more;
            do
            {
                passStart = state.Checks.Count;
                state.PassTraces = [];
                pass++;
                await RunStepsAsync(body, state).ConfigureAwait(false);
                more = again is not null
                    && await again(new RunPass(pass, state.PassTraces, [.. state.Checks.Skip(passStart)]), cancellationToken).ConfigureAwait(false);
                state.Gentle.ThrowIfCancellationRequested();
            }
            while (more);

            var status = state.Checks.Skip(passStart).All(c => c.Passed) ? RunStatus.Passed : RunStatus.Failed;
            return await FinishAsync(state, status, null).ConfigureAwait(false);
        }
        catch (OperationCanceledException) when (state.Stopping)
        {
            var reason = context.StopReason?.Invoke() is { } r && !string.IsNullOrWhiteSpace(r) ? r : StoppedByOperator;
            return await FinishAsync(state, RunStatus.Stopped, reason).ConfigureAwait(false);
        }
        catch (RunListenerFailedException ex)
        {
            // The recorder is gone, so the end cannot be recorded; the next opening of the store marks the run interrupted.
            return new RunOutcome(null, RunStatus.Error, state.Checks, ex.Message);
        }
        catch (Exception ex) when (ex is InstrumentException or SafetyRefusedException or IOException)
        {
            return await FinishAsync(state, RunStatus.Error, ex.Message).ConfigureAwait(false);
        }
        finally
        {
            foreach (var instrument in state.Instruments.Values)
            {
                await instrument.DisposeAsync().ConfigureAwait(false);
            }
        }
    }

    private RunHeader Header(TestPlan plan, RunContext context) =>
        new(context.Mode, plan.Name, context.PlanText, context.SoftwareVersion, context.Host)
        {
            BenchName = _bench.Name,
            BenchText = context.BenchText,
            Operator = context.Operator,
            DutSerial = context.DutSerial,
            Lot = context.Lot,
            IsRetest = context.IsRetest,
            LimitsJson = PlanLimits.From(plan).ToRunJson(),
        };

    private static int OnceStepCount(IReadOnlyList<PlanStep> steps)
    {
        int first = steps.ToList().FindIndex(s => s is SweepStep or RepeatStep or OverloadCheckStep);
        return first < 0 ? 0 : first;
    }

    private static async Task<RunOutcome> FinishAsync(RunState state, RunStatus status, string? error)
    {
        try
        {
            await state.EmitAsync(now => new RunEnded(now, status, error)).ConfigureAwait(false);
        }
        catch (RunListenerFailedException ex)
        {
            return new RunOutcome(null, RunStatus.Error, state.Checks, ex.Message);
        }

        return new RunOutcome(null, status, state.Checks, error);
    }

    private async Task ConnectAsync(string role, RunState state, CancellationToken cancellationToken)
    {
        var declared = _bench.Instruments[role];
        var instrument = new ResilientInstrument(role,
            () => InstrumentAdapterFactory.Create(role, declared.Profile, declared.Connection, _transports, time: _time),
            _resilience, _time, _bench.Kinds);
        state.Instruments[role] = instrument;
        await instrument.ConnectAsync(cancellationToken).ConfigureAwait(false);
        var id = instrument.Identity;
        await state.EmitAsync(now => new InstrumentConnected(now, role, declared.Kind.Word, id.Maker, id.Model, id.Serial, id.Firmware)
        {
            Connection = declared.Connection.ToString(),
            CompensationJson = _bench.CompensationOf(role)?.ToJson(),
        }).ConfigureAwait(false);
    }

    private async Task RunStepsAsync(IReadOnlyList<PlanStep> steps, RunState state)
    {
        foreach (var step in steps)
        {
            // A gentle stop takes effect here, between steps: a step that drives an instrument has finished.
            state.Hard.ThrowIfCancellationRequested();
            state.Gentle.ThrowIfCancellationRequested();
            var name = step.Name ?? step.Word;
            await state.EmitAsync(now => new StepStarted(now, name, step.Word, step.Kind.DrivesInstrument)).ConfigureAwait(false);
            await RunStepAsync(step, name, state, step.Kind.DrivesInstrument ? state.Hard : state.Either).ConfigureAwait(false);
            await state.EmitAsync(now => new StepEnded(now, name, step.Word)).ConfigureAwait(false);
        }
    }

    private async Task RunStepAsync(PlanStep step, string name, RunState state, CancellationToken cancellationToken)
    {
        switch (step)
        {
            case NetworkAnalyserSetup na:
                await Capability<INetworkAnalyser>(state, na.Role).ConfigureSweepAsync(
                    new NetworkSweep(na.Start, na.Stop, na.Points, na.IfBandwidth), cancellationToken).ConfigureAwait(false);
                break;
            case SpectrumAnalyserSetup sa:
                await Capability<ISpectrumAnalyser>(state, sa.Role).ConfigureAsync(state.SpectrumSettings[sa.Role] = new SpectrumSettings(
                    FrequencyRange.Between(sa.Start, sa.Stop),
                    sa.Rbw ?? Frequency.FromKilohertz(10),
                    sa.Attenuation ?? Ratio.FromDecibels(10),
                    sa.ReferenceLevel ?? Level.FromDbm(0)), cancellationToken).ConfigureAwait(false);
                break;
            case GeneratorSetup gen:
                await SetGeneratorAsync(gen, state, cancellationToken).ConfigureAwait(false);
                break;
            case SweepStep sweep:
                await SweepAsync(sweep, name, state, cancellationToken).ConfigureAwait(false);
                break;
            case MaskCheck mask:
                await CheckMaskAsync(mask, name, state).ConfigureAwait(false);
                break;
            case FigureCheck figures:
                foreach (var limit in figures.Limits)
                {
                    await state.RecordAsync(CheckJudge.Figure(figures.Trace, limit, name, state.Traces[figures.Trace].Figures) with { Trace = figures.Trace })
                        .ConfigureAwait(false);
                }

                break;
            case WaitStep wait:
                await Task.Delay(wait.Duration, _time, cancellationToken).ConfigureAwait(false);
                break;
            case MessageStep message:
                await state.EmitAsync(now => new OperatorMessage(now, message.Text)).ConfigureAwait(false);
                break;
            case OverloadCheckStep overload:
                await CheckOverloadAsync(overload, name, state, cancellationToken).ConfigureAwait(false);
                break;
            case RepeatStep repeat:
                await RepeatAsync(repeat, name, state).ConfigureAwait(false);
                break;
            case IInstrumentStep custom:
                await custom.RunAsync(new StepServices(name, state, this), cancellationToken).ConfigureAwait(false);
                break;
            default:
                throw new NotSupportedException($"{step.Location}: the runner cannot carry out a \"{step.Word}\" step.");
        }
    }

    private async Task RepeatAsync(RepeatStep repeat, string name, RunState state)
    {
        int limit = repeat.Times ?? repeat.AtMost;
        for (int pass = 1; pass <= limit; pass++)
        {
            await RunStepsAsync(repeat.Steps, state).ConfigureAwait(false);
            if (repeat.Until is { } until && until.Limits.All(l => CheckJudge.Figure(until.Trace, l, name, state.Traces[until.Trace].Figures).Passed))
            {
                return;
            }
        }

        if (repeat.Until is { } condition)
        {
            var detail = string.Join(", ", condition.Limits.Select(l => l.Key));
            await state.RecordAsync(new CheckResult(name, $"repeat until {detail} of {condition.Trace}", false,
                $"the condition did not hold within {limit} passes", null, null)).ConfigureAwait(false);
        }
    }

    private async Task SetGeneratorAsync(GeneratorSetup step, RunState state, CancellationToken cancellationToken)
    {
        var generator = Capability<ISignalGenerator>(state, step.Role);
        if (step.Level is { } level)
        {
            EnforceInputLimits(step.Role, level);
        }

        if (step.Output == false)
        {
            await generator.SetOutputAsync(false, cancellationToken).ConfigureAwait(false);
        }

        if (step.Frequency is { } frequency) await generator.SetFrequencyAsync(frequency, cancellationToken).ConfigureAwait(false);
        if (step.Level is { } l) await generator.SetLevelAsync(l, cancellationToken).ConfigureAwait(false);
        if (step.Output == true) await generator.SetOutputAsync(true, cancellationToken).ConfigureAwait(false);
    }

    private void EnforceInputLimits(string generatorRole, Level level)
    {
        foreach (var path in _bench.PathsFrom(generatorRole))
        {
            if (!_bench.Instruments.TryGetValue(path.To, out var receiver))
            {
                continue;
            }

            var maximum = receiver.MaxInputLevel ?? receiver.Profile?.Limits.MaxInputLevel;
            var arriving = ArrivingLevel(level, path);
            if (maximum is { } max && arriving > max)
            {
                throw new SafetyRefusedException(
                    $"refused: {generatorRole} level {level} through {path.Label} ({path.Gain}){CompensationNote(path.To)} reaches {arriving} at {path.To}, above its declared maximum input of {max}. {InputCaution}");
            }
        }
    }

    private async Task SweepAsync(SweepStep step, string name, RunState state, CancellationToken cancellationToken)
    {
        var instrument = state.Instruments[step.Role];
        if (instrument.GetCapability<INetworkAnalyser>() is { } vna)
        {
            var traces = await vna.AcquireAsync(step.Traces.Select(t => t.Quantity).ToList(), cancellationToken).ConfigureAwait(false);
            for (int i = 0; i < traces.Count; i++)
            {
                await KeepAsync(step.Role, step.Traces[i].Name, traces[i], FigureSummary.ForFilter(traces[i]), name, state).ConfigureAwait(false);
            }
        }
        else
        {
            var raw = await Capability<ISpectrumAnalyser>(state, step.Role).AcquireAsync(cancellationToken).ConfigureAwait(false);
            var (power, compensation, flags) = await CompensateAsync(step.Role, raw, state).ConfigureAwait(false);
            await KeepAsync(step.Role, step.Traces.Single().Name, power, FigureSummary.ForSpectrum(power), name, state, flags, compensation).ConfigureAwait(false);
        }
    }

    private ValueTask KeepAsync(string role, string traceName, Trace trace, IReadOnlyList<NamedFigure> figures, string step, RunState state,
        SweepFlags flags = SweepFlags.None, string? compensation = null)
    {
        state.Traces[traceName] = (trace, figures);
        state.PassTraces[traceName] = (trace, figures);
        state.OverloadedTraces.Remove(traceName);
        return state.EmitAsync(now => new SweepAcquired(now, role, traceName, trace, figures)
        {
            Step = step,
            Flags = flags,
            Compensation = compensation,
        });
    }

    private ValueTask CheckMaskAsync(MaskCheck step, string name, RunState state)
    {
        var (trace, _) = state.Traces[step.Trace];
        var (result, worstAt) = CheckJudge.Mask(step, name, trace);
        return state.RecordAsync(result with { Kind = CheckKind.Mask, Trace = step.Trace, WorstAt = worstAt });
    }

    internal static T Capability<T>(RunState state, string role) where T : class =>
        state.Instruments[role].GetCapability<T>()
        ?? throw new InstrumentException($"the instrument's profile gives it no {typeof(T).Name[1..]} capability", isTransient: false) { Instrument = role };
}
