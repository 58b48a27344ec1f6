using BenchRunner.Simulator.Devices;
using BenchRunner.Simulator.NetworkAnalyser;
using BenchRunner.Core.Quantities;
using BenchRunner.Simulator.Generator;
using BenchRunner.Simulator.Spectrum;

namespace BenchRunner.Simulator.Bench;

/// <summary>
/// The simulated bench: a signal generator whose output passes through <see cref="Path"/> into a
/// spectrum analyser, whose input also receives the signals of <see cref="Scene"/>. Levels add up
/// in dB through the path's gains and losses.
/// </summary>
/// <remarks>
/// <code>
///   generator ──► Path (cables, attenuator, DUT) ──┐
///                                                  ├──► spectrum analyser
///   scene (signals from outside) ──────────────────┘
/// </code>
/// The network analyser and its device under test join the bench here, next to the generator
/// and the spectrum analyser, when they are added. Until then a DUT's transmission is
/// plugged in as the <see cref="Path"/> (see <see cref="FrequencyResponsePath.FromTransmission"/>).
/// </remarks>
public sealed class VirtualBench
{
    private volatile IRfPath _path;
    private volatile Scene _scene;

    /// <summary>Creates a bench with its analyser's input connected to the generator (through the path) and the scene.</summary>
    /// <param name="seed">Seeds the analyser's noise.</param>
    /// <param name="scene">The signals from outside; none when null.</param>
    /// <param name="path">What lies between generator and analyser; a 0 dB through connection when null.</param>
    /// <param name="analyserOptions">The analyser's front end; defaults when null.</param>
    /// <param name="generatorOptions">The generator's harmonics and serial; defaults when null.</param>
    /// <param name="networkAnalyserOptions">The network analyser's properties; the defaults of <see cref="NetworkAnalyserOptions"/> when null.</param>
    /// <exception cref="ArgumentException">Invalid options.</exception>
    public VirtualBench(
        int seed,
        Scene? scene = null,
        IRfPath? path = null,
        SpectrumAnalyserOptions? analyserOptions = null,
        SignalGeneratorOptions? generatorOptions = null,
        NetworkAnalyserOptions? networkAnalyserOptions = null)
    {
        _scene = scene ?? Scene.Empty;
        _path = path ?? FixedPath.Through;
        Generator = new SimulatedSignalGenerator(generatorOptions);
        SpectrumAnalyser = new SimulatedSpectrumAnalyser(seed, analyserOptions);
        SpectrumAnalyser.Connect(new BenchInput(this));
        NetworkAnalyser = new SimulatedNetworkAnalyser(networkAnalyserOptions);
    }

    /// <summary>The signal generator.</summary>
    public SimulatedSignalGenerator Generator { get; }

    /// <summary>The spectrum analyser.</summary>
    public SimulatedSpectrumAnalyser SpectrumAnalyser { get; }

    /// <summary>The network analyser; its device under test is <see cref="SimulatedNetworkAnalyser.DeviceUnderTest"/> (open ports at first).</summary>
    public SimulatedNetworkAnalyser NetworkAnalyser { get; }

    /// <summary>What lies between the generator's output and the analyser's input; may be swapped at any time (the next sweep sees it).</summary>
    public IRfPath Path
    {
        get => _path;
        set => _path = value ?? throw new ArgumentNullException(nameof(value));
    }

    /// <summary>The signals arriving at the analyser from outside the bench; may be swapped at any time.</summary>
    public Scene Scene
    {
        get => _scene;
        set => _scene = value ?? throw new ArgumentNullException(nameof(value));
    }

    /// <summary>
    /// The demo bench: the demo scene (<see cref="DemoScene"/>) and a 1 dB cable from generator to
    /// spectrum analyser, the generator at 137.5 MHz, −30 dBm, output off, and the tuned
    /// preselector board PSF-24-0001 on the network analyser.
    /// </summary>
    /// <param name="seed">Seeds the analysers' noise.</param>
    public static VirtualBench CreateDemo(int seed)
    {
        var bench = new VirtualBench(seed, DemoScene.Create(), FixedPath.Loss(Ratio.FromDecibels(1)),
            networkAnalyserOptions: new NetworkAnalyserOptions { Seed = seed });
        bench.NetworkAnalyser.DeviceUnderTest = Preselector137.TunedBoard();
        return bench;
    }
}
