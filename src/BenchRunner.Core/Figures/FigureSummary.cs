using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Figures;

/// <summary>
/// The standard set of figures for a trace, with stable keys, for printing, JSON output and
/// storage. A figure that cannot be computed has a null value and the reason.
/// </summary>
public static class FigureSummary
{
    /// <summary>
    /// Filter figures, in this order: <c>peak_hz</c>, <c>peak_db</c>, <c>bandwidth_3db_hz</c>,
    /// <c>center_hz</c>, <c>loaded_q</c>, <c>insertion_loss_db</c>, <c>lower_3db_hz</c>,
    /// <c>upper_3db_hz</c>, <c>bandwidth_1db_hz</c>, <c>shape_factor_60_3</c>, and for an S21
    /// trace <c>unloaded_q</c>. Bandwidths, centre and loaded Q use exactly 3 dB (and 1 dB) below
    /// the peak; the unloaded Q uses the half-power bandwidth, as its formula requires
    /// (see <see cref="TraceFigures.UnloadedQ(Trace)"/>). <c>peak_db</c> is in the trace's unit.
    /// </summary>
    public static IReadOnlyList<NamedFigure> ForFilter(Trace trace)
    {
        ArgumentNullException.ThrowIfNull(trace);
        var peak = TraceFigures.Peak(trace);
        var bw3 = TraceFigures.Bandwidth(trace, 3);
        var figures = new List<NamedFigure>
        {
            Named("peak_hz", "Peak frequency", peak.Select(p => p.Frequency.Hertz), "Hz"),
            Named("peak_db", "Peak level", peak.Select(p => p.LevelDb), trace.UnitSymbol),
            Named("bandwidth_3db_hz", "-3 dB bandwidth", bw3.Select(b => b.Width.Hertz), "Hz"),
            Named("center_hz", "Centre frequency (-3 dB)", bw3.Select(b => b.Centre.Hertz), "Hz"),
            Named("loaded_q", "Loaded Q (-3 dB)", bw3.Select(b => b.LoadedQ), ""),
            Named("insertion_loss_db", "Insertion loss", TraceFigures.InsertionLoss(trace), "dB"),
            Named("lower_3db_hz", "Lower -3 dB edge", bw3.Select(b => b.Lower.Hertz), "Hz"),
            Named("upper_3db_hz", "Upper -3 dB edge", bw3.Select(b => b.Upper.Hertz), "Hz"),
            Named("bandwidth_1db_hz", "-1 dB bandwidth", TraceFigures.Bandwidth(trace, 1).Select(b => b.Width.Hertz), "Hz"),
            Named("shape_factor_60_3", "Shape factor 60/3 dB", TraceFigures.ShapeFactor(trace, 60, 3), ""),
        };

        if (trace.Quantity == TraceQuantity.S21)
        {
            figures.Add(Named("unloaded_q", "Unloaded Q", TraceFigures.UnloadedQ(trace), ""));
        }

        return figures;
    }

    /// <summary>
    /// Spectrum figures, in this order: <c>peak_hz</c>, <c>peak_dbm</c> (the highest line, refined),
    /// <c>noise_floor_dbm</c> (<see cref="PowerFigures.NoiseFloor"/>), <c>occupied_bandwidth_hz</c>,
    /// <c>occupied_lower_hz</c> and <c>occupied_upper_hz</c> (99 % of the power).
    /// </summary>
    public static IReadOnlyList<NamedFigure> ForSpectrum(PowerTrace trace)
    {
        ArgumentNullException.ThrowIfNull(trace);
        var peak = TraceFigures.Peak(trace);
        var obw = PowerFigures.OccupiedBandwidth(trace, 0.99);
        return
        [
            Named("peak_hz", "Peak frequency", peak.Select(p => p.Frequency.Hertz), "Hz"),
            Named("peak_dbm", "Peak level", peak.Select(p => p.LevelDb), "dBm"),
            Named("noise_floor_dbm", "Noise floor (median)", PowerFigures.NoiseFloor(trace).Select(l => l.Dbm), "dBm"),
            Named("occupied_bandwidth_hz", "Occupied bandwidth (99 %)", obw.Select(o => o.Width.Hertz), "Hz"),
            Named("occupied_lower_hz", "Occupied band lower edge", obw.Select(o => o.Lower.Hertz), "Hz"),
            Named("occupied_upper_hz", "Occupied band upper edge", obw.Select(o => o.Upper.Hertz), "Hz"),
        ];
    }

    private static NamedFigure Named(string key, string label, FigureResult<double> result, string unit) =>
        result.IsAvailable
            ? new NamedFigure(key, label, result.Value, unit, null)
            : new NamedFigure(key, label, null, unit, result.Reason);
}
