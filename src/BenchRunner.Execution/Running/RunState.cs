using BenchRunner.Core.Figures;
using BenchRunner.Core.Runs;
using BenchRunner.Core.Traces;
using BenchRunner.Execution.Events;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Resilience;

namespace BenchRunner.Execution.Running;

/// <summary>What one run has so far: its instruments, its named traces and their figures, its checks; and where its events go.</summary>
internal sealed class RunState(RunEventPipeline events, TimeProvider time, CancellationToken hard, CancellationToken gentle) : IDisposable
{
    private readonly CancellationTokenSource _either = CancellationTokenSource.CreateLinkedTokenSource(hard, gentle);

    /// <summary>Cuts the run short at once (the operator's Ctrl+C, the end of a stop's bound).</summary>
    public CancellationToken Hard => hard;

    /// <summary>Stops the run at the next step; a step that drives an instrument finishes first.</summary>
    public CancellationToken Gentle => gentle;

    /// <summary>For steps that drive no instrument: either stop ends them at once.</summary>
    public CancellationToken Either => _either.Token;

    public bool Stopping => hard.IsCancellationRequested || gentle.IsCancellationRequested;

    public Dictionary<string, ResilientInstrument> Instruments { get; } = [];

    public Dictionary<string, (Trace Trace, IReadOnlyList<NamedFigure> Figures)> Traces { get; } = [];

    public List<CheckResult> Checks { get; } = [];

    /// <summary>The traces acquired in the current pass, for <see cref="PlanRunner.RunRepeatedlyAsync"/>.</summary>
    public Dictionary<string, (Trace Trace, IReadOnlyList<NamedFigure> Figures)> PassTraces { get; set; } = [];

    /// <summary>The settings last given to each spectrum analyser, by role.</summary>
    public Dictionary<string, SpectrumSettings> SpectrumSettings { get; } = [];

    /// <summary>The traces an overload check found made partly by the analyser itself; checks on them are flagged.</summary>
    public HashSet<string> OverloadedTraces { get; } = [];

    public ValueTask EmitAsync(Func<DateTimeOffset, RunEvent> create) => events.PublishAsync(create(time.GetUtcNow()));

    public ValueTask RecordAsync(CheckResult result)
    {
        // An overload check judges the analyser itself; any other check on a trace it found overloaded is flagged.
        if (result.Kind != CheckKind.Overload && result.Trace is { } trace && OverloadedTraces.Contains(trace))
        {
            result = result with { TraceOverloaded = true, Detail = $"{result.Detail}; {CheckResult.OverloadedNote}" };
        }

        Checks.Add(result);
        return EmitAsync(now => new CheckCompleted(now, result));
    }

    public void Dispose() => _either.Dispose();
}
