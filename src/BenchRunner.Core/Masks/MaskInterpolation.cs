namespace BenchRunner.Core.Masks;

/// <summary>
/// How a limit runs between two corners at different frequencies. The level is always
/// interpolated linearly in dB; this chooses the frequency scale.
/// </summary>
public enum MaskInterpolation
{
    /// <summary>A straight line in dB against frequency (the default).</summary>
    Linear,

    /// <summary>
    /// A straight line in dB against log(frequency), as the limit looks on a log-frequency plot:
    /// L(f) = L1 + (L2 − L1)·ln(f/f1)/ln(f2/f1). Needs every corner above 0 Hz.
    /// </summary>
    Logarithmic,
}
