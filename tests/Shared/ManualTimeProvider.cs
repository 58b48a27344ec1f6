namespace BenchRunner.Tests.Shared;

/// <summary>
/// A clock that moves only when a test calls <see cref="Advance"/>. Timers (and so
/// <c>Task.Delay(t, provider)</c> and timed cancellation sources) fire during Advance, in due order.
/// </summary>
internal sealed class ManualTimeProvider : TimeProvider
{
    private readonly Lock _lock = new();
    private readonly List<ManualTimer> _timers = [];
    private readonly DateTimeOffset _start;
    private long _elapsedTicks;

    public ManualTimeProvider(DateTimeOffset? start = null)
    {
        _start = start ?? new DateTimeOffset(2025, 3, 14, 9, 30, 0, TimeSpan.Zero);
    }

    public override long TimestampFrequency => TimeSpan.TicksPerSecond;

    /// <summary>How many timers are waiting to fire.</summary>
    public int PendingTimerCount
    {
        get
        {
            lock (_lock)
            {
                return _timers.Count(t => t.DueTicks is not null);
            }
        }
    }

    public override DateTimeOffset GetUtcNow()
    {
        lock (_lock)
        {
            return _start.AddTicks(_elapsedTicks);
        }
    }

    public override long GetTimestamp()
    {
        lock (_lock)
        {
            return _elapsedTicks;
        }
    }

    public override ITimer CreateTimer(TimerCallback callback, object? state, TimeSpan dueTime, TimeSpan period)
    {
        var timer = new ManualTimer(this, callback, state);
        timer.Change(dueTime, period);
        return timer;
    }

    /// <summary>Waits (in real time, at most 10 s) until at least <paramref name="count"/> timers are pending.</summary>
    public async Task WaitForTimersAsync(int count)
    {
        var deadline = DateTime.UtcNow + TimeSpan.FromSeconds(10);
        while (PendingTimerCount < count)
        {
            if (DateTime.UtcNow > deadline)
            {
                throw new TimeoutException($"Expected {count} pending timers, found {PendingTimerCount}.");
            }

            await Task.Delay(5);
        }
    }

    /// <summary>Moves the clock on by <paramref name="by"/>, firing the timers that fall due on the way.</summary>
    public void Advance(TimeSpan by)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(by, TimeSpan.Zero);
        long target;
        lock (_lock)
        {
            target = _elapsedTicks + by.Ticks;
        }

        while (true)
        {
            ManualTimer? due;
            lock (_lock)
            {
                due = _timers.Where(t => t.DueTicks <= target).MinBy(t => t.DueTicks);
                if (due is null)
                {
                    _elapsedTicks = target;
                    return;
                }

                _elapsedTicks = Math.Max(_elapsedTicks, due.DueTicks!.Value);
                due.DueTicks = due.PeriodTicks is long period and > 0 ? due.DueTicks + period : null;
            }

            due.Fire();
        }
    }

    private void Schedule(ManualTimer timer, TimeSpan dueTime, TimeSpan period)
    {
        lock (_lock)
        {
            if (!_timers.Contains(timer))
            {
                _timers.Add(timer);
            }

            timer.DueTicks = dueTime == Timeout.InfiniteTimeSpan ? null : _elapsedTicks + Math.Max(0, dueTime.Ticks);
            timer.PeriodTicks = period == Timeout.InfiniteTimeSpan ? null : period.Ticks;
        }
    }

    private void Remove(ManualTimer timer)
    {
        lock (_lock)
        {
            _timers.Remove(timer);
        }
    }

    private sealed class ManualTimer(ManualTimeProvider owner, TimerCallback callback, object? state) : ITimer
    {
        public long? DueTicks { get; set; }

        public long? PeriodTicks { get; set; }

        public bool Change(TimeSpan dueTime, TimeSpan period)
        {
            owner.Schedule(this, dueTime, period);
            if (dueTime == TimeSpan.Zero)
            {
                // A real timer due now fires at once on the thread pool; do the same rather than wait for Advance.
                ThreadPool.QueueUserWorkItem(_ => owner.Advance(TimeSpan.Zero));
            }

            return true;
        }

        public void Fire() => callback(state);

        public void Dispose() => owner.Remove(this);

        public ValueTask DisposeAsync()
        {
            Dispose();
            return ValueTask.CompletedTask;
        }
    }
}
