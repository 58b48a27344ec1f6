namespace BenchRunner.Daemon.Work;

/// <summary>The exclusive use of some bench instruments, until disposed.</summary>
public sealed class InstrumentLease : IDisposable
{
    private readonly Action<InstrumentLease> _release;
    private int _released;

    internal InstrumentLease(string holder, IReadOnlyList<string> instruments, Action<InstrumentLease> release)
    {
        Holder = holder;
        Instruments = instruments;
        _release = release;
    }

    /// <summary>Who holds it.</summary>
    public string Holder { get; }

    /// <summary>The instruments it covers, by name.</summary>
    public IReadOnlyList<string> Instruments { get; }

    /// <summary>Gives the instruments back; a second call does nothing.</summary>
    public void Dispose()
    {
        if (Interlocked.Exchange(ref _released, 1) == 0)
        {
            _release(this);
        }
    }
}
