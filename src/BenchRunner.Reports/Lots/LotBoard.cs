using BenchRunner.Storage;
using BenchRunner.Core.Runs;

namespace BenchRunner.Reports.Lots;

/// <summary>One board of a lot: its verdict runs, oldest first; the last one counts.</summary>
/// <param name="Serial">The board's serial.</param>
/// <param name="Runs">Its runs that ended with a verdict (passed or failed), oldest first; never empty.</param>
/// <param name="FailedChecks">For each of <paramref name="Runs"/>, the names of the checks that failed.</param>
/// <param name="RunsWithoutVerdict">Its runs that were stopped or could not finish; they do not count.</param>
public sealed record LotBoard(string Serial, IReadOnlyList<StoredRun> Runs, IReadOnlyList<IReadOnlyList<string>> FailedChecks, int RunsWithoutVerdict)
{
    /// <summary>The run whose verdict counts: the latest.</summary>
    public StoredRun Latest => Runs[^1];

    /// <summary>True when the latest run passed.</summary>
    public bool Passed => Latest.Status == RunStatus.Passed;

    /// <summary>True when the first run passed.</summary>
    public bool PassedFirstTime => Runs[0].Status == RunStatus.Passed;

    /// <summary>True when the board was tested more than once.</summary>
    public bool Retested => Runs.Count > 1;

    /// <summary>The checks the latest run failed.</summary>
    public IReadOnlyList<string> LatestFailedChecks => FailedChecks[^1];
}
