using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Figures;

/// <summary>
/// Figures of merit computed from any trace's levels (<see cref="Trace.LevelsDb"/>): peak,
/// N-dB bandwidth, loaded and unloaded Q, insertion loss, ripple, rejection, return loss and
/// shape factor. Interpolation is linear in dB against frequency between adjacent samples.
/// docs/figures.md gives the precise definitions.
/// </summary>
public static class TraceFigures
{
    /// <summary>10·log10(2) ≈ 3.0103 dB: the level of the half-power points, below the peak.</summary>
    public static readonly double HalfPowerDb = 10 * Math.Log10(2);

    /// <summary>
    /// The highest sample, refined by the parabola (level against frequency) through it and its
    /// two neighbours, which may be unequally spaced. A highest sample at either end of the sweep
    /// is not refined. A flat top (two or more adjacent samples at the same highest level) gives
    /// the midpoint of the flat top at that level. When the highest level occurs in separate
    /// places, the lowest in frequency is taken. Always available: a trace has at least one point.
    /// </summary>
    public static FigureResult<PeakPoint> Peak(Trace trace)
    {
        ArgumentNullException.ThrowIfNull(trace);
        var levels = trace.LevelsDb.AsSpan();
        var (start, end) = SampleMath.HighestRun(levels);
        return FigureResult<PeakPoint>.Available(RefinedPeak(trace, start, end));
    }

    /// <summary>
    /// The band between the first crossings of (peak − <paramref name="belowPeakDb"/>) met when
    /// walking outward from the peak sample on each side, each crossing placed by linear
    /// interpolation of dB against frequency between the two adjacent samples that straddle it.
    /// Centre = mean of the crossings, loaded Q = centre / width. The peak level is the refined
    /// one of <see cref="Peak"/>. The default of exactly 3 dB is the trade's "−3 dB bandwidth";
    /// pass <see cref="HalfPowerDb"/> for the half-power bandwidth.
    /// </summary>
    /// <param name="trace">Any trace.</param>
    /// <param name="belowPeakDb">N, in dB; default 3.</param>
    /// <returns>Unavailable when either side has no crossing inside the sweep.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="belowPeakDb"/> not finite and positive.</exception>
    public static FigureResult<BandwidthResult> Bandwidth(Trace trace, double belowPeakDb = 3)
    {
        ArgumentNullException.ThrowIfNull(trace);
        if (!double.IsFinite(belowPeakDb) || belowPeakDb <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(belowPeakDb), belowPeakDb, "The bandwidth depth must be a positive number of dB.");
        }

        var axis = trace.Axis.Hertz.AsSpan();
        var levels = trace.LevelsDb.AsSpan();
        var (start, end) = SampleMath.HighestRun(levels);
        var peak = RefinedPeak(trace, start, end);
        double threshold = peak.LevelDb - belowPeakDb;
        string depth = $"{QuantityFormat.Format(belowPeakDb, QuantityUnit.Decibel)} below the peak ({QuantityFormat.Format(peak.LevelDb, trace.UnitSymbol)} at {peak.Frequency})";

        double? lower = null;
        for (int j = start; j > 0; j--)
        {
            if (levels[j - 1] <= threshold)
            {
                lower = SampleMath.CrossingHz(axis[j - 1], levels[j - 1], axis[j], levels[j], threshold);
                break;
            }
        }

        double? upper = null;
        for (int j = end; j < axis.Length - 1; j++)
        {
            if (levels[j + 1] <= threshold)
            {
                upper = SampleMath.CrossingHz(axis[j], levels[j], axis[j + 1], levels[j + 1], threshold);
                break;
            }
        }

        if (lower is null || upper is null)
        {
            var side = lower is null && upper is null ? "on either side" : lower is null ? "on the low-frequency side" : "on the high-frequency side";
            return FigureResult<BandwidthResult>.Unavailable(
                $"the level never falls {depth} {side} inside the sweep ({trace.Axis.Start} to {trace.Axis.Stop})");
        }

        double lo = lower.Value, hi = upper.Value;
        double centre = (lo + hi) / 2, width = hi - lo;
        return FigureResult<BandwidthResult>.Available(new BandwidthResult(
            belowPeakDb,
            Frequency.FromHertz(lo),
            Frequency.FromHertz(hi),
            Frequency.FromHertz(width),
            Frequency.FromHertz(centre),
            centre / width));
    }

    /// <summary>
    /// The level at <paramref name="frequency"/>, by linear interpolation of dB between the two
    /// neighbouring samples (a sample's own level at a sample frequency).
    /// </summary>
    /// <returns>Unavailable outside the sweep (start and stop included).</returns>
    public static FigureResult<double> ValueAt(Trace trace, Frequency frequency)
    {
        ArgumentNullException.ThrowIfNull(trace);
        if (frequency < trace.Axis.Start || frequency > trace.Axis.Stop)
        {
            return FigureResult<double>.Unavailable($"{frequency} is outside the sweep ({trace.Axis.Start} to {trace.Axis.Stop})");
        }

        return FigureResult<double>.Available(SampleMath.LevelAt(trace.Axis.Hertz.AsSpan(), trace.LevelsDb.AsSpan(), frequency.Hertz));
    }

    /// <summary>
    /// The insertion loss of a band-pass transmission trace (S21 or S12): minus the refined peak
    /// level in dB, i.e. the loss at the top of the passband (positive for a passive filter,
    /// negative for a gain).
    /// </summary>
    /// <returns>Unavailable for a reflection or power trace.</returns>
    public static FigureResult<double> InsertionLoss(Trace trace)
    {
        ArgumentNullException.ThrowIfNull(trace);
        return RequireTransmission(trace, "insertion loss").Then(_ => Peak(trace).Select(p => -p.LevelDb));
    }

    /// <summary>The insertion loss of a transmission trace at one frequency: minus <see cref="ValueAt"/>, in dB.</summary>
    /// <returns>Unavailable for a reflection or power trace, or outside the sweep.</returns>
    public static FigureResult<double> InsertionLossAt(Trace trace, Frequency frequency)
    {
        ArgumentNullException.ThrowIfNull(trace);
        return RequireTransmission(trace, "insertion loss").Then(_ => ValueAt(trace, frequency).Select(v => -v));
    }

    /// <summary>
    /// The unloaded Q of a transmission-type resonator with equal input and output coupling,
    /// Qu = QL / (1 − |S21(f0)|) (Kajfez, Q Factor; Ginzton, Microwave Measurements), with QL
    /// from the half-power (<see cref="HalfPowerDb"/>) bandwidth and |S21(f0)| from the refined peak.
    /// </summary>
    /// <param name="s21">A transmission trace (S21 or S12).</param>
    /// <returns>Unavailable for a non-transmission trace, when the half-power bandwidth is unavailable, or when |S21(f0)| ≥ 1.</returns>
    public static FigureResult<double> UnloadedQ(Trace s21)
    {
        ArgumentNullException.ThrowIfNull(s21);
        return RequireTransmission(s21, "unloaded Q")
            .Then(_ => Bandwidth(s21, HalfPowerDb))
            .Then(bw => UnloadedQ(bw.LoadedQ, Peak(s21).Value.LevelDb));
    }

    /// <summary>
    /// Qu = QL / (1 − |S21(f0)|) for a transmission-type resonator with equal coupling
    /// (Kajfez, Q Factor; Ginzton, Microwave Measurements).
    /// </summary>
    /// <param name="loadedQ">QL from the half-power bandwidth.</param>
    /// <param name="transmissionAtResonanceDb">20·log10|S21(f0)| in dB.</param>
    /// <returns>Unavailable when |S21(f0)| ≥ 1 (0 dB or more), where the formula has no meaning.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A loaded Q not finite and positive, or a non-finite level.</exception>
    public static FigureResult<double> UnloadedQ(double loadedQ, double transmissionAtResonanceDb)
    {
        if (!double.IsFinite(loadedQ) || loadedQ <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(loadedQ), loadedQ, "A loaded Q must be finite and positive.");
        }

        if (!double.IsFinite(transmissionAtResonanceDb))
        {
            throw new ArgumentOutOfRangeException(nameof(transmissionAtResonanceDb), transmissionAtResonanceDb, "The transmission level must be finite.");
        }

        double magnitude = Math.Pow(10, transmissionAtResonanceDb / 20);
        if (magnitude >= 1)
        {
            return FigureResult<double>.Unavailable(
                $"|S21| at resonance is {QuantityFormat.Format(transmissionAtResonanceDb, QuantityUnit.Decibel)}, not below 0 dB; Qu = QL/(1 - |S21|) needs a passive resonator");
        }

        return FigureResult<double>.Available(loadedQ / (1 - magnitude));
    }

    /// <summary>
    /// The ripple over the closed range [<paramref name="from"/>, <paramref name="to"/>]: highest
    /// minus lowest level among the samples inside the range and the interpolated levels at both
    /// ends, in dB.
    /// </summary>
    /// <returns>Unavailable when <paramref name="to"/> is below <paramref name="from"/> or the range reaches outside the sweep.</returns>
    public static FigureResult<double> Ripple(Trace trace, Frequency from, Frequency to)
    {
        ArgumentNullException.ThrowIfNull(trace);
        return RangePoints(trace, from, to).Select(points =>
        {
            double max = points.Max(p => p.Level), min = points.Min(p => p.Level);
            return max - min;
        });
    }

    /// <summary>
    /// The rejection at <paramref name="at"/>: refined peak level minus the level at that
    /// frequency, in dB (positive when below the peak).
    /// </summary>
    /// <returns>Unavailable outside the sweep.</returns>
    public static FigureResult<double> Rejection(Trace trace, Frequency at)
    {
        ArgumentNullException.ThrowIfNull(trace);
        return ValueAt(trace, at).Select(level => Peak(trace).Value.LevelDb - level);
    }

    /// <summary>
    /// The rejection (see <see cref="Rejection"/>) at <paramref name="offset"/> above or below
    /// the centre of the −3 dB band (<see cref="Bandwidth"/> with its default depth).
    /// </summary>
    /// <returns>Unavailable when the −3 dB band is unavailable or the offset frequency lies outside the sweep.</returns>
    public static FigureResult<double> RejectionAtOffset(Trace trace, Frequency offset, bool above)
    {
        ArgumentNullException.ThrowIfNull(trace);
        return Bandwidth(trace).Then(bw =>
        {
            double hz = above ? bw.Centre.Hertz + offset.Hertz : bw.Centre.Hertz - offset.Hertz;
            if (hz < 0)
            {
                return FigureResult<double>.Unavailable($"{offset} below the centre {bw.Centre} is below 0 Hz");
            }

            return Rejection(trace, Frequency.FromHertz(hz));
        });
    }

    /// <summary>
    /// The worst (smallest) return loss −20·log10|S11| over the closed range
    /// [<paramref name="from"/>, <paramref name="to"/>], i.e. at the highest level among the samples
    /// inside the range and the interpolated levels at both ends (the lowest frequency on a tie).
    /// </summary>
    /// <param name="s11">A reflection trace (S11 or S22).</param>
    /// <param name="from">The lower end of the range (included).</param>
    /// <param name="to">The upper end of the range (included).</param>
    /// <returns>Unavailable for a non-reflection trace, when <paramref name="to"/> is below <paramref name="from"/>, or when the range reaches outside the sweep.</returns>
    public static FigureResult<ReturnLossPoint> WorstReturnLoss(Trace s11, Frequency from, Frequency to)
    {
        ArgumentNullException.ThrowIfNull(s11);
        if (s11.Quantity is not (TraceQuantity.S11 or TraceQuantity.S22))
        {
            return FigureResult<ReturnLossPoint>.Unavailable($"return loss needs a reflection trace (S11 or S22), not {s11.Quantity}");
        }

        return RangePoints(s11, from, to).Select(points =>
        {
            var worst = points[0];
            foreach (var p in points)
            {
                if (p.Level > worst.Level)
                {
                    worst = p;
                }
            }

            return new ReturnLossPoint(Frequency.FromHertz(worst.Hz), -worst.Level);
        });
    }

    /// <summary>
    /// The shape factor BW(<paramref name="wideDb"/>) / BW(<paramref name="narrowDb"/>), each
    /// bandwidth as in <see cref="Bandwidth"/>; 1 for an ideal brick-wall response.
    /// </summary>
    /// <returns>Unavailable when either bandwidth is.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="narrowDb"/> not positive, or <paramref name="wideDb"/> not above it.</exception>
    public static FigureResult<double> ShapeFactor(Trace trace, double wideDb = 60, double narrowDb = 3)
    {
        ArgumentNullException.ThrowIfNull(trace);
        if (!double.IsFinite(wideDb) || !(wideDb > narrowDb))
        {
            throw new ArgumentOutOfRangeException(nameof(wideDb), wideDb, "The wide depth must be deeper than the narrow one.");
        }

        return Bandwidth(trace, narrowDb).Then(narrow =>
            Bandwidth(trace, wideDb).Select(wide => wide.Width.Hertz / narrow.Width.Hertz));
    }

    internal static PeakPoint RefinedPeak(Trace trace, int start, int end)
    {
        var (hz, level, index) = SampleMath.RefineMaximum(trace.Axis.Hertz.AsSpan(), trace.LevelsDb.AsSpan(), start, end);
        return new PeakPoint(Frequency.FromHertz(hz), level, index);
    }

    private static FigureResult<List<(double Hz, double Level)>> RangePoints(Trace trace, Frequency from, Frequency to)
    {
        if (to < from)
        {
            return FigureResult<List<(double, double)>>.Unavailable($"the range {from} to {to} is empty");
        }

        if (from < trace.Axis.Start || to > trace.Axis.Stop)
        {
            return FigureResult<List<(double, double)>>.Unavailable(
                $"the range {from} to {to} reaches outside the sweep ({trace.Axis.Start} to {trace.Axis.Stop})");
        }

        return FigureResult<List<(double, double)>>.Available(
            SampleMath.RangePoints(trace.Axis.Hertz.AsSpan(), trace.LevelsDb.AsSpan(), from.Hertz, to.Hertz));
    }

    private static FigureResult<Trace> RequireTransmission(Trace trace, string figure) =>
        trace.Quantity is TraceQuantity.S21 or TraceQuantity.S12
            ? FigureResult<Trace>.Available(trace)
            : FigureResult<Trace>.Unavailable($"{figure} needs a transmission trace (S21 or S12), not {trace.Quantity}");
}
