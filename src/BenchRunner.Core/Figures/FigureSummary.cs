using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Figures;

/// <summary>
/// The standard set of figures for a trace, keyed by <see cref="FigureKeys"/>, for printing, JSON
/// output and storage. A figure that cannot be computed has a null value and the reason.
/// </summary>
public static class FigureSummary
{
    /// <summary>
    /// Filter figures, in this order: <c>peak_hz</c>, <c>peak_db</c>, <c>bandwidth_3db_hz</c>,
    /// <c>center_hz</c>, <c>loaded_q</c>, <c>insertion_loss_db</c>, <c>lower_3db_hz</c>,
    /// <c>upper_3db_hz</c>, <c>bandwidth_1db_hz</c>, <c>shape_factor_60_3</c>, and for an S21
    /// trace <c>unloaded_q</c>. Bandwidths, centre and loaded Q use exactly 3 dB (and 1 dB) below
    /// the peak; the unloaded Q uses the half-power bandwidth, as its formula requires
    /// (see <see cref="TraceFigures.UnloadedQ(Trace)"/>). The keys are those of <see cref="FigureKeys"/>;
    /// a trace in dBm reports its peak level as <c>peak_dbm</c> instead of <c>peak_db</c>.
    /// </summary>
    public static IReadOnlyList<NamedFigure> ForFilter(Trace trace)
    {
        ArgumentNullException.ThrowIfNull(trace);
        var peak = TraceFigures.Peak(trace);
        var bw3 = TraceFigures.Bandwidth(trace, 3);
        var peakLevel = trace.Unit == TraceUnit.Decibel ? FigureKeys.PeakLevel : FigureKeys.PeakPower;
        var figures = new List<NamedFigure>
        {
            NamedFigure.From(FigureKeys.PeakFrequency, peak.Select(p => p.Frequency.Hertz)),
            NamedFigure.From(peakLevel, peak.Select(p => p.LevelDb)),
            NamedFigure.From(FigureKeys.Bandwidth3Db, bw3.Select(b => b.Width.Hertz)),
            NamedFigure.From(FigureKeys.CentreFrequency, bw3.Select(b => b.Centre.Hertz)),
            NamedFigure.From(FigureKeys.LoadedQ, bw3.Select(b => b.LoadedQ)),
            NamedFigure.From(FigureKeys.InsertionLoss, TraceFigures.InsertionLoss(trace)),
            NamedFigure.From(FigureKeys.Lower3Db, bw3.Select(b => b.Lower.Hertz)),
            NamedFigure.From(FigureKeys.Upper3Db, bw3.Select(b => b.Upper.Hertz)),
            NamedFigure.From(FigureKeys.Bandwidth1Db, TraceFigures.Bandwidth(trace, 1).Select(b => b.Width.Hertz)),
            NamedFigure.From(FigureKeys.ShapeFactor60To3, TraceFigures.ShapeFactor(trace, 60, 3)),
        };

        if (trace.Quantity == TraceQuantity.S21)
        {
            figures.Add(NamedFigure.From(FigureKeys.UnloadedQ, TraceFigures.UnloadedQ(trace)));
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
            NamedFigure.From(FigureKeys.PeakFrequency, peak.Select(p => p.Frequency.Hertz)),
            NamedFigure.From(FigureKeys.PeakPower, peak.Select(p => p.LevelDb)),
            NamedFigure.From(FigureKeys.NoiseFloor, PowerFigures.NoiseFloor(trace).Select(l => l.Dbm)),
            NamedFigure.From(FigureKeys.OccupiedBandwidth, obw.Select(o => o.Width.Hertz)),
            NamedFigure.From(FigureKeys.OccupiedLower, obw.Select(o => o.Lower.Hertz)),
            NamedFigure.From(FigureKeys.OccupiedUpper, obw.Select(o => o.Upper.Hertz)),
        ];
    }
}
