using System.Collections.Immutable;
using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Simulator.Bench;
using BenchRunner.Simulator.Spectrum;

namespace BenchRunner.Simulator.Generator;

/// <summary>
/// A simulated CW signal generator, model SIM-GEN: a phase-noise-free carrier at a set frequency
/// and level, switched on or off, with real harmonics at fixed levels relative to the carrier.
/// </summary>
/// <remarks>
/// Meant for one caller at a time (any thread). Its state is one immutable snapshot, so an
/// analyser reading <see cref="Emissions"/> from another thread always sees a consistent carrier.
/// </remarks>
public sealed class SimulatedSignalGenerator : ISignalSource
{
    /// <summary>The model name in the identity.</summary>
    public const string ModelName = "SIM-GEN";

    /// <summary>The declared frequency range: 100 kHz to 1.5 GHz (invented).</summary>
    public static FrequencyRange FrequencyRange { get; } = FrequencyRange.Between(Frequency.FromKilohertz(100), Frequency.FromGigahertz(1.5));

    /// <summary>The lowest settable level: −110 dBm (invented).</summary>
    public static Level MinLevel { get; } = Level.FromDbm(-110);

    /// <summary>The highest settable level: +10 dBm (invented).</summary>
    public static Level MaxLevel { get; } = Level.FromDbm(10);

    private static readonly State Initial = new(Frequency.FromMegahertz(137.5), Level.FromDbm(-30), false);

    private readonly ImmutableArray<GeneratorHarmonic> _harmonics;
    private volatile State _state = Initial;

    /// <summary>Creates a generator at 137.5 MHz, −30 dBm, output off.</summary>
    /// <param name="options">Its harmonics and serial; the defaults of <see cref="SignalGeneratorOptions"/> when null.</param>
    /// <exception cref="ArgumentException">The options are invalid.</exception>
    public SimulatedSignalGenerator(SignalGeneratorOptions? options = null)
    {
        options ??= new SignalGeneratorOptions();
        options.Validate();
        _harmonics = [.. options.Harmonics.OrderBy(h => h.Order)];
        Identity = SimulatorIdentity.Create(ModelName, options.Serial);
    }

    /// <summary>Maker <c>BenchRunner</c>, model <c>SIM-GEN</c>, the serial of the options, the simulator's version.</summary>
    public InstrumentIdentity Identity { get; }

    /// <summary>The declared limits: <see cref="FrequencyRange"/>, <see cref="MinLevel"/> and <see cref="MaxLevel"/>.</summary>
    public InstrumentLimits Limits { get; } = new(FrequencyRange: FrequencyRange, MaxOutputLevel: MaxLevel, MinOutputLevel: MinLevel);

    /// <summary>The harmonics it puts out with the carrier, by order.</summary>
    public ImmutableArray<GeneratorHarmonic> Harmonics => _harmonics;

    /// <summary>The carrier frequency; 137.5 MHz after construction.</summary>
    /// <exception cref="ArgumentOutOfRangeException">On set: outside <see cref="FrequencyRange"/>.</exception>
    public Frequency Frequency
    {
        get => _state.Frequency;
        set => _state = _state with
        {
            Frequency = FrequencyRange.Contains(value)
                ? value
                : throw new ArgumentOutOfRangeException(nameof(value), value.Hertz, $"{ModelName} generates {FrequencyRange}, not {value}."),
        };
    }

    /// <summary>The carrier level at the output; −30 dBm after construction.</summary>
    /// <exception cref="ArgumentOutOfRangeException">On set: outside <see cref="MinLevel"/> to <see cref="MaxLevel"/>.</exception>
    public Level Level
    {
        get => _state.Level;
        set => _state = _state with
        {
            Level = value >= MinLevel && value <= MaxLevel
                ? value
                : throw new ArgumentOutOfRangeException(nameof(value), value.Dbm, $"{ModelName} sets levels from {MinLevel} to {MaxLevel}, not {value}."),
        };
    }

    /// <summary>True while the RF output is on; off after construction.</summary>
    public bool OutputOn
    {
        get => _state.OutputOn;
        set => _state = _state with { OutputOn = value };
    }

    /// <summary>Back to 137.5 MHz, −30 dBm, output off.</summary>
    public void Reset() => _state = Initial;

    /// <summary>
    /// With the output on: the carrier, then each harmonic at its order × the frequency and its
    /// level relative to the carrier. Nothing with the output off.
    /// </summary>
    public IEnumerable<Emission> Emissions()
    {
        var state = _state;
        if (!state.OutputOn)
        {
            return [];
        }

        var emissions = new List<Emission>(1 + _harmonics.Length) { Emission.Cw(state.Frequency, state.Level) };
        foreach (var harmonic in _harmonics)
        {
            emissions.Add(Emission.Cw(Frequency.FromHertz(harmonic.Order * state.Frequency.Hertz), state.Level.Plus(harmonic.RelativeLevel)));
        }

        return emissions;
    }

    private sealed record State(Frequency Frequency, Level Level, bool OutputOn);
}
