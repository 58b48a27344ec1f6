namespace BenchRunner.Core.Runs;

/// <summary>
/// Conditions noted with a sweep. Stored as the integer <c>flags</c>, one bit each; the bit
/// values are part of the file format and never change.
/// </summary>
[Flags]
public enum SweepFlags
{
    /// <summary>Nothing noted.</summary>
    None = 0,

    /// <summary>An input was overdriven during the sweep (bit 0, value 1).</summary>
    Overloaded = 1,

    /// <summary>No valid calibration or compensation was applied (bit 1, value 2).</summary>
    Uncalibrated = 2,

    /// <summary>A source reported its output level not held (bit 2, value 4).</summary>
    Unlevelled = 4,
}
