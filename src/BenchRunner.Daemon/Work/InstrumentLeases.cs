namespace BenchRunner.Daemon.Work;

/// <summary>
/// Hands out exclusive use of bench instruments. A job asks for all the instruments its plan
/// needs at once and gets them together (so two jobs can never hold one each of the other's pair).
/// Jobs on different instruments run side by side; jobs sharing an instrument take turns in the
/// order they asked: a later request never overtakes an earlier one that wants any of the same
/// instruments.
/// </summary>
public sealed class InstrumentLeases(TimeProvider time)
{
    private readonly Lock _lock = new();
    private readonly Dictionary<string, string> _holders = new(StringComparer.Ordinal);
    private readonly List<Waiter> _waiting = [];

    /// <summary>Raised after instruments are taken or given back, outside any lock.</summary>
    public event Action<LeaseChange>? Changed;

    /// <summary>Who holds each instrument now (instrument name to holder).</summary>
    public IReadOnlyDictionary<string, string> Holders
    {
        get
        {
            lock (_lock)
            {
                return new Dictionary<string, string>(_holders, StringComparer.Ordinal);
            }
        }
    }

    /// <summary>Waits until every instrument in <paramref name="instruments"/> is free and this request is first in line for each, then takes them all.</summary>
    /// <exception cref="OperationCanceledException"><paramref name="cancellationToken"/> fired first; nothing is held.</exception>
    public async Task<InstrumentLease> AcquireAsync(IEnumerable<string> instruments, string holder, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(instruments);
        ArgumentException.ThrowIfNullOrWhiteSpace(holder);
        var names = instruments.Distinct(StringComparer.Ordinal).Order(StringComparer.Ordinal).ToList();
        var waiter = new Waiter(holder, names);
        lock (_lock)
        {
            if (CanTake(waiter, ahead: _waiting.Count))
            {
                Take(waiter);
                waiter.Granted.TrySetResult();
            }
            else
            {
                _waiting.Add(waiter);
            }
        }

        if (waiter.Granted.Task.IsCompleted)
        {
            return Announce(waiter);
        }

        try
        {
            await waiter.Granted.Task.WaitAsync(cancellationToken).ConfigureAwait(false);
        }
        catch (OperationCanceledException)
        {
            bool granted;
            lock (_lock)
            {
                granted = !_waiting.Remove(waiter);
            }

            if (granted)
            {
                // Granted at the very moment of cancelling: give it straight back.
                Announce(waiter).Dispose();
            }

            throw;
        }

        return Announce(waiter);
    }

    private InstrumentLease Announce(Waiter waiter)
    {
        var lease = new InstrumentLease(waiter.Holder, waiter.Names, Release);
        Changed?.Invoke(new LeaseChange(waiter.Holder, waiter.Names, true, time.GetUtcNow()));
        return lease;
    }

    private void Release(InstrumentLease lease)
    {
        var granted = new List<Waiter>();
        lock (_lock)
        {
            foreach (var name in lease.Instruments)
            {
                _holders.Remove(name);
            }

            for (int i = 0; i < _waiting.Count; i++)
            {
                if (CanTake(_waiting[i], ahead: i))
                {
                    granted.Add(_waiting[i]);
                    Take(_waiting[i]);
                    _waiting.RemoveAt(i);
                    i--;
                }
            }
        }

        // Announced before the waiters wake, so that a release is always seen before the take it allows.
        Changed?.Invoke(new LeaseChange(lease.Holder, lease.Instruments, false, time.GetUtcNow()));
        foreach (var waiter in granted)
        {
            waiter.Granted.TrySetResult();
        }
    }

    private bool CanTake(Waiter waiter, int ahead)
    {
        if (waiter.Names.Any(_holders.ContainsKey))
        {
            return false;
        }

        for (int i = 0; i < ahead && i < _waiting.Count; i++)
        {
            if (_waiting[i].Names.Intersect(waiter.Names, StringComparer.Ordinal).Any())
            {
                return false;
            }
        }

        return true;
    }

    private void Take(Waiter waiter)
    {
        foreach (var name in waiter.Names)
        {
            _holders[name] = waiter.Holder;
        }
    }

    private sealed class Waiter(string holder, IReadOnlyList<string> names)
    {
        public string Holder { get; } = holder;

        public IReadOnlyList<string> Names { get; } = names;

        public TaskCompletionSource Granted { get; } = new(TaskCreationOptions.RunContinuationsAsynchronously);
    }
}
