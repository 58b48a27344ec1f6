namespace BenchRunner.Execution.Batch;

/// <summary>Whether a board is in the fixture and ready, and if not, why.</summary>
/// <param name="Ready">True when the board can be tested.</param>
/// <param name="Reason">Why it is not ready; null when it is.</param>
public sealed record FixtureResult(bool Ready, string? Reason)
{
    /// <summary>The board is in place.</summary>
    public static FixtureResult InPlace { get; } = new(true, null);

    /// <summary>The board is not in place, for <paramref name="reason"/>; it is left untested.</summary>
    public static FixtureResult NotReady(string reason) => new(false, reason ?? throw new ArgumentNullException(nameof(reason)));
}
