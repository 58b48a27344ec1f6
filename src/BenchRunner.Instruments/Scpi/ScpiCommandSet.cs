namespace BenchRunner.Instruments.Scpi;

/// <summary>
/// What a SCPI instrument is sent for each capability: a plain options class, filled in code or
/// from a driver profile, checked by <see cref="Validate"/>. The defaults are SCPI-1999-style
/// commands (<c>SENSe:FREQuency:STARt {hz}</c>, <c>INITiate:IMMediate</c>, <c>FORMat:DATA REAL,32</c>,
/// <c>SOURce:POWer {dbm}</c>, ...); real instruments differ in their subsystem commands, so a
/// profile names what its instrument understands. No capability is enabled by default; a set
/// with none enabled is refused unless <see cref="IdentificationOnly"/> says that is meant.
/// Placeholders are typed: see <see cref="ScpiPlaceholder"/>.
/// Do not change a command set after handing it to an instrument.
/// </summary>
public sealed class ScpiCommandSet
{
    /// <summary>Network-analyser commands (disabled by default).</summary>
    public ScpiNetworkCommands Network { get; init; } = new();

    /// <summary>Spectrum-analyser commands (disabled by default).</summary>
    public ScpiSpectrumCommands Spectrum { get; init; } = new();

    /// <summary>Signal-generator commands (disabled by default).</summary>
    public ScpiGeneratorCommands Generator { get; init; } = new();

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
    public bool FetchesTraces => Network.Enabled || Spectrum.Enabled;

    /// <summary>Every problem found, each as <c>where: what</c> (e.g. <c>network.start: ...</c>); empty when valid.</summary>
    public IReadOnlyList<string> Problems()
    {
        var problems = new List<string>();
        if (Network is null || Spectrum is null || Generator is null)
        {
            problems.Add("the network, spectrum and generator sections must not be null");
            return problems;
        }

        bool anyEnabled = Network.Enabled || Spectrum.Enabled || Generator.Enabled;
        if (!anyEnabled && !IdentificationOnly)
        {
            problems.Add("no capability is enabled; enable network, spectrum or generator (or set identificationOnly when that is meant)");
        }
        else if (anyEnabled && IdentificationOnly)
        {
            problems.Add("identificationOnly: a capability is enabled as well; an identification-only set enables none");
        }

        if (Network.Enabled)
        {
            Network.CollectProblems(problems);
        }

        if (Spectrum.Enabled)
        {
            Spectrum.CollectProblems(problems);
        }

        if (Generator.Enabled)
        {
            Generator.CollectProblems(problems);
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
