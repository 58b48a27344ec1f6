using System.Collections.Immutable;

namespace BenchRunner.Core.Traces;

/// <summary>A power trace: one level in dBm per frequency bin, as a spectrum analyser shows it.</summary>
public sealed class PowerTrace : Trace
{
    /// <summary>Creates a power trace.</summary>
    /// <exception cref="ArgumentException">A count mismatch or a non-finite level.</exception>
    public PowerTrace(FrequencyAxis axis, IEnumerable<double> levelsDbm)
        : base(axis, TraceQuantity.Power, Check(levelsDbm.ToImmutableArray()))
    {
    }

    /// <inheritdoc/>
    public override TraceUnit Unit => TraceUnit.DecibelMilliwatt;

    private static ImmutableArray<double> Check(ImmutableArray<double> levels)
    {
        for (int i = 0; i < levels.Length; i++)
        {
            if (!double.IsFinite(levels[i]))
            {
                throw new ArgumentException($"Level {i} ({levels[i]} dBm) is not finite.", nameof(levels));
            }
        }

        return levels;
    }
}
