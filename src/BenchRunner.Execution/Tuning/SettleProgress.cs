namespace BenchRunner.Execution.Tuning;

/// <summary>Where a tuning session stands after one sweep, as <see cref="SettleDetector"/> sees it.</summary>
/// <param name="Sweep">The sweep's number in the session: 1, 2, ...</param>
/// <param name="Inside">Whether every check of this sweep was inside its limits.</param>
/// <param name="Streak">How many consecutive sweeps, this one included, have been inside; 0 when this one is not.</param>
/// <param name="Held">The time from the first sweep of the streak to this one; zero when not inside.</param>
/// <param name="Settled">Whether the session is settled now (the streak meets both the count and the time).</param>
/// <param name="JustSettled">True on the sweep at which the session becomes settled (again).</param>
/// <param name="JustLeft">True on the first sweep outside after the session was settled.</param>
public sealed record SettleProgress(int Sweep, bool Inside, int Streak, TimeSpan Held, bool Settled, bool JustSettled, bool JustLeft);
