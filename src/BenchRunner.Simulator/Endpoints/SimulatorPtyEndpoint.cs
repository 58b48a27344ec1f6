using BenchRunner.Instruments.Transports;
using BenchRunner.Simulator.Protocols.Hosting;

namespace BenchRunner.Simulator.Endpoints;

/// <summary>
/// Serves one simulated instrument on a pseudo-terminal (Linux), so that it looks like a serial
/// device at <see cref="Path"/> (e.g. <c>/dev/pts/7</c>) to any program, BenchRunner's serial
/// transport included. Clients may open and close the port as often as they like.
/// </summary>
public sealed class SimulatorPtyEndpoint : IAsyncDisposable
{
    private readonly PseudoTerminal _pty;
    private readonly CancellationTokenSource _stop;
    private readonly Task _serving;

    private SimulatorPtyEndpoint(SimulatedDeviceHost host, string name, CancellationToken stopping)
    {
        _pty = PseudoTerminal.Open(name);
        _stop = CancellationTokenSource.CreateLinkedTokenSource(stopping);
        _serving = ServeAsync(host, _stop.Token);
    }

    /// <summary>The serial device path to open.</summary>
    public string Path => _pty.SlavePath;

    /// <summary>Creates the pseudo-terminal and starts serving it.</summary>
    /// <exception cref="PlatformNotSupportedException">Not on Linux.</exception>
    public static SimulatorPtyEndpoint Start(SimulatedDeviceHost host, string name, CancellationToken stopping = default)
    {
        ArgumentNullException.ThrowIfNull(host);
        return new SimulatorPtyEndpoint(host, name, stopping);
    }

    /// <inheritdoc/>
    public async ValueTask DisposeAsync()
    {
        await _stop.CancelAsync().ConfigureAwait(false);
        try
        {
            await _serving.ConfigureAwait(false);
        }
        catch (OperationCanceledException)
        {
            // Stopping is the expected way out.
        }

        await _pty.DisposeAsync().ConfigureAwait(false);
        _stop.Dispose();
    }

    private async Task ServeAsync(SimulatedDeviceHost host, CancellationToken stopping)
    {
        await _pty.DeviceEnd.OpenAsync(stopping).ConfigureAwait(false);
        await host.ServeAsync(_pty.DeviceEnd, stopping).ConfigureAwait(false);
    }
}
