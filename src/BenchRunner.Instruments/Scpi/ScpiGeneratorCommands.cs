namespace BenchRunner.Instruments.Scpi;

/// <summary>
/// The commands of the signal-generator capability. Defaults follow the SCPI-1999 SOURce and
/// OUTPut subsystems; real instruments differ, so a driver profile overrides what its instrument needs.
/// </summary>
public sealed class ScpiGeneratorCommands : IScpiCommandSection
{
    /// <summary>Whether the instrument is a signal generator. Default false.</summary>
    public bool Enabled { get; init; }

    /// <summary>Sets the carrier frequency. Required. Default <c>SOURce:FREQuency {hz}</c>.</summary>
    public string? Frequency { get; init; } = "SOURce:FREQuency {hz}";

    /// <summary>Sets the output level in dBm. Required. Default <c>SOURce:POWer {dbm}</c>.</summary>
    public string? Level { get; init; } = "SOURce:POWer {dbm}";

    /// <summary>Switches the RF output. Required. Default <c>OUTPut:STATe {state}</c> (sent as ON or OFF).</summary>
    public string? Output { get; init; } = "OUTPut:STATe {state}";

    /// <inheritdoc/>
    public bool FetchesTraces => false;

    void IScpiCommandSection.CollectProblems(ICollection<string> problems)
    {
        const string at = "generator";
        ScpiCommandChecks.Check(problems, $"{at}.frequency", Frequency, ScpiPlaceholder.Hz, required: true);
        ScpiCommandChecks.Check(problems, $"{at}.level", Level, ScpiPlaceholder.Dbm, required: true);
        ScpiCommandChecks.Check(problems, $"{at}.output", Output, ScpiPlaceholder.State, required: true);
    }
}
