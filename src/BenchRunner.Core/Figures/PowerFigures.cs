using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Figures;

/// <summary>
/// Figures of a spectrum (a power trace in dBm): spectral lines, noise floor, occupied bandwidth
/// and channel power. docs/figures.md gives the precise definitions.
/// </summary>
/// <remarks>
/// Bins: sample i stands for the band between the midpoints to its neighbours; the first and last
/// bins reach as far beyond their sample as half the spacing to their one neighbour (never below 0 Hz).
/// </remarks>
public static class PowerFigures
{
    /// <summary>
    /// The spectral lines: local maxima whose level is above <paramref name="threshold"/> and
    /// whose prominence is at least <paramref name="minExcursionDb"/>, each refined as
    /// <see cref="TraceFigures.Peak"/> refines the highest sample, sorted by frequency.
    /// </summary>
    /// <remarks>
    /// A local maximum is a sample, or a run of equal samples, higher than the samples on either
    /// side of it (a run at an end of the sweep needs only its one neighbour to be lower). On each
    /// side, its base is the lowest level between it and the nearest sample strictly higher than
    /// it, or the end of the sweep when there is none; an end sample has no base on its outer side.
    /// Its prominence is its level minus the higher of its bases: how far it stands above the
    /// deepest valley that separates it from any higher line. Noise ripples on a floor or on a
    /// carrier's skirt rise only their own ripple height above their valleys, while a carrier or a
    /// spur stands its full height above the floor, so a minimum excursion of a few dB more than
    /// the noise ripple keeps exactly the real lines.
    /// </remarks>
    /// <param name="trace">The spectrum.</param>
    /// <param name="threshold">A line's highest sample must be strictly above this level.</param>
    /// <param name="minExcursionDb">The least prominence in dB (default 6); zero keeps every local maximum above the threshold.</param>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="minExcursionDb"/> negative or not finite.</exception>
    public static IReadOnlyList<PeakPoint> Peaks(PowerTrace trace, Level threshold, double minExcursionDb = 6)
    {
        ArgumentNullException.ThrowIfNull(trace);
        if (!double.IsFinite(minExcursionDb) || minExcursionDb < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(minExcursionDb), minExcursionDb, "The minimum excursion must be zero or more dB.");
        }

        var levels = trace.LevelsDb.AsSpan();
        int n = levels.Length;
        var found = new List<PeakPoint>();
        for (int start = 0; start < n;)
        {
            int end = start;
            while (end + 1 < n && levels[end + 1] == levels[start])
            {
                end++;
            }

            double top = levels[start];
            bool risesIn = start == 0 || levels[start - 1] < top;
            bool fallsOut = end == n - 1 || levels[end + 1] < top;
            bool hasNeighbour = start > 0 || end < n - 1;
            if (risesIn && fallsOut && hasNeighbour && top > threshold.Dbm)
            {
                double? leftBase = start == 0 ? null : Base(levels, start - 1, -1, top);
                double? rightBase = end == n - 1 ? null : Base(levels, end + 1, +1, top);
                double col = Math.Max(leftBase ?? double.NegativeInfinity, rightBase ?? double.NegativeInfinity);
                if (top - col >= minExcursionDb)
                {
                    found.Add(TraceFigures.RefinedPeak(trace, start, end));
                }
            }

            start = end + 1;
        }

        found.Sort((a, b) => a.Frequency.CompareTo(b.Frequency));
        return found;
    }

    /// <summary>
    /// The noise floor: the median of the displayed levels (the mean of the middle two for an
    /// even count). The median ignores the few bins a carrier or spur occupies as long as they
    /// are fewer than half the bins, where a mean of linear power would be pulled up by the
    /// carrier. For unaveraged noise it lies about 1.6 dB below the mean noise power, since the
    /// median of an exponentially distributed power is ln 2 times its mean.
    /// </summary>
    /// <returns>Always available: a trace has at least one point.</returns>
    public static FigureResult<Level> NoiseFloor(PowerTrace trace)
    {
        ArgumentNullException.ThrowIfNull(trace);
        var sorted = trace.LevelsDb.ToArray();
        Array.Sort(sorted);
        int n = sorted.Length;
        double median = n % 2 == 1 ? sorted[n / 2] : (sorted[n / 2 - 1] + sorted[n / 2]) / 2;
        return FigureResult<Level>.Available(Level.FromDbm(median));
    }

    /// <summary>
    /// The band holding <paramref name="share"/> of the total power. Each bin holds its linear
    /// power times its width (the widths cancel on an evenly spaced trace), spread evenly across
    /// the bin; the lower edge is where the running sum from the bottom reaches (1 − share)/2 of
    /// the total and the upper edge where it reaches (1 + share)/2, each interpolated inside its bin.
    /// </summary>
    /// <param name="trace">The spectrum.</param>
    /// <param name="share">The share of the power, strictly between 0 and 1; default 0.99.</param>
    /// <returns>Unavailable for a one-point trace (a bin has no width).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="share"/> not strictly between 0 and 1.</exception>
    public static FigureResult<OccupiedBandwidthResult> OccupiedBandwidth(PowerTrace trace, double share = 0.99)
    {
        ArgumentNullException.ThrowIfNull(trace);
        if (!(share > 0 && share < 1))
        {
            throw new ArgumentOutOfRangeException(nameof(share), share, "The share must lie strictly between 0 and 1.");
        }

        if (trace.Count < 2)
        {
            return FigureResult<OccupiedBandwidthResult>.Unavailable("occupied bandwidth needs at least two points");
        }

        var edges = BinEdges(trace.Axis.Hertz.AsSpan());
        var levels = trace.LevelsDb.AsSpan();
        var content = new double[levels.Length];
        double total = 0;
        for (int i = 0; i < levels.Length; i++)
        {
            content[i] = Math.Pow(10, levels[i] / 10) * (edges[i + 1] - edges[i]);
            total += content[i];
        }

        if (!(total > 0))
        {
            return FigureResult<OccupiedBandwidthResult>.Unavailable("the trace holds no measurable power");
        }

        double lower = EdgeWhereSumReaches(content, edges, total * (1 - share) / 2);
        double upper = EdgeWhereSumReaches(content, edges, total * (1 + share) / 2);
        return FigureResult<OccupiedBandwidthResult>.Available(new OccupiedBandwidthResult(
            share,
            Frequency.FromHertz(lower),
            Frequency.FromHertz(upper),
            Frequency.FromHertz(upper - lower),
            Frequency.FromHertz((lower + upper) / 2)));
    }

    /// <summary>
    /// The power in the channel [centre − width/2, centre + width/2]:
    /// P = Σ pᵢ · Δfᵢ / (RBW · <paramref name="noiseBandwidthFactor"/>), where pᵢ is bin i's level in
    /// milliwatts (the power the analyser measured in its resolution bandwidth at that bin) and Δfᵢ
    /// the part of bin i inside the channel, so a bin cut by a channel edge counts in proportion.
    /// Without <paramref name="resolutionBandwidth"/> the bins are taken to be one RBW apart
    /// (RBW = each bin's own width), so a channel covering N whole bins at P dBm gives P + 10·log10 N.
    /// </summary>
    /// <param name="trace">The spectrum.</param>
    /// <param name="centre">The channel centre.</param>
    /// <param name="width">The channel width.</param>
    /// <param name="resolutionBandwidth">The analyser's RBW; null to take the bin spacing.</param>
    /// <param name="noiseBandwidthFactor">The RBW filter's equivalent noise bandwidth divided by its RBW; default 1.</param>
    /// <returns>Unavailable for a one-point trace, a zero width, or a channel reaching outside the trace's bins.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A zero RBW, or a factor not finite and positive.</exception>
    public static FigureResult<Level> ChannelPower(
        PowerTrace trace, Frequency centre, Frequency width, Frequency? resolutionBandwidth = null, double noiseBandwidthFactor = 1)
    {
        ArgumentNullException.ThrowIfNull(trace);
        if (resolutionBandwidth is { Hertz: <= 0 })
        {
            throw new ArgumentOutOfRangeException(nameof(resolutionBandwidth), "The resolution bandwidth must be above 0 Hz.");
        }

        if (!double.IsFinite(noiseBandwidthFactor) || noiseBandwidthFactor <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(noiseBandwidthFactor), noiseBandwidthFactor, "The noise-bandwidth factor must be positive.");
        }

        if (width == Frequency.Zero)
        {
            return FigureResult<Level>.Unavailable("the channel is empty (zero width)");
        }

        if (trace.Count < 2)
        {
            return FigureResult<Level>.Unavailable("channel power needs at least two points");
        }

        var edges = BinEdges(trace.Axis.Hertz.AsSpan());
        double lo = centre.Hertz - width.Hertz / 2, hi = centre.Hertz + width.Hertz / 2;
        double slack = 1e-9 * (edges[^1] - edges[0]);
        if (lo < edges[0] - slack || hi > edges[^1] + slack)
        {
            return FigureResult<Level>.Unavailable(
                $"the channel {Frequency.FromHertz(Math.Max(0, lo))} to {Frequency.FromHertz(hi)} reaches outside the trace's bins " +
                $"({Frequency.FromHertz(edges[0])} to {Frequency.FromHertz(edges[^1])})");
        }

        var levels = trace.LevelsDb.AsSpan();
        double milliwatts = 0;
        for (int i = 0; i < levels.Length; i++)
        {
            double inside = Math.Min(hi, edges[i + 1]) - Math.Max(lo, edges[i]);
            if (inside > 0)
            {
                double rbw = resolutionBandwidth?.Hertz ?? edges[i + 1] - edges[i];
                milliwatts += Math.Pow(10, levels[i] / 10) * inside / (rbw * noiseBandwidthFactor);
            }
        }

        if (!(milliwatts > 0))
        {
            return FigureResult<Level>.Unavailable("the channel holds no measurable power");
        }

        return FigureResult<Level>.Available(Level.FromWatts(milliwatts * 1e-3));
    }

    /// <summary>The lowest level walking from <paramref name="from"/> in <paramref name="step"/> until a sample above <paramref name="top"/>.</summary>
    private static double Base(ReadOnlySpan<double> levels, int from, int step, double top)
    {
        double lowest = double.PositiveInfinity;
        for (int k = from; k >= 0 && k < levels.Length && levels[k] <= top; k += step)
        {
            lowest = Math.Min(lowest, levels[k]);
        }

        return lowest;
    }

    /// <summary>The n + 1 bin edges of n samples (n ≥ 2), in hertz.</summary>
    private static double[] BinEdges(ReadOnlySpan<double> axis)
    {
        int n = axis.Length;
        var edges = new double[n + 1];
        edges[0] = Math.Max(0, axis[0] - (axis[1] - axis[0]) / 2);
        for (int i = 1; i < n; i++)
        {
            edges[i] = (axis[i - 1] + axis[i]) / 2;
        }

        edges[n] = axis[n - 1] + (axis[n - 1] - axis[n - 2]) / 2;
        return edges;
    }

    private static double EdgeWhereSumReaches(double[] content, double[] edges, double target)
    {
        double sum = 0;
        for (int i = 0; i < content.Length; i++)
        {
            if (sum + content[i] >= target && content[i] > 0)
            {
                double fraction = Math.Clamp((target - sum) / content[i], 0, 1);
                return edges[i] + fraction * (edges[i + 1] - edges[i]);
            }

            sum += content[i];
        }

        return edges[^1];
    }
}
