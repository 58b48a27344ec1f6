using System.Globalization;
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
using BenchRunner.Storage;

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
    private readonly ResultStore? _store;
    private readonly TimeProvider _time;
    private readonly InstrumentResilienceOptions _resilience;

    /// <summary>Creates a runner for <paramref name="bench"/>.</summary>
    /// <param name="bench">The bench the plan runs on.</param>
    /// <param name="transports">Creates the connections the bench names (with <c>sim:</c> registered for the virtual bench).</param>
    /// <param name="store">Where runs are recorded, or null to record nothing.</param>
    /// <param name="time">The clock for waits, timeouts and timestamps.</param>
    /// <param name="resilience">Timeouts, retries and breaker; defaults when null.</param>
    public PlanRunner(BenchDefinition bench, TransportFactory transports, ResultStore? store = null,
        TimeProvider? time = null, InstrumentResilienceOptions? resilience = null)
    {
        _bench = bench ?? throw new ArgumentNullException(nameof(bench));
        _transports = transports ?? throw new ArgumentNullException(nameof(transports));
        _store = store;
        _time = time ?? TimeProvider.System;
        _resilience = resilience ?? new InstrumentResilienceOptions();
    }

    /// <summary>Runs <paramref name="plan"/> and returns how it ended; instrument failures end it with <see cref="RunStatus.Error"/>.</summary>
    public Task<RunOutcome> RunAsync(TestPlan plan, RunContext context, IRunObserver? observer, CancellationToken cancellationToken) =>
        RunCoreAsync(plan, context, observer, again: null, cancellationToken);

    /// <summary>
    /// Runs <paramref name="plan"/> as one run of many passes: the steps before its first sweep (or overload check, or
    /// repeat block) once, then the remaining steps again and again while <paramref name="again"/>,
    /// called after each pass with the pass number (1, 2, ...), returns true. Every sweep and check
    /// of every pass is recorded in the one run; the verdict is that of the last pass.
    /// </summary>
    public Task<RunOutcome> RunRepeatedlyAsync(TestPlan plan, RunContext context, IRunObserver? observer,
        Func<int, CancellationToken, ValueTask<bool>> again, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(again);
        return RunCoreAsync(plan, context, observer, again, cancellationToken);
    }

    private async Task<RunOutcome> RunCoreAsync(TestPlan plan, RunContext context, IRunObserver? observer,
        Func<int, CancellationToken, ValueTask<bool>>? again, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(context);
        var state = new RunState(observer ?? NullObserver.Instance, _time);
        long? runId = _store?.StartRun(new RunRecord(context.Mode, plan.Name, context.PlanText, context.SoftwareVersion, context.Host)
        {
            BenchName = _bench.Name,
            BenchText = context.BenchText,
            Operator = context.Operator,
            DutSerial = context.DutSerial,
            Lot = context.Lot,
            IsRetest = context.IsRetest,
            ExtraJson = PlanLimits.From(plan).ToRunJson(),
        });
        state.RunId = runId;
        state.Emit(now => new RunStarted(now, runId, plan.Name));
        try
        {
            foreach (var role in plan.Roles)
            {
                await ConnectAsync(role.Role, state, cancellationToken).ConfigureAwait(false);
            }

            int once = again is null ? 0 : OnceStepCount(plan.Steps);
            await RunStepsAsync([.. plan.Steps.Take(once)], state, cancellationToken).ConfigureAwait(false);
            IReadOnlyList<PlanStep> body = [.. plan.Steps.Skip(once)];
            int pass = 0, passStart;
            do
            {
                passStart = state.Checks.Count;
                pass++;
                await RunStepsAsync(body, state, cancellationToken).ConfigureAwait(false);
            }
            while (again is not null && await again(pass, cancellationToken).ConfigureAwait(false));

            var status = state.Checks.Skip(passStart).All(c => c.Passed) ? RunStatus.Passed : RunStatus.Failed;
            return Finish(state, status, null);
        }
        catch (OperationCanceledException) when (cancellationToken.IsCancellationRequested)
        {
            return Finish(state, RunStatus.Stopped, context.StopReason?.Invoke() is { } reason && !string.IsNullOrWhiteSpace(reason) ? reason : StoppedByOperator);
        }
        catch (Exception ex) when (ex is InstrumentException or SafetyRefusedException or IOException)
        {
            return Finish(state, RunStatus.Error, ex.Message);
        }
        finally
        {
            foreach (var instrument in state.Instruments.Values)
            {
                await instrument.DisposeAsync().ConfigureAwait(false);
            }
        }
    }

    private static int OnceStepCount(IReadOnlyList<PlanStep> steps)
    {
        int first = steps.ToList().FindIndex(s => s is SweepStep or RepeatStep or OverloadCheckStep);
        return first < 0 ? 0 : first;
    }

    private RunOutcome Finish(RunState state, RunStatus status, string? error)
    {
        if (state.RunId is { } id)
        {
            _store!.FinishRun(id, status, error);
        }

        return new RunOutcome(state.RunId, status, state.Checks, error);
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
        if (state.RunId is { } runId)
        {
            _store!.AddInstrument(runId, new InstrumentRecord(role, declared.Kind.Word, id.Maker, id.Model, id.Serial, id.Firmware)
            {
                Connection = declared.Connection.ToString(),
                CompensationJson = _bench.CompensationOf(role)?.ToJson(),
            });
        }
    }

    private async Task RunStepsAsync(IReadOnlyList<PlanStep> steps, RunState state, CancellationToken cancellationToken)
    {
        foreach (var step in steps)
        {
            cancellationToken.ThrowIfCancellationRequested();
            var name = step.Name ?? step.Word;
            state.Emit(now => new StepStarted(now, name, step.Word));
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
                    CheckMask(mask, name, state);
                    break;
                case FigureCheck figures:
                    foreach (var limit in figures.Limits)
                    {
                        state.Record(_store, CheckFigure(figures.Trace, limit, name, state), state.SweepIdOf(figures.Trace), trace: figures.Trace);
                    }

                    break;
                case WaitStep wait:
                    await Task.Delay(wait.Duration, _time, cancellationToken).ConfigureAwait(false);
                    break;
                case MessageStep message:
                    state.Emit(now => new OperatorMessage(now, message.Text));
                    break;
                case OverloadCheckStep overload:
                    await CheckOverloadAsync(overload, name, state, cancellationToken).ConfigureAwait(false);
                    break;
                case RepeatStep repeat:
                    await RepeatAsync(repeat, name, state, cancellationToken).ConfigureAwait(false);
                    break;
                default:
                    throw new NotSupportedException($"{step.Location}: the runner cannot carry out a \"{step.Word}\" step.");
            }
        }
    }

    private async Task RepeatAsync(RepeatStep repeat, string name, RunState state, CancellationToken cancellationToken)
    {
        int limit = repeat.Times ?? repeat.AtMost;
        for (int pass = 1; pass <= limit; pass++)
        {
            await RunStepsAsync(repeat.Steps, state, cancellationToken).ConfigureAwait(false);
            if (repeat.Until is { } until && until.Limits.All(l => CheckFigure(until.Trace, l, name, state).Passed))
            {
                return;
            }
        }

        if (repeat.Until is { } condition)
        {
            var detail = string.Join(", ", condition.Limits.Select(l => l.Key));
            state.Record(_store, new CheckResult(name, $"repeat until {detail} of {condition.Trace}", false,
                $"the condition did not hold within {limit} passes", null, null), null);
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
                Keep(step.Role, step.Traces[i].Name, traces[i], FigureSummary.ForFilter(traces[i]), name, state);
            }
        }
        else
        {
            var raw = await Capability<ISpectrumAnalyser>(state, step.Role).AcquireAsync(cancellationToken).ConfigureAwait(false);
            var (power, compensation, flags) = Compensate(step.Role, raw, state);
            Keep(step.Role, step.Traces.Single().Name, power, FigureSummary.ForSpectrum(power), name, state, flags, compensation);
        }
    }

    private void Keep(string role, string traceName, Trace trace, IReadOnlyList<NamedFigure> figures, string step, RunState state,
        SweepFlags flags = SweepFlags.None, string? compensation = null)
    {
        state.Traces[traceName] = (trace, figures);
        state.OverloadedTraces.Remove(traceName);
        if (state.RunId is { } runId)
        {
            state.SweepIds[traceName] = _store!.AddSweep(runId, new SweepRecord(step, trace)
            {
                InstrumentRole = role,
                TraceName = traceName,
                Figures = figures,
                AcquiredUtc = _time.GetUtcNow(),
                Flags = flags,
                Compensation = compensation,
            });
        }

        state.Emit(now => new SweepAcquired(now, role, traceName, trace, figures));
    }

    private void CheckMask(MaskCheck step, string name, RunState state)
    {
        var (trace, _) = state.Traces[step.Trace];
        var evaluation = step.Mask.Evaluate(trace);
        var worst = evaluation.WorstMarginDb is { } w && evaluation.WorstMarginAt is { } at
            ? $"worst margin {w.ToString("+0.00;-0.00", CultureInfo.InvariantCulture)} dB at {at}"
            : "no point under the mask";
        var spans = evaluation.FailingSpans.Count == 0 ? "" : $"; fails {string.Join(", ", evaluation.FailingSpans.Select(s => $"{s.Start} to {s.Stop}"))}";
        var result = new CheckResult(name, $"mask {step.Mask.Name} on {step.Trace}", evaluation.Passed, worst + spans, evaluation.WorstMarginDb, "dB");
        state.Record(_store, result, state.SweepIdOf(step.Trace), evaluation.WorstMarginAt, CheckKind.Mask, step.Trace);
    }

    private static CheckResult CheckFigure(string traceName, FigureLimit limit, string step, RunState state)
    {
        var (_, figures) = state.Traces[traceName];
        var figure = figures.FirstOrDefault(f => f.Key == limit.Key);
        var what = $"{limit.Key} of {traceName}";
        var wanted = Describe(limit);
        if (figure?.Value is not { } value)
        {
            return new CheckResult(step, what, false, $"not available ({figure?.Reason ?? "not computed"}); wanted {wanted}", null, limit.Unit);
        }

        var margins = new List<double>();
        if (limit.Min is { } lo) margins.Add(value - lo);
        if (limit.Max is { } hi) margins.Add(hi - value);
        return new CheckResult(step, what, limit.Passes(value), $"{Format(value, limit.Unit)}; wanted {wanted}",
            margins.Count == 0 ? null : margins.Min(), limit.Unit);
    }

    private static string Describe(FigureLimit limit) => (limit.Min, limit.Max, limit.Target) switch
    {
        ({ } lo, { } hi, { } t) => $"{Format(t, limit.Unit)} ± {Format((hi - lo) / 2, limit.Unit)}",
        ({ } lo, { } hi, null) => $"{Format(lo, limit.Unit)} to {Format(hi, limit.Unit)}",
        ({ } lo, null, _) => $"at least {Format(lo, limit.Unit)}",
        (null, { } hi, _) => $"at most {Format(hi, limit.Unit)}",
        _ => "any value",
    };

    private static string Format(double value, string unit) => unit switch
    {
        "Hz" => Math.Abs(value) >= 1e6 ? $"{(value / 1e6).ToString("0.####", CultureInfo.InvariantCulture)} MHz"
            : Math.Abs(value) >= 1e3 ? $"{(value / 1e3).ToString("0.###", CultureInfo.InvariantCulture)} kHz"
            : $"{value.ToString("0.#", CultureInfo.InvariantCulture)} Hz",
        "" => value.ToString("0.###", CultureInfo.InvariantCulture),
        _ => $"{value.ToString("0.###", CultureInfo.InvariantCulture)} {unit}",
    };

    private static T Capability<T>(RunState state, string role) where T : class =>
        state.Instruments[role].GetCapability<T>()
        ?? throw new InstrumentException($"the instrument's profile gives it no {typeof(T).Name[1..]} capability", isTransient: false) { Instrument = role };
}
