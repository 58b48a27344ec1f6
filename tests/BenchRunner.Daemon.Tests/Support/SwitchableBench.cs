using BenchRunner.Instruments.Connections;
using BenchRunner.Instruments.Errors;
using BenchRunner.Simulator.Endpoints;

namespace BenchRunner.Daemon.Tests.Support;

/// <summary>The virtual bench with a "cable" per instrument that a test can pull out and plug back in.</summary>
internal sealed class SwitchableBench
{
    private readonly VirtualBenchServers _servers = new(seed: 3);
    private readonly HashSet<string> _unplugged = new(StringComparer.OrdinalIgnoreCase);
    private readonly Lock _lock = new();

    public TransportFactory Transports()
    {
        return new TransportFactory().Register(ConnectionSpec.SimulatorScheme, spec =>
        {
            lock (_lock)
            {
                if (_unplugged.Contains(spec.Target))
                {
                    throw new InstrumentException($"sim:{spec.Target}: the cable is unplugged", isTransient: true) { Instrument = spec.Target };
                }
            }

            var (instrument, dialect) = SimulatorConnections.Resolve(spec);
            return _servers.Connect(instrument, dialect);
        });
    }

    public void Unplug(string name)
    {
        lock (_lock)
        {
            _unplugged.Add(name);
        }
    }

    public void PlugIn(string name)
    {
        lock (_lock)
        {
            _unplugged.Remove(name);
        }
    }
}
