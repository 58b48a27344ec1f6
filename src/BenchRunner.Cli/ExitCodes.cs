namespace BenchRunner.Cli;

/// <summary>The process exit codes every verb shares (see docs/cli.md).</summary>
public static class ExitCodes
{
    /// <summary>Everything passed, or the verb did what was asked.</summary>
    public const int Success = 0;

    /// <summary>A check failed (the measurement was made and is outside its limits).</summary>
    public const int CheckFailed = 1;

    /// <summary>Bad input: a plan, mask, trace, profile, configuration or argument is malformed.</summary>
    public const int BadInput = 2;

    /// <summary>An instrument or I/O failure stopped the work.</summary>
    public const int InstrumentFailure = 3;

    /// <summary>The operator stopped the work (Ctrl+C).</summary>
    public const int Stopped = 130;
}
