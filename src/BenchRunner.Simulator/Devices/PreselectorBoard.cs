using BenchRunner.Simulator.Circuits;

namespace BenchRunner.Simulator.Devices;

/// <summary>
/// One 137 MHz preselector board on the bench: its own parts, and trimmers that can be set or can
/// follow a <see cref="TrimmerScript"/> in time. A network analyser takes a <see cref="Snapshot"/>
/// at the start of every sweep. Safe to use from several threads.
/// </summary>
public sealed class PreselectorBoard : ITimeVaryingTwoPort
{
    private readonly Lock _gate = new();
    private TrimmerSettings _trimmers;
    private Network _network;
    private TrimmerScript? _script;
    private TimeProvider? _clock;
    private long _scriptStart;

    /// <summary>Creates a board.</summary>
    /// <param name="serial">The board's serial, e.g. <c>PSF-24-0001</c>.</param>
    /// <param name="parts">Its component values.</param>
    /// <param name="trimmers">Its trimmer settings, within the trimmers' travel.</param>
    /// <exception cref="ArgumentOutOfRangeException">A trimmer outside its travel.</exception>
    public PreselectorBoard(string serial, PreselectorParts parts, TrimmerSettings trimmers)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(serial);
        Serial = serial;
        Parts = parts ?? throw new ArgumentNullException(nameof(parts));
        _trimmers = CheckTravel(trimmers, nameof(trimmers));
        _network = Preselector137.BuildNetwork(parts, _trimmers);
    }

    /// <summary>The board's serial.</summary>
    public string Serial { get; }

    /// <summary>The board's component values.</summary>
    public PreselectorParts Parts { get; }

    /// <summary>
    /// The trimmer settings as of the last snapshot or setting. Setting them stops a script that
    /// was being followed.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">A trimmer outside its travel.</exception>
    public TrimmerSettings Trimmers
    {
        get
        {
            lock (_gate)
            {
                return _trimmers;
            }
        }

        set
        {
            CheckTravel(value, nameof(value));
            lock (_gate)
            {
                _script = null;
                _clock = null;
                Apply(value);
            }
        }
    }

    /// <summary>True while a script is being followed.</summary>
    public bool FollowingScript
    {
        get
        {
            lock (_gate)
            {
                return _script is not null;
            }
        }
    }

    /// <summary>The circuit as of the last snapshot or setting.</summary>
    public Network Network => Volatile.Read(ref _network);

    /// <summary>
    /// Starts following <paramref name="script"/>: from now on, each snapshot sets the trimmers to
    /// the script's settings at the time elapsed on <paramref name="clock"/> since this call
    /// (clamped into the trimmers' travel).
    /// </summary>
    public void Follow(TrimmerScript script, TimeProvider clock)
    {
        ArgumentNullException.ThrowIfNull(script);
        ArgumentNullException.ThrowIfNull(clock);
        lock (_gate)
        {
            _script = script;
            _clock = clock;
            _scriptStart = clock.GetTimestamp();
            Apply(Clamp(script.At(TimeSpan.Zero)));
        }
    }

    /// <inheritdoc/>
    public ITwoPort Snapshot()
    {
        lock (_gate)
        {
            if (_script is not null && _clock is not null)
            {
                Apply(Clamp(_script.At(_clock.GetElapsedTime(_scriptStart))));
            }

            return _network;
        }
    }

    /// <inheritdoc/>
    public SParameters Evaluate(double hertz, double referenceOhms) => Network.Evaluate(hertz, referenceOhms);

    /// <inheritdoc/>
    public override string ToString() => $"{Serial} (trimmers {Trimmers})";

    private void Apply(TrimmerSettings settings)
    {
        if (settings != _trimmers)
        {
            _trimmers = settings;
            Volatile.Write(ref _network, Preselector137.BuildNetwork(Parts, settings));
        }
    }

    private static TrimmerSettings Clamp(TrimmerSettings s) => TrimmerSettings.FromPicofarads(
        Math.Clamp(s.InputPicofarads, Preselector137.TrimmerMinimumPicofarads, Preselector137.TrimmerMaximumPicofarads),
        Math.Clamp(s.MiddlePicofarads, Preselector137.TrimmerMinimumPicofarads, Preselector137.TrimmerMaximumPicofarads),
        Math.Clamp(s.OutputPicofarads, Preselector137.TrimmerMinimumPicofarads, Preselector137.TrimmerMaximumPicofarads));

    private static TrimmerSettings CheckTravel(TrimmerSettings trimmers, string paramName) =>
        Preselector137.WithinTravel(trimmers)
            ? trimmers
            : throw new ArgumentOutOfRangeException(paramName, trimmers,
                $"Each trimmer reaches {Preselector137.TrimmerMinimumPicofarads} pF to {Preselector137.TrimmerMaximumPicofarads} pF.");
}
