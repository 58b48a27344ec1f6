namespace BenchRunner.Cli.Export;

/// <summary>What <c>benchrunner export</c> writes.</summary>
public enum ExportFormat
{
    /// <summary>Touchstone for S-parameter sweeps (where a file can hold them), CSV for the rest.</summary>
    Touchstone,

    /// <summary>BenchRunner's CSV trace layout for every sweep.</summary>
    Csv,
}
