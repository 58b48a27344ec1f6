namespace BenchRunner.Core.Statistics;

/// <summary>One test of one board: its verdict and the checks that failed.</summary>
/// <param name="Passed">True when the board passed this test.</param>
/// <param name="FailedChecks">The names of the checks that failed; empty when it passed.</param>
public sealed record BoardTest(bool Passed, IReadOnlyList<string> FailedChecks)
{
    /// <summary>A passing test.</summary>
    public static BoardTest Pass() => new(true, []);

    /// <summary>A failing test, with the checks that failed.</summary>
    public static BoardTest Fail(params string[] failedChecks) => new(false, failedChecks);
}
