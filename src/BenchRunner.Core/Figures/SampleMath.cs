namespace BenchRunner.Core.Figures;

/// <summary>
/// Interpolation and peak refinement on a trace's samples (frequencies in hertz, levels in dB),
/// shared by the trace and power figures.
/// </summary>
internal static class SampleMath
{
    /// <summary>The level at <paramref name="hz"/>, linear in dB between the neighbouring samples; hz must lie inside the sweep.</summary>
    public static double LevelAt(ReadOnlySpan<double> axis, ReadOnlySpan<double> levels, double hz)
    {
        int k = SegmentStart(axis, hz);
        if (k == axis.Length - 1)
        {
            return levels[k];
        }

        return Lerp(axis[k], levels[k], axis[k + 1], levels[k + 1], hz);
    }

    /// <summary>
    /// The index k of the last sample at or below <paramref name="hz"/> (so hz lies in [axis[k], axis[k+1]]);
    /// the last index when hz equals the stop frequency.
    /// </summary>
    public static int SegmentStart(ReadOnlySpan<double> axis, double hz)
    {
        int lo = 0, hi = axis.Length - 1;
        while (lo < hi)
        {
            int mid = (lo + hi + 1) / 2;
            if (axis[mid] <= hz)
            {
                lo = mid;
            }
            else
            {
                hi = mid - 1;
            }
        }

        return lo;
    }

    /// <summary>The frequency where the straight line through (x0, y0) and (x1, y1) reaches <paramref name="level"/>.</summary>
    public static double CrossingHz(double x0, double y0, double x1, double y1, double level) =>
        y0 == y1 ? x0 : x0 + (level - y0) * (x1 - x0) / (y1 - y0);

    /// <summary>The first run of equal samples holding the highest level.</summary>
    public static (int Start, int End) HighestRun(ReadOnlySpan<double> levels)
    {
        int start = 0;
        for (int i = 1; i < levels.Length; i++)
        {
            if (levels[i] > levels[start])
            {
                start = i;
            }
        }

        int end = start;
        while (end + 1 < levels.Length && levels[end + 1] == levels[start])
        {
            end++;
        }

        return (start, end);
    }

    /// <summary>
    /// Refines a maximum given as a run of equal samples [start, end]. A single sample with a
    /// neighbour on each side is refined by the parabola (level against frequency) through it and
    /// its two neighbours; a sample at an end of the sweep is returned as it is; a flat top of two
    /// or more equal samples gives the middle of the run at the run's level.
    /// </summary>
    public static (double Hz, double Level, int Index) RefineMaximum(
        ReadOnlySpan<double> axis, ReadOnlySpan<double> levels, int start, int end)
    {
        if (start != end)
        {
            return ((axis[start] + axis[end]) / 2, levels[start], start + (end - start) / 2);
        }

        int i = start;
        if (i == 0 || i == axis.Length - 1)
        {
            return (axis[i], levels[i], i);
        }

        // General three-point parabola y = y1 + a·h + b·h², h = x − x1, solved in offsets from the
        // middle sample so that large absolute frequencies cost no precision.
        double h0 = axis[i - 1] - axis[i], h2 = axis[i + 1] - axis[i];
        double d0 = levels[i - 1] - levels[i], d2 = levels[i + 1] - levels[i];
        double det = h0 * h2 * (h0 - h2);
        double curvature = (d0 * h2 - d2 * h0) / det;
        double slope = (d2 * h0 * h0 - d0 * h2 * h2) / det;
        if (!(curvature < 0))
        {
            return (axis[i], levels[i], i);
        }

        double offset = Math.Clamp(-slope / (2 * curvature), h0, h2);
        double level = levels[i] + slope * offset + curvature * offset * offset;
        return (axis[i] + offset, Math.Max(level, levels[i]), i);
    }

    /// <summary>
    /// The points of the closed range [fromHz, toHz]: the interpolated level at each end and every
    /// sample strictly between them. The range must lie inside the sweep.
    /// </summary>
    public static List<(double Hz, double Level)> RangePoints(
        ReadOnlySpan<double> axis, ReadOnlySpan<double> levels, double fromHz, double toHz)
    {
        var points = new List<(double, double)> { (fromHz, LevelAt(axis, levels, fromHz)) };
        for (int i = SegmentStart(axis, fromHz); i < axis.Length && axis[i] < toHz; i++)
        {
            if (axis[i] > fromHz)
            {
                points.Add((axis[i], levels[i]));
            }
        }

        if (toHz > fromHz)
        {
            points.Add((toHz, LevelAt(axis, levels, toHz)));
        }

        return points;
    }

    private static double Lerp(double x0, double y0, double x1, double y1, double x) =>
        x == x0 ? y0 : x == x1 ? y1 : y0 + (y1 - y0) * (x - x0) / (x1 - x0);
}
