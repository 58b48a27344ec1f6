namespace BenchRunner.Core.Runs;

/// <summary>
/// Conditions noted with a check. Stored as the integer <c>flags</c> of a check (schema version 2
/// on), one bit each; the bit values are part of the file format and never change.
/// </summary>
[Flags]
public enum CheckFlags
{
    /// <summary>Nothing noted.</summary>
    None = 0,

    /// <summary>The trace it judged was measured while the analyser made lines of its own (bit 0, value 1).</summary>
    TraceOverloaded = 1,
}
