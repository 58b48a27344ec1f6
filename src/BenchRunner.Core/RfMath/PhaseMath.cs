using System.Collections.Immutable;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.RfMath;

/// <summary>
/// Phase unwrapping and group delay. Group delay τ = −dφ/dω = −(1/360)·dφ°/df seconds, with
/// φ in degrees and f in hertz (the usual definition; ω = 2π·f and 360° = 2π rad give the 1/360).
/// </summary>
public static class PhaseMath
{
    /// <summary>
    /// Unwraps a phase sequence in degrees: from the second point on, adds the multiple of
    /// 360° that brings each step from the previous point into [−180°, 180°). The first point is
    /// kept as it is. A sequence whose steps are already below 180° comes back unchanged.
    /// </summary>
    /// <param name="phasesDegrees">Phases in degrees, wrapped or not.</param>
    /// <exception cref="ArgumentException">A phase is NaN or infinite.</exception>
    public static ImmutableArray<double> UnwrapDegrees(IReadOnlyList<double> phasesDegrees)
    {
        ArgumentNullException.ThrowIfNull(phasesDegrees);
        var result = ImmutableArray.CreateBuilder<double>(phasesDegrees.Count);
        for (int i = 0; i < phasesDegrees.Count; i++)
        {
            var phase = phasesDegrees[i];
            if (!double.IsFinite(phase))
            {
                throw new ArgumentException($"Phase {i} ({phase}) is not finite.", nameof(phasesDegrees));
            }

            if (i == 0)
            {
                result.Add(phase);
                continue;
            }

            var step = phase - phasesDegrees[i - 1];
            step -= 360 * Math.Floor((step + 180) / 360);
            result.Add(result[i - 1] + step);
        }

        return result.MoveToImmutable();
    }

    /// <summary>
    /// The group delay at each point, in seconds: τ = −(1/360)·Δφ°/Δf after unwrapping the
    /// phase, with central differences (φ[i+1] − φ[i−1])/(f[i+1] − f[i−1]) inside and one-sided
    /// differences at the first and last points. The frequencies must be strictly increasing;
    /// a <see cref="Traces.FrequencyAxis"/> may be passed directly.
    /// </summary>
    /// <param name="frequencies">At least two strictly increasing frequencies.</param>
    /// <param name="phasesDegrees">The phase at each frequency in degrees, wrapped or unwrapped.</param>
    /// <returns>One delay per point, in seconds.</returns>
    /// <exception cref="ArgumentException">Fewer than two points, different counts, frequencies not strictly increasing, or a phase not finite.</exception>
    public static ImmutableArray<double> GroupDelaySeconds(IReadOnlyList<Frequency> frequencies, IReadOnlyList<double> phasesDegrees)
    {
        ArgumentNullException.ThrowIfNull(frequencies);
        ArgumentNullException.ThrowIfNull(phasesDegrees);
        int n = frequencies.Count;
        if (n < 2)
        {
            throw new ArgumentException("Group delay needs at least two points.", nameof(frequencies));
        }

        if (phasesDegrees.Count != n)
        {
            throw new ArgumentException($"There are {n} frequencies but {phasesDegrees.Count} phases.", nameof(phasesDegrees));
        }

        var hertz = new double[n];
        for (int i = 0; i < n; i++)
        {
            hertz[i] = frequencies[i].Hertz;
            if (i > 0 && hertz[i] <= hertz[i - 1])
            {
                throw new ArgumentException($"Frequencies must be strictly increasing: point {i} ({frequencies[i]}) follows {frequencies[i - 1]}.", nameof(frequencies));
            }
        }

        var phase = UnwrapDegrees(phasesDegrees);
        var delays = ImmutableArray.CreateBuilder<double>(n);
        for (int i = 0; i < n; i++)
        {
            int lo = Math.Max(0, i - 1), hi = Math.Min(n - 1, i + 1);
            delays.Add(-(phase[hi] - phase[lo]) / (hertz[hi] - hertz[lo]) / 360);
        }

        return delays.MoveToImmutable();
    }
}
