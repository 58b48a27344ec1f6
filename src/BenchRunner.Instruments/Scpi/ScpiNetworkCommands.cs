using BenchRunner.Core.Traces;

namespace BenchRunner.Instruments.Scpi;

/// <summary>
/// The commands of the network-analyser capability. Defaults follow the SCPI-1999 subsystems
/// (SENSe, TRACe); real instruments differ, so a driver profile overrides what its instrument needs.
/// A null optional command means the instrument cannot take that setting, and asking for it is refused.
/// </summary>
public sealed class ScpiNetworkCommands : IScpiCommandSection
{
    /// <summary>Whether the instrument is a network analyser. Default false.</summary>
    public bool Enabled { get; init; }

    /// <summary>Sets the sweep's first frequency. Required. Default <c>SENSe:FREQuency:STARt {hz}</c>.</summary>
    public string? Start { get; init; } = "SENSe:FREQuency:STARt {hz}";

    /// <summary>Sets the sweep's last frequency. Required. Default <c>SENSe:FREQuency:STOP {hz}</c>.</summary>
    public string? Stop { get; init; } = "SENSe:FREQuency:STOP {hz}";

    /// <summary>Sets the number of points. Required. Default <c>SENSe:SWEep:POINts {points}</c>.</summary>
    public string? Points { get; init; } = "SENSe:SWEep:POINts {points}";

    /// <summary>Sets the IF (receiver) bandwidth. Optional. Default <c>SENSe:BANDwidth:RESolution {hz}</c>.</summary>
    public string? IfBandwidth { get; init; } = "SENSe:BANDwidth:RESolution {hz}";

    /// <summary>Sets how many sweeps to average. Optional. Default <c>SENSe:AVERage:COUNt {count}</c>.</summary>
    public string? AverageCount { get; init; } = "SENSe:AVERage:COUNt {count}";

    /// <summary>Switches averaging on or off. Optional. Default <c>SENSe:AVERage:STATe {state}</c>.</summary>
    public string? AverageState { get; init; } = "SENSe:AVERage:STATe {state}";

    /// <summary>
    /// The query that returns each S-parameter as (real, imaginary) pairs, one pair per point, in
    /// the command set's data format. At least one is required; a parameter without a query cannot
    /// be acquired. Defaults <c>TRACe:DATA? S11</c> and likewise for S21, S12, S22 (the trace names
    /// are the project's own; instruments name their traces differently).
    /// </summary>
    public Dictionary<TraceQuantity, string> TraceQueries { get; init; } = new()
    {
        [TraceQuantity.S11] = "TRACe:DATA? S11",
        [TraceQuantity.S21] = "TRACe:DATA? S21",
        [TraceQuantity.S12] = "TRACe:DATA? S12",
        [TraceQuantity.S22] = "TRACe:DATA? S22",
    };

    /// <summary>
    /// A query returning the sweep's frequencies in hertz, in the data format, when the instrument
    /// has one; null (the default) builds the axis from the configured start, stop and points.
    /// REAL,32 keeps about 7 significant digits, so prefer ASCii or REAL,64 with this query.
    /// </summary>
    public string? FrequencyListQuery { get; init; }

    /// <inheritdoc/>
    public bool FetchesTraces => true;

    void IScpiCommandSection.CollectProblems(ICollection<string> problems)
    {
        const string at = "network";
        ScpiCommandChecks.Check(problems, $"{at}.start", Start, ScpiPlaceholder.Hz, required: true);
        ScpiCommandChecks.Check(problems, $"{at}.stop", Stop, ScpiPlaceholder.Hz, required: true);
        ScpiCommandChecks.Check(problems, $"{at}.points", Points, ScpiPlaceholder.Points, required: true);
        ScpiCommandChecks.Check(problems, $"{at}.ifBandwidth", IfBandwidth, ScpiPlaceholder.Hz, required: false);
        ScpiCommandChecks.Check(problems, $"{at}.averageCount", AverageCount, ScpiPlaceholder.Count, required: false);
        ScpiCommandChecks.Check(problems, $"{at}.averageState", AverageState, ScpiPlaceholder.State, required: false);
        ScpiCommandChecks.Check(problems, $"{at}.frequencyListQuery", FrequencyListQuery, null, required: false, query: true);
        if (TraceQueries is null || TraceQueries.Count == 0)
        {
            problems.Add($"{at}.traceQueries: at least one S-parameter query is required");
            return;
        }

        foreach (var (quantity, query) in TraceQueries)
        {
            if (quantity is TraceQuantity.Power || !Enum.IsDefined(quantity))
            {
                problems.Add($"{at}.traceQueries: {quantity} is not an S-parameter; expected S11, S21, S12 or S22");
                continue;
            }

            ScpiCommandChecks.Check(problems, $"{at}.traceQueries.{quantity}", query, null, required: true, query: true);
        }
    }
}
