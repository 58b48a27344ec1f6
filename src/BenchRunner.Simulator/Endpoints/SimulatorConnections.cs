using BenchRunner.Instruments.Connections;
using BenchRunner.Instruments.Errors;

namespace BenchRunner.Simulator.Endpoints;

/// <summary>
/// Makes <c>sim:NAME[?dialect=scpi|raw]</c> connections (NAME: <c>vna</c>, <c>sa</c> or
/// <c>gen</c>; SCPI by default) reach the in-process virtual bench.
/// </summary>
public static class SimulatorConnections
{
    /// <summary>Registers the <c>sim:</c> kind in <paramref name="factory"/>, served by <paramref name="servers"/>.</summary>
    /// <param name="factory">The transport factory to extend.</param>
    /// <param name="servers">The virtual bench every <c>sim:</c> connection talks to.</param>
    /// <param name="stopping">Ends every in-process session when it fires.</param>
    public static TransportFactory Register(TransportFactory factory, VirtualBenchServers servers, CancellationToken stopping = default)
    {
        ArgumentNullException.ThrowIfNull(factory);
        ArgumentNullException.ThrowIfNull(servers);
        return factory.Register(ConnectionSpec.SimulatorScheme, spec =>
        {
            var (instrument, dialect) = Resolve(spec);
            return servers.Connect(instrument, dialect, stopping);
        });
    }

    /// <summary>Which instrument and dialect a <c>sim:</c> connection asks for.</summary>
    /// <exception cref="InstrumentException">An unknown instrument name, dialect or option (not transient).</exception>
    public static (SimulatedInstrument Instrument, SimulatorDialect Dialect) Resolve(ConnectionSpec spec)
    {
        ArgumentNullException.ThrowIfNull(spec);
        if (!VirtualBenchServers.Names.TryGetValue(spec.Target, out var instrument))
        {
            throw new InstrumentException(
                $"the virtual bench has no instrument \"{spec.Target}\"; expected one of {string.Join(", ", VirtualBenchServers.Names.Keys)} (e.g. sim:vna)",
                isTransient: false);
        }

        var dialect = SimulatorDialect.Scpi;
        foreach (var (key, value) in spec.Options)
        {
            if (!key.Equals("dialect", StringComparison.OrdinalIgnoreCase))
            {
                throw new InstrumentException($"sim: connections take only the option dialect=scpi|raw, not \"{key}\"", isTransient: false);
            }

            dialect = value.ToLowerInvariant() switch
            {
                "scpi" => SimulatorDialect.Scpi,
                "raw" => SimulatorDialect.Raw,
                _ => throw new InstrumentException($"the virtual bench speaks dialect=scpi or dialect=raw, not \"{value}\"", isTransient: false),
            };
        }

        return (instrument, dialect);
    }
}
