namespace BenchRunner.Cli.Output;

/// <summary>The few ANSI foreground colours the terminal views use (SGR codes).</summary>
public enum ConsoleColour
{
    /// <summary>Failures.</summary>
    Red = 31,

    /// <summary>Passes and values inside their target.</summary>
    Green = 32,

    /// <summary>Warnings.</summary>
    Yellow = 33,
}
