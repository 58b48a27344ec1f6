using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Resilience;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;

namespace BenchRunner.Execution.Running;

/// <summary>What one run has so far: its instruments, its named traces and their figures, its checks.</summary>
internal sealed class RunState(IRunObserver observer, TimeProvider time)
{
    public long? RunId { get; set; }

    public Dictionary<string, ResilientInstrument> Instruments { get; } = [];

    public Dictionary<string, (Trace Trace, IReadOnlyList<NamedFigure> Figures)> Traces { get; } = [];

    public Dictionary<string, long> SweepIds { get; } = [];

    public List<CheckResult> Checks { get; } = [];

    /// <summary>The settings last given to each spectrum analyser, by role.</summary>
    public Dictionary<string, SpectrumSettings> SpectrumSettings { get; } = [];

    /// <summary>The traces an overload check found made partly by the analyser itself; checks on them are flagged.</summary>
    public HashSet<string> OverloadedTraces { get; } = [];

    public long? SweepIdOf(string traceName) => SweepIds.TryGetValue(traceName, out var id) ? id : null;

    public void Emit(Func<DateTimeOffset, RunEvent> create) => observer.OnEvent(create(time.GetUtcNow()));

    public void Record(SqliteResultStore? store, CheckResult result, long? sweepId, Frequency? worstAt = null, CheckKind kind = CheckKind.FigureLimit,
        string? trace = null, string? detailJson = null)
    {
        if (trace is not null && OverloadedTraces.Contains(trace))
        {
            result = result with { TraceOverloaded = true, Detail = $"{result.Detail}; {CheckResult.OverloadedNote}" };
        }

        Checks.Add(result);
        if (RunId is { } runId && store is not null)
        {
            store.AddCheck(runId, new CheckRecord(result.Name, kind, result.Passed)
            {
                SweepId = sweepId,
                Margin = result.Margin,
                MarginUnit = result.MarginUnit,
                WorstFrequency = worstAt,
                Message = result.Detail,
                Flags = result.TraceOverloaded ? CheckFlags.TraceOverloaded : CheckFlags.None,
                DetailJson = detailJson,
            });
        }

        Emit(now => new CheckCompleted(now, result));
    }
}
