using BenchmarkDotNet.Attributes;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Simulator.Circuits;
using BenchRunner.Simulator.Devices;
using BenchRunner.Simulator.NetworkAnalyser;

namespace BenchRunner.Benchmarks;

/// <summary>A 401-point sweep of the 137 MHz preselector, the virtual bench's everyday work.</summary>
[MemoryDiagnoser]
public class PreselectorSweepBenchmarks
{
    private static readonly TraceQuantity[] S21Only = [TraceQuantity.S21];
    private static readonly TraceQuantity[] AllFour = [TraceQuantity.S11, TraceQuantity.S21, TraceQuantity.S12, TraceQuantity.S22];

    private readonly FrequencyAxis _axis = FrequencyAxis.Linear(Frequency.FromMegahertz(127.5), Frequency.FromMegahertz(147.5), 401);
    private readonly Network _network = Preselector137.BuildNetwork(Preselector137.NominalParts, Preselector137.TunedTrimmers);
    private readonly SimulatedNetworkAnalyser _analyser = new();

    /// <summary>Connects the board to the analyser and sets the sweep.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _analyser.Configure(new NetworkSweep(_axis.Start, _axis.Stop, _axis.Count));
        _analyser.DeviceUnderTest = Preselector137.TunedBoard();
    }

    /// <summary>The engine alone: S21 of the circuit at 401 points.</summary>
    [Benchmark(Baseline = true)]
    public IReadOnlyList<ComplexTrace> NetworkS21() => _network.Sweep(_axis, S21Only);

    /// <summary>The engine alone: all four S-parameters at 401 points.</summary>
    [Benchmark]
    public TraceSet NetworkAllFour() => _network.Sweep(_axis);

    /// <summary>The simulated analyser: snapshot, four S-parameters, noise on every point.</summary>
    [Benchmark]
    public IReadOnlyList<ComplexTrace> AnalyserAllFour() => _analyser.Sweep(AllFour);
}
