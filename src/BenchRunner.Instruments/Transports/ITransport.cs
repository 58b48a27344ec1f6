namespace BenchRunner.Instruments.Transports;

/// <summary>
/// Bytes in and out of an instrument connection: a serial port, a TCP socket, an in-memory
/// pair or a recorded session. A transport knows nothing of messages; framing sits above it.
/// Reads and writes honour their cancellation token, which is how timeouts are applied.
/// </summary>
public interface ITransport : IAsyncDisposable
{
    /// <summary>A short description for messages and logs, e.g. <c>tcp 127.0.0.1:5025</c>.</summary>
    string Description { get; }

    /// <summary>True between a successful <see cref="OpenAsync"/> and <see cref="CloseAsync"/>.</summary>
    bool IsOpen { get; }

    /// <summary>Opens the connection. Opening an open transport does nothing.</summary>
    /// <exception cref="Errors.InstrumentException">The connection cannot be made (transient).</exception>
    ValueTask OpenAsync(CancellationToken cancellationToken);

    /// <summary>Writes all of <paramref name="data"/>.</summary>
    ValueTask WriteAsync(ReadOnlyMemory<byte> data, CancellationToken cancellationToken);

    /// <summary>
    /// Waits for at least one byte and reads what is available into <paramref name="buffer"/>.
    /// Returns 0 when the peer has closed the connection.
    /// </summary>
    ValueTask<int> ReadAsync(Memory<byte> buffer, CancellationToken cancellationToken);

    /// <summary>Closes the connection; it may be opened again.</summary>
    ValueTask CloseAsync();
}
