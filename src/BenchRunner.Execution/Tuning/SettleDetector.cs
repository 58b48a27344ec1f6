namespace BenchRunner.Execution.Tuning;

/// <summary>
/// Decides, sweep by sweep, whether a tuning session has settled: the response counts as settled
/// once every check has been inside for <see cref="SettleOptions.Sweeps"/> consecutive sweeps and
/// the streak has lasted <see cref="SettleOptions.MinimumTime"/> (measured on the given clock from
/// the first sweep of the streak to the current one). One sweep outside ends the streak, and with
/// it the settled state. Pure logic: no I/O, time only through the <see cref="TimeProvider"/>.
/// </summary>
public sealed class SettleDetector
{
    private readonly int _sweepsNeeded;
    private readonly TimeSpan _minimumTime;
    private readonly TimeProvider _time;
    private int _sweep;
    private int _streak;
    private long _streakStart;
    private bool _settled;

    /// <summary>Creates a detector.</summary>
    /// <exception cref="ArgumentException">Options out of range (every problem named).</exception>
    public SettleDetector(SettleOptions options, TimeProvider time)
    {
        ArgumentNullException.ThrowIfNull(options);
        var problems = options.Validate();
        if (problems.Count > 0)
        {
            throw new ArgumentException(string.Join("; ", problems), nameof(options));
        }

        _sweepsNeeded = options.Sweeps;
        _minimumTime = options.MinimumTime;
        _time = time ?? throw new ArgumentNullException(nameof(time));
    }

    /// <summary>The sweep at which the session first settled, or null while it has not.</summary>
    public int? FirstSettledAt { get; private set; }

    /// <summary>Takes the verdict of the next sweep (now, on the clock) and says where the session stands.</summary>
    /// <param name="inside">Whether every check of the sweep was inside its limits.</param>
    public SettleProgress Observe(bool inside)
    {
        _sweep++;
        long now = _time.GetTimestamp();
        if (!inside)
        {
            bool left = _settled;
            _streak = 0;
            _settled = false;
            return new SettleProgress(_sweep, false, 0, TimeSpan.Zero, false, false, left);
        }

        if (_streak == 0)
        {
            _streakStart = now;
        }

        _streak++;
        var held = _time.GetElapsedTime(_streakStart, now);
        bool settled = _streak >= _sweepsNeeded && held >= _minimumTime;
        bool just = settled && !_settled;
        _settled = settled;
        if (just)
        {
            FirstSettledAt ??= _sweep;
        }

        return new SettleProgress(_sweep, true, _streak, held, settled, just, false);
    }
}
