using BenchRunner.Instruments.Transports;
using BenchRunner.Simulator.Bench;
using BenchRunner.Simulator.Protocols;
using BenchRunner.Simulator.Protocols.Hosting;
using BenchRunner.Simulator.Protocols.Raw;
using BenchRunner.Simulator.Protocols.Scpi;

namespace BenchRunner.Simulator.Endpoints;

/// <summary>
/// The virtual bench ready to be served: one model per instrument and a protocol host per
/// instrument and dialect. Every endpoint (in-memory, TCP, pseudo-terminal) of one
/// <see cref="VirtualBenchServers"/> talks to the same models, so a generator setting made over
/// one connection shows on the spectrum analyser read over another. Calls into one model are
/// serialised, whichever endpoint they come from.
/// </summary>
public sealed class VirtualBenchServers
{
    /// <summary>The short names used in <c>sim:NAME</c> connections and by <c>benchrunner sim</c>.</summary>
    public static IReadOnlyDictionary<string, SimulatedInstrument> Names { get; } = new Dictionary<string, SimulatedInstrument>(StringComparer.OrdinalIgnoreCase)
    {
        ["vna"] = SimulatedInstrument.NetworkAnalyser,
        ["sa"] = SimulatedInstrument.SpectrumAnalyser,
        ["gen"] = SimulatedInstrument.SignalGenerator,
    };

    private readonly Dictionary<(SimulatedInstrument, SimulatorDialect), SimulatedDeviceHost> _hosts = [];

    /// <summary>Builds the demo bench (<see cref="VirtualBench.CreateDemo"/>) for <paramref name="seed"/>.</summary>
    public VirtualBenchServers(int seed = 1)
        : this(VirtualBench.CreateDemo(seed))
    {
    }

    /// <summary>Serves the instruments of <paramref name="bench"/>.</summary>
    public VirtualBenchServers(VirtualBench bench)
    {
        ArgumentNullException.ThrowIfNull(bench);
        Bench = bench;
        var gate = new object();
        var vna = new SerialisedNetworkAnalyser(new NetworkAnalyserDevice(bench.NetworkAnalyser), gate);
        var sa = new SerialisedSpectrumAnalyser(new SpectrumAnalyserDevice(bench.SpectrumAnalyser), gate);
        var gen = new SerialisedSignalGenerator(new SignalGeneratorDevice(bench.Generator), gate);
        Add(SimulatedInstrument.NetworkAnalyser, NetworkAnalyserScpiTree.CreateServer(vna), new BenchVnaServer(vna));
        Add(SimulatedInstrument.SpectrumAnalyser, SpectrumAnalyserScpiTree.CreateServer(sa), new BenchSaServer(sa));
        Add(SimulatedInstrument.SignalGenerator, SignalGeneratorScpiTree.CreateServer(gen), new BenchGenServer(gen));
    }

    /// <summary>The models behind the servers.</summary>
    public VirtualBench Bench { get; }

    /// <summary>The host serving <paramref name="instrument"/> in <paramref name="dialect"/>.</summary>
    public SimulatedDeviceHost Host(SimulatedInstrument instrument, SimulatorDialect dialect) => _hosts[(instrument, dialect)];

    /// <summary>
    /// An in-process connection to <paramref name="instrument"/>: the host end of an in-memory
    /// pair whose device end is served until the host end closes or <paramref name="stopping"/> fires.
    /// </summary>
    public ITransport Connect(SimulatedInstrument instrument, SimulatorDialect dialect, CancellationToken stopping = default)
    {
        var (hostEnd, deviceEnd) = InMemoryTransport.CreatePair($"sim:{NameOf(instrument)} ({dialect.ToString().ToLowerInvariant()})");
        _ = ServeInBackgroundAsync(Host(instrument, dialect), deviceEnd, stopping);
        return hostEnd;
    }

    /// <summary>The short name of <paramref name="instrument"/>.</summary>
    public static string NameOf(SimulatedInstrument instrument) => Names.First(kv => kv.Value == instrument).Key;

    private static async Task ServeInBackgroundAsync(SimulatedDeviceHost host, InMemoryTransport deviceEnd, CancellationToken stopping)
    {
        await deviceEnd.OpenAsync(stopping).ConfigureAwait(false);
        await host.ServeAsync(deviceEnd, stopping).ConfigureAwait(false);
    }

    private void Add(SimulatedInstrument instrument, IDeviceProtocol scpi, IDeviceProtocol raw)
    {
        _hosts[(instrument, SimulatorDialect.Scpi)] = new SimulatedDeviceHost(scpi);
        _hosts[(instrument, SimulatorDialect.Raw)] = new SimulatedDeviceHost(raw);
    }
}
