namespace BenchRunner.Instruments.Transports;

/// <summary>
/// One end of an in-memory connection, for tests and the in-process virtual bench. What one end
/// writes, the other reads. Closing an end tells the other end that the peer has gone (its reads
/// return 0); an end cannot be reopened once closed.
/// </summary>
public sealed class InMemoryTransport : ITransport
{
    private readonly ByteChannel _incoming;
    private readonly ByteChannel _outgoing;
    private bool _closed;

    private InMemoryTransport(string description, ByteChannel incoming, ByteChannel outgoing)
    {
        Description = description;
        _incoming = incoming;
        _outgoing = outgoing;
    }

    /// <inheritdoc/>
    public string Description { get; }

    /// <inheritdoc/>
    public bool IsOpen { get; private set; }

    /// <summary>Creates two connected ends: the host's and the device's.</summary>
    public static (InMemoryTransport Host, InMemoryTransport Device) CreatePair(string name = "memory")
    {
        var toDevice = new ByteChannel();
        var toHost = new ByteChannel();
        return (new InMemoryTransport($"{name} (host end)", toHost, toDevice),
                new InMemoryTransport($"{name} (device end)", toDevice, toHost));
    }

    /// <inheritdoc/>
    public ValueTask OpenAsync(CancellationToken cancellationToken)
    {
        if (_closed)
        {
            throw new Errors.InstrumentException($"{Description} was closed and cannot be reopened.", isTransient: false);
        }

        IsOpen = true;
        return ValueTask.CompletedTask;
    }

    /// <inheritdoc/>
    public ValueTask WriteAsync(ReadOnlyMemory<byte> data, CancellationToken cancellationToken)
    {
        EnsureOpen();
        cancellationToken.ThrowIfCancellationRequested();
        _outgoing.Write(data.Span);
        return ValueTask.CompletedTask;
    }

    /// <inheritdoc/>
    public ValueTask<int> ReadAsync(Memory<byte> buffer, CancellationToken cancellationToken)
    {
        EnsureOpen();
        return _incoming.ReadAsync(buffer, cancellationToken);
    }

    /// <inheritdoc/>
    public ValueTask CloseAsync()
    {
        IsOpen = false;
        _closed = true;
        _outgoing.Complete();
        return ValueTask.CompletedTask;
    }

    /// <inheritdoc/>
    public ValueTask DisposeAsync() => CloseAsync();

    private void EnsureOpen()
    {
        if (!IsOpen)
        {
            throw new InvalidOperationException($"{Description} is not open.");
        }
    }
}
