using System.Net.Sockets;
using BenchRunner.Instruments.Errors;

namespace BenchRunner.Instruments.Transports;

/// <summary>
/// A TCP connection to a LAN instrument or the virtual bench, with Nagle's algorithm off
/// (commands are short and each waits for its reply). Refused, reset and unreachable
/// connections are transient <see cref="InstrumentException"/>s naming host:port; a connection
/// not made within the connect timeout (measured by the injected <see cref="TimeProvider"/>) is an
/// <see cref="InstrumentTimeoutException"/>. Reads return 0 when the instrument closes its end;
/// after a reset or other socket error <see cref="IsOpen"/> is false and the transport may be opened again.
/// </summary>
public sealed class TcpTransport : ITransport
{
    private readonly TimeProvider _time;
    private Socket? _socket;

    /// <summary>Creates the transport; nothing is connected until <see cref="OpenAsync"/>.</summary>
    /// <exception cref="ArgumentException">The settings are invalid.</exception>
    public TcpTransport(TcpSettings settings, TimeProvider? timeProvider = null)
    {
        ArgumentNullException.ThrowIfNull(settings);
        settings.Validate();
        Settings = settings;
        _time = timeProvider ?? TimeProvider.System;
        Description = $"tcp {settings.Endpoint}";
    }

    /// <summary>Where the transport connects.</summary>
    public TcpSettings Settings { get; }

    /// <inheritdoc/>
    public string Description { get; }

    /// <inheritdoc/>
    public bool IsOpen => _socket is not null;

    /// <inheritdoc/>
    public async ValueTask OpenAsync(CancellationToken cancellationToken)
    {
        if (_socket is not null)
        {
            return;
        }

        var socket = new Socket(SocketType.Stream, ProtocolType.Tcp) { NoDelay = true };
        using var timer = new CancellationTokenSource(Settings.ConnectTimeout, _time);
        using var linked = CancellationTokenSource.CreateLinkedTokenSource(cancellationToken, timer.Token);
        try
        {
            await socket.ConnectAsync(Settings.Host, Settings.Port, linked.Token).ConfigureAwait(false);
        }
        catch (OperationCanceledException ex) when (timer.IsCancellationRequested && !cancellationToken.IsCancellationRequested)
        {
            socket.Dispose();
            throw new InstrumentTimeoutException($"no connection to {Settings.Endpoint} within {Settings.ConnectTimeout.TotalMilliseconds:0} ms", ex);
        }
        catch (SocketException ex)
        {
            socket.Dispose();
            throw Failure("cannot connect to", ex);
        }
        catch
        {
            socket.Dispose();
            throw;
        }

        _socket = socket;
    }

    /// <inheritdoc/>
    /// <exception cref="InstrumentException">The connection was reset or broken (transient).</exception>
    public async ValueTask WriteAsync(ReadOnlyMemory<byte> data, CancellationToken cancellationToken)
    {
        var socket = CurrentSocket();
        try
        {
            while (!data.IsEmpty)
            {
                int sent = await socket.SendAsync(data, SocketFlags.None, cancellationToken).ConfigureAwait(false);
                data = data[sent..];
            }
        }
        catch (SocketException ex)
        {
            Drop(socket);
            throw Failure("lost the connection to", ex);
        }
        catch (ObjectDisposedException ex)
        {
            throw Closed(ex);
        }
    }

    /// <inheritdoc/>
    /// <exception cref="InstrumentException">The connection was reset or broken (transient).</exception>
    public async ValueTask<int> ReadAsync(Memory<byte> buffer, CancellationToken cancellationToken)
    {
        var socket = CurrentSocket();
        try
        {
            return await socket.ReceiveAsync(buffer, SocketFlags.None, cancellationToken).ConfigureAwait(false);
        }
        catch (SocketException ex)
        {
            Drop(socket);
            throw Failure("lost the connection to", ex);
        }
        catch (ObjectDisposedException ex)
        {
            throw Closed(ex);
        }
    }

    /// <inheritdoc/>
    public ValueTask CloseAsync()
    {
        var socket = Interlocked.Exchange(ref _socket, null);
        socket?.Dispose();
        return ValueTask.CompletedTask;
    }

    /// <inheritdoc/>
    public ValueTask DisposeAsync() => CloseAsync();

    /// <summary>Forgets a broken socket, so that <see cref="IsOpen"/> is false and a reopen connects afresh.</summary>
    private void Drop(Socket socket)
    {
        if (Interlocked.CompareExchange(ref _socket, null, socket) == socket)
        {
            socket.Dispose();
        }
    }

    private Socket CurrentSocket() =>
        _socket ?? throw new InvalidOperationException($"{Description} is not open.");

    private InstrumentException Failure(string what, SocketException ex)
    {
        var reason = ex.SocketErrorCode switch
        {
            SocketError.ConnectionRefused => "connection refused (is the instrument or simulator listening on that port?)",
            SocketError.ConnectionReset => "connection reset by the other end",
            SocketError.ConnectionAborted => "connection aborted",
            SocketError.HostNotFound or SocketError.NoData => "host name not found",
            SocketError.HostUnreachable or SocketError.NetworkUnreachable => "host unreachable",
            SocketError.TimedOut => "timed out",
            _ => ex.Message,
        };
        return new InstrumentException($"{what} {Settings.Endpoint}: {reason}", isTransient: true, ex);
    }

    private InstrumentException Closed(Exception inner) =>
        new($"the connection to {Settings.Endpoint} was closed during the operation", isTransient: false, inner);
}
