using System.Collections.Immutable;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.RfMath;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Simulator.Bench;

namespace BenchRunner.Simulator.Spectrum;

/// <summary>
/// A simulated swept spectrum analyser, model SIM-SA: whatever its input source delivers is seen
/// through an input attenuator, a mixer with its own noise, distortion and compression, and a
/// Gaussian resolution filter, with the attenuation compensated in the IF. docs/simulator-spectrum.md
/// gives the model and its sources.
/// </summary>
/// <remarks>
/// Settings are validated as they are made and kept as one immutable snapshot, so a sweep always
/// sees a consistent set. Meant for one caller at a time (any thread); the input source may be
/// changed from another thread. Noise comes from a <see cref="Random"/> seeded at construction, so
/// the sequence of sweeps is reproducible.
/// </remarks>
public sealed class SimulatedSpectrumAnalyser
{
    /// <summary>The model name in the identity.</summary>
    public const string ModelName = "SIM-SA";

    /// <summary>The fewest trace points.</summary>
    public const int MinPoints = 2;

    /// <summary>The most trace points.</summary>
    public const int MaxPoints = 10001;

    /// <summary>The trace points after construction.</summary>
    public const int DefaultPoints = 401;

    /// <summary>
    /// The equivalent noise bandwidth of the Gaussian RBW filter divided by its −3 dB bandwidth,
    /// √(π / (4·ln 2)) ≈ 1.0645: pass it to channel-power figures.
    /// </summary>
    public static readonly double NoiseBandwidthFactor = Math.Sqrt(Math.PI / (4 * Math.Log(2)));

    /// <summary>The resolution bandwidths available: 10 Hz to 1 MHz in 1–3–10 steps.</summary>
    public static ImmutableArray<Frequency> ResolutionBandwidths { get; } =
        [.. new[] { 10, 30, 100, 300, 1e3, 3e3, 10e3, 30e3, 100e3, 300e3, 1e6 }.Select(Frequency.FromHertz)];

    /// <summary>The input attenuator's settings: 0 to 50 dB in 10 dB steps.</summary>
    public static ImmutableArray<Ratio> AttenuationSteps { get; } =
        [.. Enumerable.Range(0, 6).Select(k => Ratio.FromDecibels(10 * k))];

    /// <summary>The declared frequency range: 100 kHz to 1.5 GHz (invented).</summary>
    public static FrequencyRange FrequencyRange { get; } = FrequencyRange.Between(Frequency.FromKilohertz(100), Frequency.FromGigahertz(1.5));

    /// <summary>The declared maximum total input level: +20 dBm (invented).</summary>
    public static Level MaxInputLevel { get; } = Level.FromDbm(20);

    /// <summary>The level above which a real input would be damaged: +30 dBm (invented).</summary>
    public static Level DamageLevel { get; } = Level.FromDbm(30);

    /// <summary>The lowest reference level: −130 dBm.</summary>
    public static Level LowestReferenceLevel { get; } = Level.FromDbm(-130);

    /// <summary>The highest reference level: +30 dBm.</summary>
    public static Level HighestReferenceLevel { get; } = Level.FromDbm(30);

    private static readonly ISignalSource Nothing = Scene.Empty;

    private readonly SpectrumAnalyserOptions _options;
    private readonly Random _random;
    private readonly SweepRenderer _renderer = new();
    private readonly List<Emission> _inputs = [];
    private volatile AnalyserSettings _settings;
    private volatile ISignalSource _input = Nothing;
    private volatile bool _overloadSeen;
    private volatile bool _damageLevelSeen;

    /// <summary>
    /// Creates an analyser with nothing connected, sweeping 136 MHz to 139 MHz with 401 points,
    /// RBW 10 kHz, 10 dB input attenuation and a 0 dBm reference level.
    /// </summary>
    /// <param name="seed">Seeds the noise; the same seed and the same calls give the same traces.</param>
    /// <param name="options">The front end's properties; the defaults of <see cref="SpectrumAnalyserOptions"/> when null.</param>
    /// <exception cref="ArgumentException">The options are invalid.</exception>
    public SimulatedSpectrumAnalyser(int seed, SpectrumAnalyserOptions? options = null)
    {
        _options = options ?? new SpectrumAnalyserOptions();
        _options.Validate();
        _random = new Random(seed);
        _settings = new AnalyserSettings(
            Frequency.FromMegahertz(136), Frequency.FromMegahertz(139), Frequency.FromKilohertz(10),
            Ratio.FromDecibels(10), Level.FromDbm(0), DefaultPoints);
        Identity = SimulatorIdentity.Create(ModelName, _options.Serial);
    }

    /// <summary>Maker <c>BenchRunner</c>, model <c>SIM-SA</c>, the serial of the options, the simulator's version.</summary>
    public InstrumentIdentity Identity { get; }

    /// <summary>The declared limits: <see cref="FrequencyRange"/> and <see cref="MaxInputLevel"/>.</summary>
    public InstrumentLimits Limits { get; } = new(FrequencyRange: FrequencyRange, MaxInputLevel: MaxInputLevel);

    /// <summary>The front end's properties.</summary>
    public SpectrumAnalyserOptions Options => _options;

    /// <summary>The swept range, start and stop both included.</summary>
    public FrequencyRange Span => FrequencyRange.Between(_settings.Start, _settings.Stop);

    /// <summary>The resolution bandwidth: one of <see cref="ResolutionBandwidths"/>.</summary>
    /// <exception cref="ArgumentOutOfRangeException">On set: not one of <see cref="ResolutionBandwidths"/>.</exception>
    public Frequency ResolutionBandwidth
    {
        get => _settings.ResolutionBandwidth;
        set => _settings = _settings.WithResolutionBandwidth(CheckResolutionBandwidth(value));
    }

    /// <summary>The input attenuation: one of <see cref="AttenuationSteps"/>.</summary>
    /// <exception cref="ArgumentOutOfRangeException">On set: not one of <see cref="AttenuationSteps"/>.</exception>
    public Ratio InputAttenuation
    {
        get => _settings.Attenuation;
        set => _settings = _settings.WithAttenuation(CheckAttenuation(value));
    }

    /// <summary>
    /// The level at the top of the display. Kept for the display and the protocol; the simulated
    /// log amplifier has the range to show levels above it unclipped.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">On set: outside <see cref="LowestReferenceLevel"/> to <see cref="HighestReferenceLevel"/>.</exception>
    public Level ReferenceLevel
    {
        get => _settings.ReferenceLevel;
        set => _settings = _settings.WithReferenceLevel(CheckReferenceLevel(value));
    }

    /// <summary>The number of trace points, <see cref="MinPoints"/> to <see cref="MaxPoints"/>; 401 after construction.</summary>
    /// <exception cref="ArgumentOutOfRangeException">On set: outside that range.</exception>
    public int Points
    {
        get => _settings.Points;
        set => _settings = _settings.WithPoints(CheckPoints(value));
    }

    /// <summary>The frequencies of the next sweep's points: linear over <see cref="Span"/>.</summary>
    public FrequencyAxis Axis => _settings.Axis;

    /// <summary>
    /// The mean noise power each point shows when no signal is near, referred to the input:
    /// kT·RBW + NF + attenuation (T = the options' noise temperature).
    /// </summary>
    public Level DisplayedAverageNoiseLevel => NoiseLevel(_settings);

    /// <summary>What is connected to the input; an empty scene when nothing is.</summary>
    public ISignalSource Input => _input;

    /// <summary>Sets the span from start to stop, both included.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Stop not above start, or either outside <see cref="FrequencyRange"/>.</exception>
    public void SetSpan(Frequency start, Frequency stop)
    {
        CheckSpan(start, stop);
        _settings = _settings.WithSpan(start, stop);
    }

    /// <summary>Sets the span as <paramref name="centre"/> ± <paramref name="width"/>/2.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A zero width, or a range reaching outside <see cref="FrequencyRange"/>.</exception>
    public void SetCentreSpan(Frequency centre, Frequency width)
    {
        double start = centre.Hertz - width.Hertz / 2;
        if (start < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(width), width.Hertz, $"A {width} span around {centre} reaches below 0 Hz.");
        }

        SetSpan(Frequency.FromHertz(start), Frequency.FromHertz(centre.Hertz + width.Hertz / 2));
    }

    /// <summary>Applies all of <paramref name="settings"/> at once, or none when any is invalid (points unchanged when not given).</summary>
    /// <exception cref="ArgumentOutOfRangeException">A setting outside what SIM-SA offers; the message names it.</exception>
    public void Configure(SpectrumSettings settings)
    {
        ArgumentNullException.ThrowIfNull(settings);
        CheckSpan(settings.Span.Start, settings.Span.Stop);
        _settings = new AnalyserSettings(
            settings.Span.Start,
            settings.Span.Stop,
            CheckResolutionBandwidth(settings.ResolutionBandwidth),
            CheckAttenuation(settings.InputAttenuation),
            CheckReferenceLevel(settings.ReferenceLevel),
            settings.Points is { } points ? CheckPoints(points) : _settings.Points);
    }

    /// <summary>Connects <paramref name="source"/> to the input, replacing what was there.</summary>
    public void Connect(ISignalSource source)
    {
        ArgumentNullException.ThrowIfNull(source);
        _input = source;
    }

    /// <summary>Leaves the input open: only the analyser's own noise is seen.</summary>
    public void Disconnect() => _input = Nothing;

    /// <summary>The total power at the input now, against the declared maximum and the damage level.</summary>
    public InputProtectionStatus InputStatus => Observe(TotalInput(_input.Emissions()));

    /// <summary>True when a sweep or a status read has found the input above <see cref="MaxInputLevel"/> since the flags were last cleared.</summary>
    public bool InputOverloadSeen => _overloadSeen;

    /// <summary>True when a sweep or a status read has found the input above <see cref="DamageLevel"/> since the flags were last cleared.</summary>
    public bool DamageLevelSeen => _damageLevelSeen;

    /// <summary>Clears <see cref="InputOverloadSeen"/> and <see cref="DamageLevelSeen"/>.</summary>
    public void ClearInputFlags()
    {
        _overloadSeen = false;
        _damageLevelSeen = false;
    }

    /// <summary>The RBW in <see cref="ResolutionBandwidths"/> nearest to <paramref name="requested"/> on a log scale (the lower on a tie).</summary>
    public static Frequency NearestResolutionBandwidth(Frequency requested)
    {
        double target = Math.Log(Math.Max(requested.Hertz, 1e-3));
        return ResolutionBandwidths.MinBy(r => Math.Abs(Math.Log(r.Hertz) - target));
    }

    /// <summary>
    /// Sweeps once with the current settings and input: each point shows the input's spectral lines
    /// and the mixer's own products seen through the RBW filter, plus noise, in dBm referred to the input.
    /// </summary>
    public PowerTrace Sweep()
    {
        var settings = _settings;
        _inputs.Clear();
        _inputs.AddRange(_input.Emissions());
        Observe(TotalInput(_inputs));

        double attenuation = settings.Attenuation.Decibels;
        double rbw = settings.ResolutionBandwidth.Hertz;
        double reach = SweepRenderer.ReachInRbw * rbw;
        double noiseDbm = NoiseLevel(settings).Dbm;
        _renderer.Begin(settings.Start.Hertz - reach, settings.Stop.Hertz + reach);

        double compression = MixerCompressionDb(attenuation);
        foreach (var emission in _inputs)
        {
            _renderer.Add(emission, emission.Level.Dbm - compression);
        }

        // Products 60 dB below the mean noise change no displayed level by as much as 1e-5 dB.
        MixerProducts.AddTo(
            _renderer, _inputs, attenuation, _options.SecondOrderIntercept.Dbm, _options.ThirdOrderIntercept.Dbm, noiseDbm - 60);
        var levels = _renderer.Render(settings.Axis, rbw, Math.Pow(10, noiseDbm / 10), _random);
        return new PowerTrace(settings.Axis, levels);
    }

    private Level NoiseLevel(AnalyserSettings settings) =>
        ThermalNoise.NoiseFloor(settings.ResolutionBandwidth, _options.NoiseFigure, _options.NoiseTemperatureKelvin).Plus(settings.Attenuation);

    /// <summary>The gain lost in the mixer, driven by the total power reaching it.</summary>
    private double MixerCompressionDb(double attenuationDb)
    {
        double milliwatts = 0;
        foreach (var emission in _inputs)
        {
            milliwatts += Math.Pow(10, (emission.Level.Dbm - attenuationDb) / 10);
        }

        return milliwatts > 0 ? _options.MixerCompression.CompressionDb(10 * Math.Log10(milliwatts)) : 0;
    }

    private static Level? TotalInput(IEnumerable<Emission> emissions)
    {
        double milliwatts = emissions.Sum(e => Math.Pow(10, e.Level.Dbm / 10));
        return milliwatts > 0 ? Level.FromDbm(10 * Math.Log10(milliwatts)) : null;
    }

    private InputProtectionStatus Observe(Level? total)
    {
        var status = new InputProtectionStatus(total, MaxInputLevel, DamageLevel);
        if (status.AboveMaximum)
        {
            _overloadSeen = true;
        }

        if (status.AboveDamageLevel)
        {
            _damageLevelSeen = true;
        }

        return status;
    }

    private static void CheckSpan(Frequency start, Frequency stop)
    {
        if (stop <= start)
        {
            throw new ArgumentOutOfRangeException(nameof(stop), stop.Hertz, $"The span's stop ({stop}) must be above its start ({start}).");
        }

        if (!FrequencyRange.Contains(start) || !FrequencyRange.Contains(stop))
        {
            throw new ArgumentOutOfRangeException(nameof(start), start.Hertz, $"The span {start} to {stop} reaches outside {ModelName}'s range, {FrequencyRange}.");
        }
    }

    private static Frequency CheckResolutionBandwidth(Frequency rbw) =>
        ResolutionBandwidths.Contains(rbw)
            ? rbw
            : throw new ArgumentOutOfRangeException(nameof(rbw), rbw.Hertz,
                $"{ModelName} has no {rbw} resolution filter; it offers {string.Join(", ", ResolutionBandwidths)}.");

    private static Ratio CheckAttenuation(Ratio attenuation) =>
        AttenuationSteps.Contains(attenuation)
            ? attenuation
            : throw new ArgumentOutOfRangeException(nameof(attenuation), attenuation.Decibels,
                $"{ModelName}'s input attenuator cannot be set to {attenuation}; it offers {string.Join(", ", AttenuationSteps)}.");

    private static Level CheckReferenceLevel(Level level) =>
        level >= LowestReferenceLevel && level <= HighestReferenceLevel
            ? level
            : throw new ArgumentOutOfRangeException(nameof(level), level.Dbm,
                $"The reference level {level} is outside {LowestReferenceLevel} to {HighestReferenceLevel}.");

    private static int CheckPoints(int points) =>
        points is >= MinPoints and <= MaxPoints
            ? points
            : throw new ArgumentOutOfRangeException(nameof(points), points, $"{ModelName} sweeps {MinPoints} to {MaxPoints} points.");
}
