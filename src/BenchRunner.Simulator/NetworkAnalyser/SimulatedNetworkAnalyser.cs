using System.Buffers;
using System.Numerics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Simulator.Circuits;

namespace BenchRunner.Simulator.NetworkAnalyser;

/// <summary>
/// A two-port vector network analyser as a plain object: settings validated against its
/// <see cref="NetworkAnalyserLimits"/>, a device-under-test slot (open ports when empty), and
/// sweeps that compute the device's S-parameters with the engine and add receiver noise. The
/// noise has an absolute part (the floor, −90 dB at 10 kHz IF bandwidth by default) and a part
/// proportional to the signal (trace noise); both scale with √(IF bandwidth / 10 kHz) and fall
/// with √(averages), since averaging N sweeps of independent noise divides its rms by √N (the
/// simulator draws the averaged noise directly rather than N sweeps). Deterministic under its
/// seed. Synchronous; every member is safe to call from any thread, one call at a time.
/// </summary>
public sealed class SimulatedNetworkAnalyser
{
    /// <summary>The IF bandwidth at which the noise options are given, and the default: 10 kHz.</summary>
    public static Frequency ReferenceIfBandwidth { get; } = Frequency.FromKilohertz(10);

    /// <summary>The reference impedance of the test ports, 50 Ω.</summary>
    public const double PortOhms = 50;

    private readonly Lock _gate = new();
    private readonly NetworkAnalyserOptions _options;
    private readonly SeededRandom _random;
    private NetworkSweep _settings;
    private FrequencyAxis _axis;
    private ITwoPort _device = OpenPorts.Instance;
    private long _sweepCount;

    /// <summary>Creates the analyser, swept over its whole range in 201 points at 10 kHz IF bandwidth, with nothing connected.</summary>
    /// <param name="options">How it is built; the defaults of <see cref="NetworkAnalyserOptions"/> when null.</param>
    public SimulatedNetworkAnalyser(NetworkAnalyserOptions? options = null)
    {
        _options = options ?? new NetworkAnalyserOptions();
        _random = new SeededRandom(_options.Seed);
        Identity = new InstrumentIdentity("BenchRunner", "SIM-VNA", _options.Serial, _options.Firmware);
        _settings = new NetworkSweep(Limits.MinimumFrequency, Limits.MaximumFrequency, 201, ReferenceIfBandwidth, 1);
        _axis = AxisOf(_settings);
    }

    /// <summary>Who the analyser says it is: maker <c>BenchRunner</c>, model <c>SIM-VNA</c>.</summary>
    public InstrumentIdentity Identity { get; }

    /// <summary>What it accepts.</summary>
    public NetworkAnalyserLimits Limits => _options.Limits;

    /// <summary>The current sweep; IF bandwidth and averages always filled in.</summary>
    public NetworkSweep Settings
    {
        get
        {
            lock (_gate)
            {
                return _settings;
            }
        }
    }

    /// <summary>The frequencies of the current sweep.</summary>
    public FrequencyAxis Axis
    {
        get
        {
            lock (_gate)
            {
                return _axis;
            }
        }
    }

    /// <summary>What is connected between the test ports; <see cref="OpenPorts.Instance"/> when nothing is. Setting null disconnects.</summary>
    public ITwoPort DeviceUnderTest
    {
        get
        {
            lock (_gate)
            {
                return _device;
            }
        }

        set
        {
            lock (_gate)
            {
                _device = value ?? OpenPorts.Instance;
            }
        }
    }

    /// <summary>How many sweeps have been made.</summary>
    public long SweepCount => Interlocked.Read(ref _sweepCount);

    /// <summary>The rms noise magnitude on every sample with the current settings, in dB (the |S21| floor).</summary>
    public double NoiseFloorDb
    {
        get
        {
            lock (_gate)
            {
                return _options.NoiseFloorDb + 20 * Math.Log10(NoiseScale(_settings));
            }
        }
    }

    /// <summary>
    /// How long a real sweep with the current settings would take: one IF-filter settling time
    /// (taken as 1/IFBW) per point and average. The model itself returns at once; a server that
    /// wants to pace its replies can wait this long.
    /// </summary>
    public TimeSpan SweepDuration
    {
        get
        {
            lock (_gate)
            {
                return TimeSpan.FromSeconds(_settings.Points * _settings.Averages!.Value / _settings.IfBandwidth!.Value.Hertz);
            }
        }
    }

    /// <summary>Every way in which <paramref name="sweep"/> breaks the limits; empty when it keeps them.</summary>
    public IReadOnlyList<string> Validate(NetworkSweep sweep) => Limits.Check(sweep);

    /// <summary>
    /// Applies a sweep. A missing IF bandwidth keeps the current one; missing averages keep the current count.
    /// </summary>
    /// <exception cref="ArgumentException">The sweep breaks the limits; the message lists every problem.</exception>
    public void Configure(NetworkSweep sweep)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        var problems = Validate(sweep);
        if (problems.Count > 0)
        {
            throw new ArgumentException("The sweep is outside the analyser's limits: " + string.Join("; ", problems) + ".", nameof(sweep));
        }

        lock (_gate)
        {
            _settings = new NetworkSweep(sweep.Start, sweep.Stop, sweep.Points,
                sweep.IfBandwidth ?? _settings.IfBandwidth, sweep.Averages ?? _settings.Averages);
            _axis = AxisOf(_settings);
        }
    }

    /// <summary>
    /// Sweeps once: takes a snapshot of a device that changes in time, computes its S-parameters
    /// at every point, adds the receiver noise, and returns one trace per requested parameter in
    /// the order asked.
    /// </summary>
    /// <param name="parameters">S11, S21, S12 or S22, at least one.</param>
    /// <exception cref="ArgumentException">No parameter, or <see cref="TraceQuantity.Power"/>, asked.</exception>
    public IReadOnlyList<ComplexTrace> Sweep(IReadOnlyList<TraceQuantity> parameters)
    {
        ArgumentNullException.ThrowIfNull(parameters);
        if (parameters.Count == 0)
        {
            throw new ArgumentException("Ask for at least one S-parameter.", nameof(parameters));
        }

        if (parameters.Contains(TraceQuantity.Power))
        {
            throw new ArgumentException("A network analyser measures S-parameters, not power.", nameof(parameters));
        }

        lock (_gate)
        {
            var device = _device is ITimeVaryingTwoPort changing ? changing.Snapshot() : _device;
            var buffer = ArrayPool<SParameters>.Shared.Rent(_axis.Count);
            try
            {
                var points = buffer.AsSpan(0, _axis.Count);
                TwoPortSweeps.Evaluate(device, _axis.Hertz.AsSpan(), PortOhms, points);
                if (_options.NoiseEnabled)
                {
                    AddNoise(points, NoiseScale(_settings));
                }

                Interlocked.Increment(ref _sweepCount);
                return TwoPortSweeps.ToTraces(_axis, points, parameters);
            }
            finally
            {
                ArrayPool<SParameters>.Shared.Return(buffer);
            }
        }
    }

    private void AddNoise(Span<SParameters> points, double scale)
    {
        double floor = Math.Pow(10, _options.NoiseFloorDb / 20) * scale;
        double relative = _options.TraceNoiseFraction * scale;
        for (int i = 0; i < points.Length; i++)
        {
            var p = points[i];
            points[i] = new SParameters(Noisy(p.S11, floor, relative), Noisy(p.S21, floor, relative), Noisy(p.S12, floor, relative), Noisy(p.S22, floor, relative));
        }
    }

    private Complex Noisy(Complex sample, double floor, double relative)
    {
        // Complex Gaussian noise of rms magnitude σ has σ/√2 in each of its two parts.
        const double perPart = 0.70710678118654752;
        var multiplier = new Complex(1 + relative * perPart * _random.NextNormal(), relative * perPart * _random.NextNormal());
        var additive = new Complex(floor * perPart * _random.NextNormal(), floor * perPart * _random.NextNormal());
        return sample * multiplier + additive;
    }

    private static double NoiseScale(NetworkSweep s) =>
        Math.Sqrt(s.IfBandwidth!.Value.Hertz / ReferenceIfBandwidth.Hertz) / Math.Sqrt(s.Averages!.Value);

    private static FrequencyAxis AxisOf(NetworkSweep s) => FrequencyAxis.Linear(s.Start, s.Stop, s.Points);
}
