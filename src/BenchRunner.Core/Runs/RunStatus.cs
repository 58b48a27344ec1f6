namespace BenchRunner.Core.Runs;

/// <summary>Where a run stands. Stored as the lower-case word (<c>running</c>, <c>passed</c>...).</summary>
public enum RunStatus
{
    /// <summary>Started and not yet finished.</summary>
    Running,

    /// <summary>Finished; every check passed.</summary>
    Passed,

    /// <summary>Finished; at least one check failed.</summary>
    Failed,

    /// <summary>Ended by an error (instrument, I/O, bad input) before a verdict.</summary>
    Error,

    /// <summary>Found still running when the file was next opened: the program stopped without finishing it.</summary>
    Interrupted,

    /// <summary>Stopped by the operator.</summary>
    Stopped,
}
