namespace BenchRunner.Core.TraceFiles;

/// <summary>How a Touchstone file writes each complex value (the option line's format word).</summary>
public enum TouchstoneFormat
{
    /// <summary><c>RI</c>: real part, imaginary part.</summary>
    RealImaginary,

    /// <summary><c>MA</c>: magnitude, angle in degrees.</summary>
    MagnitudeAngle,

    /// <summary><c>DB</c>: magnitude in dB (20·log10|x|), angle in degrees.</summary>
    DecibelAngle,
}
