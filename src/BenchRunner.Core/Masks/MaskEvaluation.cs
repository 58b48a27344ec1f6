using System.Collections.Immutable;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Masks;

/// <summary>
/// The result of checking one trace against a <see cref="LimitMask"/>, point by point.
/// Every per-point array has one entry per point of <see cref="Axis"/>, null where no limit applies.
/// Produced by <see cref="LimitMask.Evaluate"/>.
/// </summary>
public sealed class MaskEvaluation
{
    internal MaskEvaluation(
        LimitMask mask,
        FrequencyAxis axis,
        double referenceDb,
        ImmutableArray<double?> upperLimitsDb,
        ImmutableArray<double?> lowerLimitsDb,
        ImmutableArray<double?> marginsDb,
        ImmutableArray<LimitSide?> marginSides,
        IReadOnlyList<FailingSpan> failingSpans)
    {
        Mask = mask;
        Axis = axis;
        ReferenceDb = referenceDb;
        UpperLimitsDb = upperLimitsDb;
        LowerLimitsDb = lowerLimitsDb;
        MarginsDb = marginsDb;
        FailingSpans = failingSpans;

        for (int i = 0; i < marginsDb.Length; i++)
        {
            if (marginsDb[i] is not { } m)
            {
                continue;
            }

            PointsChecked++;
            if (WorstMarginDb is not { } worst || m < worst)
            {
                WorstMarginDb = m;
                WorstMarginAt = axis[i];
                WorstSide = marginSides[i];
            }
        }

        Passed = PointsChecked > 0 && WorstMarginDb >= 0;
    }

    /// <summary>The mask that was applied.</summary>
    public LimitMask Mask { get; }

    /// <summary>The trace's frequency points.</summary>
    public FrequencyAxis Axis { get; }

    /// <summary>
    /// The level added to every corner level, in the trace's unit: 0 for an absolute mask, the
    /// trace's highest sample level for a relative-to-peak mask.
    /// </summary>
    public double ReferenceDb { get; }

    /// <summary>True only when at least one point was checked and no margin is negative.</summary>
    public bool Passed { get; }

    /// <summary>How many points had at least one limit applying to them.</summary>
    public int PointsChecked { get; }

    /// <summary>The upper limit at each point, in the trace's unit (peak offset included); null where none applies.</summary>
    public ImmutableArray<double?> UpperLimitsDb { get; }

    /// <summary>The lower limit at each point, in the trace's unit (peak offset included); null where none applies.</summary>
    public ImmutableArray<double?> LowerLimitsDb { get; }

    /// <summary>
    /// The margin at each point in dB, positive inside the mask: upper limit − level for the
    /// upper side, level − lower limit for the lower side, the smaller where both apply;
    /// null where no limit applies.
    /// </summary>
    public ImmutableArray<double?> MarginsDb { get; }

    /// <summary>The smallest margin over all checked points in dB, or null when no point was checked.</summary>
    public double? WorstMarginDb { get; }

    /// <summary>Where <see cref="WorstMarginDb"/> occurs (the lowest such frequency on a tie), or null.</summary>
    public Frequency? WorstMarginAt { get; }

    /// <summary>Which limit gives <see cref="WorstMarginDb"/> (upper on a tie), or null.</summary>
    public LimitSide? WorstSide { get; }

    /// <summary>
    /// Each run of consecutive points failing the same limit, ordered by start frequency
    /// (upper before lower when two start together). Empty when nothing fails.
    /// </summary>
    public IReadOnlyList<FailingSpan> FailingSpans { get; }
}
