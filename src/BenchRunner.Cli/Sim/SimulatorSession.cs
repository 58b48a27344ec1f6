using BenchRunner.Simulator.Endpoints;

namespace BenchRunner.Cli.Sim;

/// <summary>
/// The virtual bench served on TCP ports and/or pseudo-terminals: three instruments, each in
/// both dialects. TCP ports are numbered from a base: <c>vna</c>, <c>sa</c>, <c>gen</c> in SCPI
/// at base+0..2, then in the raw dialect at base+3..5 (a base of 0 takes any free ports).
/// </summary>
public sealed class SimulatorSession : IAsyncDisposable
{
    private static readonly SimulatedInstrument[] Instruments =
        [SimulatedInstrument.NetworkAnalyser, SimulatedInstrument.SpectrumAnalyser, SimulatedInstrument.SignalGenerator];

    private static readonly SimulatorDialect[] Dialects = [SimulatorDialect.Scpi, SimulatorDialect.Raw];

    private readonly List<IAsyncDisposable> _endpoints = [];

    private SimulatorSession(int seed) => Servers = new VirtualBenchServers(seed);

    /// <summary>The bench being served.</summary>
    public VirtualBenchServers Servers { get; }

    /// <summary>Every endpoint, in the order they were opened.</summary>
    public List<SimulatorEndpointInfo> Endpoints { get; } = [];

    /// <summary>Opens the endpoints asked for.</summary>
    /// <exception cref="System.Net.Sockets.SocketException">A TCP port is taken.</exception>
    public static async Task<SimulatorSession> StartAsync(int seed, int? tcpBasePort, bool pty, CancellationToken stopping)
    {
        var session = new SimulatorSession(seed);
        try
        {
            int offset = 0;
            foreach (var dialect in Dialects)
            {
                foreach (var instrument in Instruments)
                {
                    var host = session.Servers.Host(instrument, dialect);
                    if (tcpBasePort is { } basePort)
                    {
                        var tcp = SimulatorTcpEndpoint.Start(host, basePort == 0 ? 0 : basePort + offset, stopping: stopping);
                        session._endpoints.Add(tcp);
                        session.Endpoints.Add(new SimulatorEndpointInfo(instrument, dialect, $"tcp:127.0.0.1:{tcp.LocalEndpoint.Port}"));
                    }

                    if (pty)
                    {
                        var terminal = SimulatorPtyEndpoint.Start(host, $"sim-{VirtualBenchServers.NameOf(instrument)}", stopping);
                        session._endpoints.Add(terminal);
                        session.Endpoints.Add(new SimulatorEndpointInfo(instrument, dialect, $"serial:{terminal.Path}"));
                    }

                    offset++;
                }
            }
        }
        catch
        {
            await session.DisposeAsync().ConfigureAwait(false);
            throw;
        }

        return session;
    }

    /// <inheritdoc/>
    public async ValueTask DisposeAsync()
    {
        foreach (var endpoint in _endpoints)
        {
            await endpoint.DisposeAsync().ConfigureAwait(false);
        }

        _endpoints.Clear();
    }
}
