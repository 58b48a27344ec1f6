using System.Net;
using System.Net.Sockets;
using BenchRunner.Simulator.Protocols.Hosting;

namespace BenchRunner.Simulator.Endpoints;

/// <summary>
/// Serves one simulated instrument on a TCP port: every accepted connection is served by the
/// instrument's host until the peer closes it or the endpoint is disposed. Listens on loopback
/// unless told otherwise: the virtual bench is not meant for the network.
/// </summary>
public sealed class SimulatorTcpEndpoint : IAsyncDisposable
{
    private readonly TcpListener _listener;
    private readonly CancellationTokenSource _stop;
    private readonly Task _acceptLoop;

    private SimulatorTcpEndpoint(SimulatedDeviceHost host, IPEndPoint endpoint, CancellationToken stopping)
    {
        _listener = new TcpListener(endpoint);
        _listener.Start();
        _stop = CancellationTokenSource.CreateLinkedTokenSource(stopping);
        _acceptLoop = AcceptAsync(host, _stop.Token);
    }

    /// <summary>Where the endpoint listens (the actual port when 0 was asked for).</summary>
    public IPEndPoint LocalEndpoint => (IPEndPoint)_listener.LocalEndpoint;

    /// <summary>Starts listening on <paramref name="port"/> (0: any free port) of <paramref name="address"/> (loopback by default).</summary>
    /// <exception cref="SocketException">The port is taken or cannot be used.</exception>
    public static SimulatorTcpEndpoint Start(SimulatedDeviceHost host, int port, IPAddress? address = null, CancellationToken stopping = default)
    {
        ArgumentNullException.ThrowIfNull(host);
        ArgumentOutOfRangeException.ThrowIfNegative(port);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(port, IPEndPoint.MaxPort);
        return new SimulatorTcpEndpoint(host, new IPEndPoint(address ?? IPAddress.Loopback, port), stopping);
    }

    /// <inheritdoc/>
    public async ValueTask DisposeAsync()
    {
        await _stop.CancelAsync().ConfigureAwait(false);
        _listener.Stop();
        try
        {
            await _acceptLoop.ConfigureAwait(false);
        }
        catch (Exception ex) when (ex is OperationCanceledException or SocketException or ObjectDisposedException)
        {
            // Stopping the listener ends the loop with one of these.
        }

        _stop.Dispose();
    }

    private async Task AcceptAsync(SimulatedDeviceHost host, CancellationToken stopping)
    {
        while (!stopping.IsCancellationRequested)
        {
            var socket = await _listener.AcceptSocketAsync(stopping).ConfigureAwait(false);
            socket.NoDelay = true;
            _ = host.ServeAsync(new AcceptedSocketTransport(socket), stopping);
        }
    }
}
