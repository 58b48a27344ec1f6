using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Running;
using BenchRunner.Execution.Validation;
using BenchRunner.Instruments.Connections;
using BenchRunner.Storage;

namespace BenchRunner.Execution.Preparation;

/// <summary>
/// Everything a run needs, read once and validated: the plan with the exact text it was parsed from
/// (the text stored with the run is the text that ran), and the bench likewise.
/// </summary>
/// <param name="Plan">The validated plan.</param>
/// <param name="PlanText">The exact plan text.</param>
/// <param name="Bench">The bench it was validated against, or null for a plan checked on its own.</param>
public sealed record PreparedRun(TestPlan Plan, string PlanText, PreparedBench? Bench)
{
    /// <summary>The bench, which a run needs.</summary>
    /// <exception cref="InvalidOperationException">The plan was prepared without a bench.</exception>
    public PreparedBench RequiredBench => Bench ?? throw new InvalidOperationException("The plan was prepared without a bench, so it cannot run.");

    /// <summary>The probing and safety cautions to show before the run (empty when none apply).</summary>
    public IReadOnlyList<string> Cautions => Bench is null ? [] : ProbingCautions.For(Plan, Bench.Definition);

    /// <summary>A launcher for runs of this plan on its bench: the runner with its connections, recording into <paramref name="results"/>.</summary>
    /// <param name="transports">Creates the connections the bench names.</param>
    /// <param name="results">Where runs are recorded, or null to record nothing.</param>
    /// <param name="time">The clock for waits, timeouts and timestamps; the system clock by default.</param>
    public RunLauncher Launcher(TransportFactory transports, IResultWriter? results, TimeProvider? time = null) =>
        new(new PlanRunner(RequiredBench.Definition, transports, time), results);

    /// <summary>What is recorded with a run of this plan on this bench.</summary>
    public RunContext Context(string softwareVersion, string host) => new(PlanText, Bench?.Text, softwareVersion, host);
}
