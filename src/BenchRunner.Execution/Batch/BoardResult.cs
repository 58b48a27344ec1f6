using BenchRunner.Execution.Running;
using BenchRunner.Storage;
using BenchRunner.Core.Runs;

namespace BenchRunner.Execution.Batch;

/// <summary>What happened to one board of a batch.</summary>
/// <param name="Serial">The board's serial.</param>
/// <param name="IsRetest">True when the board had a verdict before this test.</param>
/// <param name="Outcome">How its run ended; null when it was left untested.</param>
/// <param name="NotTestedReason">Why it was left untested; null when it was tested.</param>
public sealed record BoardResult(string Serial, bool IsRetest, RunOutcome? Outcome, string? NotTestedReason)
{
    /// <summary>True when the run ended with a verdict (passed or failed); stopped, failed-to-run and skipped boards have none.</summary>
    public bool HasVerdict => Outcome?.Status is RunStatus.Passed or RunStatus.Failed;

    /// <summary>True when the board passed.</summary>
    public bool Passed => Outcome?.Status == RunStatus.Passed;
}
