namespace BenchRunner.Daemon.Work;

/// <summary>The waits between tries of a failed instrument: the first wait, doubled after each failure, never longer than the longest.</summary>
/// <param name="First">The wait after the first failure.</param>
/// <param name="Longest">The cap.</param>
public sealed record Backoff(TimeSpan First, TimeSpan Longest)
{
    /// <summary>The wait after <paramref name="failures"/> failures in a row (1 gives <see cref="First"/>).</summary>
    public TimeSpan After(int failures)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(failures, 1);
        // Doubling past 2^20 of any sensible first wait is beyond the cap anyway.
        var factor = Math.Pow(2, Math.Min(failures - 1, 20));
        var ticks = Math.Min(First.Ticks * factor, Longest.Ticks);
        return TimeSpan.FromTicks((long)ticks);
    }
}
