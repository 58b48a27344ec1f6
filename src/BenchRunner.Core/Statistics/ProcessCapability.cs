using BenchRunner.Core.Figures;

namespace BenchRunner.Core.Statistics;

/// <summary>
/// Process capability of a measured figure against its specification limits:
/// Cp = (USL − LSL)/(6σ) and Cpk = min(USL − μ, μ − LSL)/(3σ). With one limit only, Cpk is
/// one-sided and Cp is not defined.
/// </summary>
public readonly struct ProcessCapability
{
    private ProcessCapability(double? cp, double cpk, double? cpkUpper, double? cpkLower)
    {
        Cp = cp;
        Cpk = cpk;
        CpkUpper = cpkUpper;
        CpkLower = cpkLower;
    }

    /// <summary>(USL − LSL)/(6σ); null unless both limits are given.</summary>
    public double? Cp { get; }

    /// <summary>The smaller of <see cref="CpkUpper"/> and <see cref="CpkLower"/> (whichever exist).</summary>
    public double Cpk { get; }

    /// <summary>(USL − μ)/(3σ); null without an upper limit.</summary>
    public double? CpkUpper { get; }

    /// <summary>(μ − LSL)/(3σ); null without a lower limit.</summary>
    public double? CpkLower { get; }

    /// <summary>
    /// Capability of the measured <paramref name="samples"/>; unavailable with fewer than two
    /// samples or when they do not vary (σ = 0).
    /// </summary>
    /// <param name="samples">The measured figure's statistics (σ is the sample standard deviation).</param>
    /// <param name="lowerLimit">The lower specification limit, or null.</param>
    /// <param name="upperLimit">The upper specification limit, or null.</param>
    /// <exception cref="ArgumentException">No limit, a limit that is not finite, or LSL ≥ USL.</exception>
    public static FigureResult<ProcessCapability> Compute(SampleStatistics samples, double? lowerLimit, double? upperLimit)
    {
        CheckLimits(lowerLimit, upperLimit);
        if (samples.Count < 2)
        {
            return FigureResult<ProcessCapability>.Unavailable(
                $"capability needs at least 2 samples; there {(samples.Count == 1 ? "is 1" : $"are {samples.Count}")}");
        }

        return FromMoments(samples.Mean, samples.StandardDeviation, lowerLimit, upperLimit);
    }

    /// <summary>Capability of a process with known mean and standard deviation; unavailable when σ is 0.</summary>
    /// <param name="mean">The process mean μ.</param>
    /// <param name="standardDeviation">The process standard deviation σ, not negative.</param>
    /// <param name="lowerLimit">The lower specification limit, or null.</param>
    /// <param name="upperLimit">The upper specification limit, or null.</param>
    /// <exception cref="ArgumentException">
    /// No limit, LSL ≥ USL, a value that is not finite, or a negative σ.
    /// </exception>
    public static FigureResult<ProcessCapability> FromMoments(double mean, double standardDeviation, double? lowerLimit, double? upperLimit)
    {
        CheckLimits(lowerLimit, upperLimit);
        if (!double.IsFinite(mean))
        {
            throw new ArgumentOutOfRangeException(nameof(mean), mean, "Must be finite.");
        }

        if (!double.IsFinite(standardDeviation) || standardDeviation < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(standardDeviation), standardDeviation, "Must be finite and not negative.");
        }

        if (standardDeviation == 0)
        {
            return FigureResult<ProcessCapability>.Unavailable("the samples do not vary (σ = 0), so capability is not defined");
        }

        double? upper = upperLimit is { } usl ? (usl - mean) / (3 * standardDeviation) : null;
        double? lower = lowerLimit is { } lsl ? (mean - lsl) / (3 * standardDeviation) : null;
        double? cp = lowerLimit is { } l && upperLimit is { } u ? (u - l) / (6 * standardDeviation) : null;
        double cpk = Math.Min(upper ?? double.PositiveInfinity, lower ?? double.PositiveInfinity);
        return FigureResult<ProcessCapability>.Available(new ProcessCapability(cp, cpk, upper, lower));
    }

    private static void CheckLimits(double? lowerLimit, double? upperLimit)
    {
        if (lowerLimit is null && upperLimit is null)
        {
            throw new ArgumentException("Capability needs a lower or an upper specification limit, or both.");
        }

        if (lowerLimit is { } l && !double.IsFinite(l))
        {
            throw new ArgumentOutOfRangeException(nameof(lowerLimit), l, "Must be finite.");
        }

        if (upperLimit is { } u && !double.IsFinite(u))
        {
            throw new ArgumentOutOfRangeException(nameof(upperLimit), u, "Must be finite.");
        }

        if (lowerLimit >= upperLimit)
        {
            throw new ArgumentException($"The lower limit ({lowerLimit}) must be below the upper limit ({upperLimit}).");
        }
    }

    /// <inheritdoc />
    public override string ToString() =>
        Cp is { } cp ? FormattableString.Invariant($"Cp={cp:F3} Cpk={Cpk:F3}") : FormattableString.Invariant($"Cpk={Cpk:F3}");
}
