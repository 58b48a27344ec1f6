using BenchRunner.Execution.Tuning;

namespace BenchRunner.Execution.Tests.Tuning;

// The settle rule is the project's own (docs/tuning.md): N consecutive sweeps inside and a least
// time held. "A few sweeps inside before calling it settled" is common practice, no source.
public sealed class SettleDetectorTests
{
    private static readonly TimeSpan Second = TimeSpan.FromSeconds(1);

    private static (SettleDetector Detector, ManualTimeProvider Clock) Create(int sweeps, double seconds)
    {
        var clock = new ManualTimeProvider();
        return (new SettleDetector(new SettleOptions { Sweeps = sweeps, MinimumTime = TimeSpan.FromSeconds(seconds) }, clock), clock);
    }

    /// <summary>Feeds one verdict per second and returns the progress after each.</summary>
    private static List<SettleProgress> Feed(SettleDetector detector, ManualTimeProvider clock, string verdicts)
    {
        var seen = new List<SettleProgress>();
        foreach (var c in verdicts)
        {
            seen.Add(detector.Observe(c == 'y'));
            clock.Advance(Second);
        }

        return seen;
    }

    [Fact]
    public void Observe_CountBinds_SettlesOnTheNthConsecutiveInsideSweep()
    {
        var (detector, clock) = Create(sweeps: 3, seconds: 0);

        var seen = Feed(detector, clock, "nyyyy");

        Assert.Equal([false, false, false, true, true], seen.Select(p => p.Settled));
        Assert.Equal([false, false, false, true, false], seen.Select(p => p.JustSettled));
        Assert.Equal([0, 1, 2, 3, 4], seen.Select(p => p.Streak));
        Assert.Equal(4, detector.FirstSettledAt);
    }

    [Fact]
    public void Observe_TimeBinds_WaitsUntilTheStreakHasLastedTheMinimumTime()
    {
        // Two sweeps would do, but the streak must last 4 s: sweeps 1..5 at 0, 1, 2, 3, 4 s.
        var (detector, clock) = Create(sweeps: 2, seconds: 4);

        var seen = Feed(detector, clock, "yyyyyy");

        Assert.Equal(5, detector.FirstSettledAt);
        Assert.Equal(TimeSpan.FromSeconds(4), seen[4].Held);
        Assert.False(seen[3].Settled);
    }

    [Fact]
    public void Observe_OneSweepOutside_EndsTheStreakAndTheSettledState()
    {
        var (detector, clock) = Create(sweeps: 2, seconds: 0);

        var seen = Feed(detector, clock, "yyynyy");

        Assert.Equal([false, true, true, false, false, true], seen.Select(p => p.Settled));
        Assert.True(seen[3].JustLeft);
        Assert.Equal(0, seen[3].Streak);
        Assert.True(seen[5].JustSettled);
        Assert.Equal(2, detector.FirstSettledAt);
    }

    [Fact]
    public void Observe_BrokenStreak_RestartsTheClockAtTheNextInsideSweep()
    {
        var (detector, clock) = Create(sweeps: 1, seconds: 2);

        var seen = Feed(detector, clock, "yynyyy");

        // Sweeps 1-2 hold only 1 s; after the break, sweeps 4, 5, 6 hold 0, 1, 2 s.
        Assert.Equal([false, false, false, false, false, true], seen.Select(p => p.Settled));
        Assert.Equal(6, detector.FirstSettledAt);
    }

    [Fact]
    public void Observe_NeverInside_NeverSettles()
    {
        var (detector, clock) = Create(sweeps: 1, seconds: 0);

        var seen = Feed(detector, clock, "nnnn");

        Assert.All(seen, p => Assert.False(p.Settled));
        Assert.Null(detector.FirstSettledAt);
        Assert.Equal([1, 2, 3, 4], seen.Select(p => p.Sweep));
    }

    [Fact]
    public void Create_OptionsOutOfRange_NamesEveryProblem()
    {
        var ex = Assert.Throws<ArgumentException>(() =>
            new SettleDetector(new SettleOptions { Sweeps = 0, MinimumTime = TimeSpan.FromSeconds(-1) }, new ManualTimeProvider()));

        Assert.Contains("at least 1 sweep", ex.Message);
        Assert.Contains("zero or more", ex.Message);
    }
}
