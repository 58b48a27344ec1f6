namespace BenchRunner.Instruments.Tests.Support;

/// <summary>
/// A clock that moves only when told (<see cref="Advance"/>), with timers that fire when it
/// passes their due time, so that timeouts and settle delays are tested without waiting.
/// </summary>
internal sealed class ManualTimeProvider : TimeProvider
{
    private readonly object _lock = new();
    private readonly List<ManualTimer> _timers = [];
    private long _ticks;

    public override long TimestampFrequency => TimeSpan.TicksPerSecond;

    public override long GetTimestamp()
    {
        lock (_lock)
        {
            return _ticks;
        }
    }

    public override DateTimeOffset GetUtcNow() => new DateTimeOffset(2024, 1, 1, 0, 0, 0, TimeSpan.Zero).AddTicks(GetTimestamp());

    /// <summary>Timers waiting to fire.</summary>
    public int PendingTimers
    {
        get
        {
            lock (_lock)
            {
                return _timers.Count(t => t.DueTicks is not null);
            }
        }
    }

    public override ITimer CreateTimer(TimerCallback callback, object? state, TimeSpan dueTime, TimeSpan period)
    {
        var timer = new ManualTimer(this, callback, state);
        lock (_lock)
        {
            _timers.Add(timer);
        }

        timer.Change(dueTime, period);
        return timer;
    }

    /// <summary>Moves the clock on and fires every timer that falls due, in order.</summary>
    public void Advance(TimeSpan by)
    {
        long target;
        lock (_lock)
        {
            target = _ticks + by.Ticks;
        }

        while (true)
        {
            ManualTimer? next;
            lock (_lock)
            {
                next = _timers.Where(t => t.DueTicks is { } due && due <= target).MinBy(t => t.DueTicks);
                if (next is null)
                {
                    _ticks = target;
                    return;
                }

                _ticks = Math.Max(_ticks, next.DueTicks!.Value);
                next.Fired();
            }

            next.Invoke();
        }
    }

    /// <summary>Waits (in real time, at most 10 s) until at least <paramref name="count"/> timers are pending.</summary>
    public async Task WaitForTimersAsync(int count)
    {
        var deadline = DateTime.UtcNow + TimeSpan.FromSeconds(10);
        while (PendingTimers < count)
        {
            if (DateTime.UtcNow > deadline)
            {
                throw new TimeoutException($"Expected {count} pending timers, found {PendingTimers}.");
            }

            await Task.Delay(5);
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
        private long _periodTicks;

        public long? DueTicks { get; private set; }

        public bool Change(TimeSpan dueTime, TimeSpan period)
        {
            lock (owner._lock)
            {
                _periodTicks = period == Timeout.InfiniteTimeSpan ? 0 : period.Ticks;
                DueTicks = dueTime == Timeout.InfiniteTimeSpan ? null : owner._ticks + Math.Max(0, dueTime.Ticks);
            }

            if (dueTime == TimeSpan.Zero)
            {
                owner.Advance(TimeSpan.Zero);
            }

            return true;
        }

        public void Fired() => DueTicks = _periodTicks > 0 ? DueTicks + _periodTicks : null;

        public void Invoke() => callback(state);

        public void Dispose() => owner.Remove(this);

        public ValueTask DisposeAsync()
        {
            Dispose();
            return ValueTask.CompletedTask;
        }
    }
}
