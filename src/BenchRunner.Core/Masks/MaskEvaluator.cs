using System.Collections.Immutable;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Masks;

/// <summary>The point-by-point check behind <see cref="LimitMask.Evaluate"/>; inputs already validated.</summary>
internal static class MaskEvaluator
{
    public static MaskEvaluation Evaluate(LimitMask mask, Trace trace)
    {
        int n = trace.Count;
        double reference = mask.Reference == MaskReference.RelativeToPeak ? trace.LevelsDb.Max() : 0;

        var upperLimits = LimitsAt(mask.Upper, mask.Interpolation, LimitSide.Upper, trace.Axis, reference);
        var lowerLimits = LimitsAt(mask.Lower, mask.Interpolation, LimitSide.Lower, trace.Axis, reference);

        var upperMargins = new double?[n];
        var lowerMargins = new double?[n];
        var margins = ImmutableArray.CreateBuilder<double?>(n);
        var sides = ImmutableArray.CreateBuilder<LimitSide?>(n);
        for (int i = 0; i < n; i++)
        {
            double level = trace.LevelsDb[i];
            upperMargins[i] = upperLimits[i] - level;
            lowerMargins[i] = level - lowerLimits[i];

            (double? margin, LimitSide? side) = (upperMargins[i], lowerMargins[i]) switch
            {
                ({ } u, { } l) => l < u ? (l, LimitSide.Lower) : (u, LimitSide.Upper),
                ({ } u, null) => (u, LimitSide.Upper),
                (null, { } l) => (l, LimitSide.Lower),
                _ => ((double?)null, (LimitSide?)null),
            };
            margins.Add(margin);
            sides.Add(side);
        }

        var spans = Spans(upperMargins, LimitSide.Upper, trace.Axis)
            .Concat(Spans(lowerMargins, LimitSide.Lower, trace.Axis))
            .OrderBy(s => s.Start)
            .ThenBy(s => s.Side)
            .ToList();

        return new MaskEvaluation(mask, trace.Axis, reference, upperLimits, lowerLimits,
            margins.MoveToImmutable(), sides.MoveToImmutable(), spans);
    }

    private static ImmutableArray<double?> LimitsAt(LimitLine? line, MaskInterpolation interpolation, LimitSide side, FrequencyAxis axis, double reference)
    {
        var limits = ImmutableArray.CreateBuilder<double?>(axis.Count);
        for (int i = 0; i < axis.Count; i++)
        {
            limits.Add(line?.LimitAt(axis[i], interpolation, side) + reference);
        }

        return limits.MoveToImmutable();
    }

    private static IEnumerable<FailingSpan> Spans(double?[] margins, LimitSide side, FrequencyAxis axis)
    {
        int start = -1;
        double worst = 0;
        for (int i = 0; i <= margins.Length; i++)
        {
            bool failing = i < margins.Length && margins[i] < 0;
            if (failing)
            {
                if (start < 0)
                {
                    start = i;
                    worst = margins[i]!.Value;
                }
                else
                {
                    worst = Math.Min(worst, margins[i]!.Value);
                }
            }
            else if (start >= 0)
            {
                yield return new FailingSpan(axis[start], axis[i - 1], side, worst);
                start = -1;
            }
        }
    }
}
