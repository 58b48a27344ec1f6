namespace BenchRunner.Instruments.Scpi;

/// <summary>
/// The commands of the spectrum-analyser capability. Defaults follow the SCPI-1999 subsystems
/// (SENSe, INPut, DISPlay, TRACe); real instruments differ, so a driver profile overrides what its
/// instrument needs. A null optional command means the instrument cannot take that setting.
/// </summary>
public sealed class ScpiSpectrumCommands : IScpiCommandSection
{
    /// <summary>Whether the instrument is a spectrum analyser. Default false.</summary>
    public bool Enabled { get; init; }

    /// <summary>Sets the span's first frequency. Required. Default <c>SENSe:FREQuency:STARt {hz}</c>.</summary>
    public string? Start { get; init; } = "SENSe:FREQuency:STARt {hz}";

    /// <summary>Sets the span's last frequency. Required. Default <c>SENSe:FREQuency:STOP {hz}</c>.</summary>
    public string? Stop { get; init; } = "SENSe:FREQuency:STOP {hz}";

    /// <summary>Sets the resolution bandwidth (RBW). Required. Default <c>SENSe:BANDwidth:RESolution {hz}</c>.</summary>
    public string? ResolutionBandwidth { get; init; } = "SENSe:BANDwidth:RESolution {hz}";

    /// <summary>Sets the input attenuation in dB. Required. Default <c>INPut:ATTenuation {db}</c>.</summary>
    public string? InputAttenuation { get; init; } = "INPut:ATTenuation {db}";

    /// <summary>Sets the reference level (top of the screen) in dBm. Required. Default <c>DISPlay:WINDow:TRACe:Y:RLEVel {dbm}</c>.</summary>
    public string? ReferenceLevel { get; init; } = "DISPlay:WINDow:TRACe:Y:RLEVel {dbm}";

    /// <summary>Sets the number of trace points. Optional. Default <c>SENSe:SWEep:POINts {points}</c>.</summary>
    public string? Points { get; init; } = "SENSe:SWEep:POINts {points}";

    /// <summary>
    /// Asks the number of trace points, used when the settings leave it to the instrument.
    /// Optional; without it the count of values received is taken. Default <c>SENSe:SWEep:POINts?</c>.
    /// </summary>
    public string? PointsQuery { get; init; } = "SENSe:SWEep:POINts?";

    /// <summary>
    /// The query returning the trace, one level in dBm per point, in the data format. Required.
    /// Default <c>TRACe:DATA? POWer</c> (the trace name is the project's own).
    /// </summary>
    public string? TraceQuery { get; init; } = "TRACe:DATA? POWer";

    /// <summary>
    /// A query returning the trace's frequencies in hertz, when the instrument has one; null (the
    /// default) spreads the points evenly from start to stop.
    /// </summary>
    public string? FrequencyListQuery { get; init; }

    /// <inheritdoc/>
    public bool FetchesTraces => true;

    void IScpiCommandSection.CollectProblems(ICollection<string> problems)
    {
        const string at = "spectrum";
        ScpiCommandChecks.Check(problems, $"{at}.start", Start, ScpiPlaceholder.Hz, required: true);
        ScpiCommandChecks.Check(problems, $"{at}.stop", Stop, ScpiPlaceholder.Hz, required: true);
        ScpiCommandChecks.Check(problems, $"{at}.resolutionBandwidth", ResolutionBandwidth, ScpiPlaceholder.Hz, required: true);
        ScpiCommandChecks.Check(problems, $"{at}.inputAttenuation", InputAttenuation, ScpiPlaceholder.Db, required: true);
        ScpiCommandChecks.Check(problems, $"{at}.referenceLevel", ReferenceLevel, ScpiPlaceholder.Dbm, required: true);
        ScpiCommandChecks.Check(problems, $"{at}.points", Points, ScpiPlaceholder.Points, required: false);
        ScpiCommandChecks.Check(problems, $"{at}.pointsQuery", PointsQuery, null, required: false, query: true);
        ScpiCommandChecks.Check(problems, $"{at}.traceQuery", TraceQuery, null, required: true, query: true);
        ScpiCommandChecks.Check(problems, $"{at}.frequencyListQuery", FrequencyListQuery, null, required: false, query: true);
    }
}
