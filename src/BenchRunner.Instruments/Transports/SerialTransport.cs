using System.IO.Ports;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Transports.Unix;

namespace BenchRunner.Instruments.Transports;

/// <summary>
/// A serial port (USB-serial adapter, on-board UART or a pseudo-terminal) as a transport.
/// <list type="bullet">
/// <item>Reads and writes use the port stream's asynchronous calls, which honour their
/// cancellation token on Linux (measured: a read cancelled after 200 ms returns at about 200 ms
/// and the port keeps working); the port's own ReadTimeout and WriteTimeout are left infinite
/// because the asynchronous calls ignore them.</item>
/// <item>A port that disappears (adapter unplugged) makes the pending and all later calls fail
/// with a transient <see cref="InstrumentException"/> naming the port, and
/// <see cref="IsOpen"/> becomes false; <see cref="OpenAsync"/> may then be tried again.
/// After such a loss the serial library services no further requests, so this class refuses
/// them itself rather than letting them wait forever.</item>
/// <item>DTR and RTS are set as the settings say, except on a device without modem-control
/// lines (a pseudo-terminal), where they do not exist and are left alone.</item>
/// <item>On Linux an exclusive advisory lock (flock) on the device node is held while the port
/// is open, so a second BenchRunner connection to the same port fails at once.</item>
/// </list>
/// Never returns 0 from <see cref="ReadAsync"/>: a serial line has no end-of-stream.
/// </summary>
public sealed class SerialTransport : ITransport
{
    private readonly object _gate = new();
    private Session? _session;

    /// <summary>Creates the transport; nothing is opened until <see cref="OpenAsync"/>.</summary>
    /// <exception cref="ArgumentException">The settings are invalid.</exception>
    public SerialTransport(SerialSettings settings)
    {
        ArgumentNullException.ThrowIfNull(settings);
        settings.Validate();
        Settings = settings;
        Description = $"serial {settings}";
    }

    /// <summary>The settings the port is opened with.</summary>
    public SerialSettings Settings { get; }

    /// <inheritdoc/>
    public string Description { get; }

    /// <summary>True while the port is open and has not disappeared.</summary>
    public bool IsOpen => _session is { IsUsable: true };

    /// <inheritdoc/>
    /// <exception cref="InstrumentException">
    /// The port does not exist or cannot be opened (transient), access is not permitted, or
    /// another connection holds the port (not transient).
    /// </exception>
    public ValueTask OpenAsync(CancellationToken cancellationToken)
    {
        cancellationToken.ThrowIfCancellationRequested();
        lock (_gate)
        {
            if (_session is { IsUsable: true })
            {
                return ValueTask.CompletedTask;
            }

            // A port that vanished is cleaned up before it is opened again.
            _session?.Close();
            _session = null;

            var path = Settings.PortPath;
            var portLock = SerialPortLock.Acquire(path);
            SerialPort? port = null;
            try
            {
                port = new SerialPort(path, Settings.BaudRate, Settings.Parity, Settings.DataBits, Settings.StopBits)
                {
                    Handshake = Settings.Handshake,
                    ReadTimeout = SerialPort.InfiniteTimeout,
                    WriteTimeout = SerialPort.InfiniteTimeout,
                };

                // Without modem-control lines (a pseudo-terminal) setting DTR or RTS fails the open.
                if (portLock.HasModemLines)
                {
                    port.DtrEnable = Settings.Dtr;
                    if (!Settings.HandshakeUsesRts)
                    {
                        port.RtsEnable = Settings.Rts;
                    }
                }

                port.Open();
                _session = new Session(path, port, port.BaseStream, portLock);
            }
            catch (Exception ex) when (ex is IOException or UnauthorizedAccessException or ArgumentException or InvalidOperationException)
            {
                port?.Dispose();
                portLock.Dispose();
                throw new InstrumentException($"cannot open serial port {path} ({Settings}): {ex.Message}", isTransient: true, ex);
            }
        }

        return ValueTask.CompletedTask;
    }

    /// <inheritdoc/>
    /// <exception cref="InstrumentException">The port has disappeared (transient) or was closed.</exception>
    public async ValueTask WriteAsync(ReadOnlyMemory<byte> data, CancellationToken cancellationToken)
    {
        var session = CurrentSession();
        using var linked = CancellationTokenSource.CreateLinkedTokenSource(cancellationToken, session.Gone);
        try
        {
            await session.Stream.WriteAsync(data, linked.Token).ConfigureAwait(false);
        }
        catch (Exception ex) when (ex is OperationCanceledException or IOException or ObjectDisposedException)
        {
            var failure = session.Translate(ex, cancellationToken);
            if (failure is null)
            {
                throw;
            }

            throw failure;
        }
    }

    /// <inheritdoc/>
    /// <exception cref="InstrumentException">The port has disappeared (transient) or was closed.</exception>
    public async ValueTask<int> ReadAsync(Memory<byte> buffer, CancellationToken cancellationToken)
    {
        var session = CurrentSession();
        using var linked = CancellationTokenSource.CreateLinkedTokenSource(cancellationToken, session.Gone);
        try
        {
            return await session.Stream.ReadAsync(buffer, linked.Token).ConfigureAwait(false);
        }
        catch (Exception ex) when (ex is OperationCanceledException or IOException or ObjectDisposedException)
        {
            var failure = session.Translate(ex, cancellationToken);
            if (failure is null)
            {
                throw;
            }

            throw failure;
        }
    }

    /// <inheritdoc/>
    public ValueTask CloseAsync()
    {
        lock (_gate)
        {
            _session?.Close();
            _session = null;
        }

        return ValueTask.CompletedTask;
    }

    /// <inheritdoc/>
    public ValueTask DisposeAsync() => CloseAsync();

    private Session CurrentSession()
    {
        var session = _session ?? throw new InvalidOperationException($"{Description} is not open.");
        session.ThrowIfVanished();
        return session;
    }

    /// <summary>One open of the port: what must be released together, and whether it has been lost.</summary>
    private sealed class Session(string path, SerialPort port, Stream stream, SerialPortLock portLock)
    {
        private readonly CancellationTokenSource _gone = new();
        private Exception? _loss;
        private volatile bool _closed;

        public Stream Stream => stream;

        public CancellationToken Gone => _gone.Token;

        public bool IsUsable => !_closed && Volatile.Read(ref _loss) is null;

        public void ThrowIfVanished()
        {
            if (_closed)
            {
                throw new InvalidOperationException($"serial port {path} is not open.");
            }

            if (Volatile.Read(ref _loss) is { } loss)
            {
                throw Vanished(loss);
            }
        }

        /// <summary>The exception to raise for a failed call, or null to let the original through.</summary>
        public Exception? Translate(Exception ex, CancellationToken callerToken)
        {
            if (ex is OperationCanceledException)
            {
                if (callerToken.IsCancellationRequested)
                {
                    return null;
                }

                // Cancelled through the session's own token: the port was lost or closed meanwhile.
                return Volatile.Read(ref _loss) is { } loss ? Vanished(loss)
                    : _closed ? Closed(ex)
                    : null;
            }

            if (ex is not (IOException or ObjectDisposedException))
            {
                return null;
            }

            if (_closed)
            {
                return Closed(ex);
            }

            // The serial library fails pending requests this way when the device reports an error or hang-up.
            if (Interlocked.CompareExchange(ref _loss, ex, null) is null)
            {
                _gone.Cancel();
            }

            return Vanished(Volatile.Read(ref _loss)!);
        }

        public void Close()
        {
            _closed = true;
            _gone.Cancel();
            try
            {
                // Disposing the stream first skips the port's flush on close, which waits for ever
                // for queued writes once the device has gone.
                stream.Dispose();
                port.Dispose();
            }
            catch (Exception ex) when (ex is IOException or ObjectDisposedException or UnauthorizedAccessException)
            {
                // Already gone; nothing more to release.
            }
            finally
            {
                portLock.Dispose();
            }
        }

        private InstrumentException Closed(Exception inner) =>
            new($"serial port {path} was closed during the operation", isTransient: false, inner);

        private InstrumentException Vanished(Exception inner) =>
            new($"serial port {path} has gone away (unplugged or powered off?)", isTransient: true, inner);
    }
}
