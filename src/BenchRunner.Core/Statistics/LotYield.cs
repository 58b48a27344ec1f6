namespace BenchRunner.Core.Statistics;

/// <summary>
/// Yield of a lot from its boards' test histories: a board counts by its latest verdict, so a
/// board that failed and passed on retest counts as passed (but not as first-pass).
/// </summary>
public sealed class LotYield
{
    private LotYield(int boards, int passed, int passedFirstTime, int retested, IReadOnlyList<CheckFailureCount> failures)
    {
        Boards = boards;
        Passed = passed;
        PassedFirstTime = passedFirstTime;
        Retested = retested;
        FailuresByCheck = failures;
    }

    /// <summary>How many boards.</summary>
    public int Boards { get; }

    /// <summary>Boards whose latest test passed.</summary>
    public int Passed { get; }

    /// <summary>Boards whose latest test failed.</summary>
    public int Failed => Boards - Passed;

    /// <summary>Boards that passed their first test.</summary>
    public int PassedFirstTime { get; }

    /// <summary>Boards tested more than once.</summary>
    public int Retested { get; }

    /// <summary><see cref="Passed"/> / <see cref="Boards"/>, from 0 to 1.</summary>
    public double Yield => (double)Passed / Boards;

    /// <summary><see cref="PassedFirstTime"/> / <see cref="Boards"/>, from 0 to 1.</summary>
    public double FirstPassYield => (double)PassedFirstTime / Boards;

    /// <summary>
    /// Each check that failed, with how many tests it failed in (every test of every board counts),
    /// most frequent first; ties in name order (ordinal).
    /// </summary>
    public IReadOnlyList<CheckFailureCount> FailuresByCheck { get; }

    /// <summary>Computes the yield of the boards in <paramref name="histories"/>.</summary>
    /// <exception cref="ArgumentException">No boards, a board without tests, or a serial given twice.</exception>
    public static LotYield From(IEnumerable<BoardHistory> histories)
    {
        ArgumentNullException.ThrowIfNull(histories);
        var boards = histories.ToList();
        if (boards.Count == 0)
        {
            throw new ArgumentException("No boards: a lot's yield needs at least one tested board.", nameof(histories));
        }

        var serials = new HashSet<string>(StringComparer.Ordinal);
        var failures = new Dictionary<string, int>(StringComparer.Ordinal);
        int passed = 0, first = 0, retested = 0;
        foreach (var board in boards)
        {
            ArgumentNullException.ThrowIfNull(board);
            if (!serials.Add(board.Serial))
            {
                throw new ArgumentException($"Board {board.Serial} is given twice; give each board's tests in one history.", nameof(histories));
            }

            if (board.Tests.Count == 0)
            {
                throw new ArgumentException($"Board {board.Serial} has no tests.", nameof(histories));
            }

            passed += board.Tests[^1].Passed ? 1 : 0;
            first += board.Tests[0].Passed ? 1 : 0;
            retested += board.Tests.Count > 1 ? 1 : 0;
            foreach (var check in board.Tests.SelectMany(t => t.FailedChecks))
            {
                failures[check] = failures.GetValueOrDefault(check) + 1;
            }
        }

        var ranked = failures
            .OrderByDescending(f => f.Value)
            .ThenBy(f => f.Key, StringComparer.Ordinal)
            .Select(f => new CheckFailureCount(f.Key, f.Value))
            .ToList();
        return new LotYield(boards.Count, passed, first, retested, ranked);
    }
}
