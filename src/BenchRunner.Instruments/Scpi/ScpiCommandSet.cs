using BenchRunner.Instruments.Kinds;

namespace BenchRunner.Instruments.Scpi;

/// <summary>
/// What a SCPI instrument is sent for each capability: a plain options class, filled in code or
/// from a driver profile, checked by <see cref="Validate"/>. The defaults are SCPI-1999-style
/// commands (<c>SENSe:FREQuency:STARt {hz}</c>, <c>INITiate:IMMediate</c>, <c>FORMat:DATA REAL,32</c>,
/// <c>SOURce:POWer {dbm}</c>, ...); real instruments differ in their subsystem commands, so a
/// profile names what its instrument understands. No capability is enabled by default; a set
/// with none enabled is refused unless <see cref="IdentificationOnly"/> says that is meant.
/// Placeholders are typed: see <see cref="ScpiPlaceholder"/>.
/// Each kind of instrument has its section (<see cref="Sections"/>); the built-in kinds' sections are
/// also reached by name (<see cref="Network"/>, <see cref="Spectrum"/>, <see cref="Generator"/>).
/// Do not change a command set after handing it to an instrument.
/// </summary>
public sealed class ScpiCommandSet
{
    private readonly OrderedDictionary<InstrumentKind, IScpiCommandSection> _sections = [];

    /// <summary>A set with every built-in kind's section at its defaults, disabled.</summary>
    public ScpiCommandSet()
        : this(InstrumentKindRegistry.BuiltIn)
    {
    }

    /// <summary>A set with a section at its defaults, disabled, for every built-in kind and every kind of <paramref name="kinds"/>.</summary>
    public ScpiCommandSet(InstrumentKindRegistry kinds)
    {
        ArgumentNullException.ThrowIfNull(kinds);
        foreach (var kind in InstrumentKindRegistry.BuiltIn.Kinds.Concat(kinds.Kinds).Distinct())
        {
            _sections[kind] = kind.ScpiDefaults();
        }
    }

    /// <summary>Network-analyser commands (disabled by default): the section of <see cref="InstrumentKind.NetworkAnalyser"/>.</summary>
    public ScpiNetworkCommands Network
    {
        get => (ScpiNetworkCommands)_sections[InstrumentKind.NetworkAnalyser];
        init => _sections[InstrumentKind.NetworkAnalyser] = value;
    }

    /// <summary>Spectrum-analyser commands (disabled by default): the section of <see cref="InstrumentKind.SpectrumAnalyser"/>.</summary>
    public ScpiSpectrumCommands Spectrum
    {
        get => (ScpiSpectrumCommands)_sections[InstrumentKind.SpectrumAnalyser];
        init => _sections[InstrumentKind.SpectrumAnalyser] = value;
    }

    /// <summary>Signal-generator commands (disabled by default): the section of <see cref="InstrumentKind.SignalGenerator"/>.</summary>
    public ScpiGeneratorCommands Generator
    {
        get => (ScpiGeneratorCommands)_sections[InstrumentKind.SignalGenerator];
        init => _sections[InstrumentKind.SignalGenerator] = value;
    }

    /// <summary>
    /// Every kind's section, the built-in kinds' first. Setting it adds the sections it holds, or
    /// replaces those of kinds already present; the others stay.
    /// </summary>
    public IReadOnlyDictionary<InstrumentKind, IScpiCommandSection> Sections
    {
        get => _sections;
        init
        {
            ArgumentNullException.ThrowIfNull(value);
            foreach (var (kind, section) in value)
            {
                _sections[kind] = section;
            }
        }
    }

    /// <summary>
    /// Starts one sweep; the adapter then waits with <c>*OPC?</c> before fetching data. Required
    /// for the analysers. Default <c>INITiate:IMMediate</c>.
    /// </summary>
    public string? Trigger { get; init; } = "INITiate:IMMediate";

    /// <summary>The format in which trace data is fetched. Default <see cref="ScpiDataFormat.Real32"/>.</summary>
    public ScpiDataFormat DataFormat { get; init; } = ScpiDataFormat.Real32;

    /// <summary>The byte order of binary trace data. Default <see cref="ScpiByteOrder.Normal"/> (big-endian).</summary>
    public ScpiByteOrder ByteOrder { get; init; } = ScpiByteOrder.Normal;

    /// <summary>
    /// Selects <see cref="DataFormat"/> at connection. Optional: null when the instrument has no such
    /// command and always sends data as <see cref="DataFormat"/> says. Default <c>FORMat:DATA {format}</c>.
    /// </summary>
    public string? DataFormatCommand { get; init; } = "FORMat:DATA {format}";

    /// <summary>
    /// Selects <see cref="ByteOrder"/> at connection, for binary formats only. Optional: null when the
    /// instrument has no such command and always uses <see cref="ByteOrder"/>. Default <c>FORMat:BORDer {order}</c>.
    /// </summary>
    public string? ByteOrderCommand { get; init; } = "FORMat:BORDer {order}";

    /// <summary>
    /// Whether the set deliberately enables no capability: the instrument is then only connected
    /// and identified (<c>*CLS</c>, <c>*IDN?</c>). Default false, so that a set with nothing enabled,
    /// usually a forgotten <c>Enabled = true</c>, is reported by <see cref="Problems"/>; a set that
    /// is identification-only and enables a capability as well is reported too.
    /// </summary>
    public bool IdentificationOnly { get; init; }

    /// <summary>True when a capability that fetches traces is enabled.</summary>
    public bool FetchesTraces => _sections.Values.Any(s => s is { Enabled: true, FetchesTraces: true });

    /// <summary>Every problem found, each as <c>where: what</c> (e.g. <c>network.start: ...</c>); empty when valid.</summary>
    public IReadOnlyList<string> Problems()
    {
        var problems = new List<string>();
        // A section set to null! from code would fail later with a less helpful message.
        var missing = _sections.Where(s => s.Value is null).Select(s => s.Key.Word).ToList();
        if (missing.Count > 0)
        {
            problems.Add($"the sections must not be null; null: {string.Join(", ", missing)}");
            return problems;
        }

        var enabled = _sections.Values.Where(s => s.Enabled).ToList();
        bool anyEnabled = enabled.Count > 0;
        if (!anyEnabled && !IdentificationOnly)
        {
            problems.Add("no capability is enabled; enable network, spectrum or generator (or set identificationOnly when that is meant)");
        }
        else if (anyEnabled && IdentificationOnly)
        {
            problems.Add("identificationOnly: a capability is enabled as well; an identification-only set enables none");
        }

        foreach (var section in enabled)
        {
            section.CollectProblems(problems);
        }

        if (!Enum.IsDefined(DataFormat))
        {
            problems.Add($"dataFormat: {DataFormat} is not a data format; expected Ascii, Real32 or Real64");
        }

        if (!Enum.IsDefined(ByteOrder))
        {
            problems.Add($"byteOrder: {ByteOrder} is not a byte order; expected Normal or Swapped");
        }

        ScpiCommandChecks.Check(problems, "trigger", Trigger, null, required: FetchesTraces);
        ScpiCommandChecks.Check(problems, "dataFormatCommand", DataFormatCommand, ScpiPlaceholder.Format, required: false);
        ScpiCommandChecks.Check(problems, "byteOrderCommand", ByteOrderCommand, ScpiPlaceholder.Order, required: false);
        return problems;
    }

    /// <summary>Throws when the command set has any problem, listing them all.</summary>
    /// <exception cref="ArgumentException">One or more problems; the message lists every one.</exception>
    public void Validate()
    {
        var problems = Problems();
        if (problems.Count > 0)
        {
            throw new ArgumentException("Invalid SCPI command set: " + string.Join("; ", problems) + ".");
        }
    }
}
