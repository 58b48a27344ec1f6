using System.Globalization;
using BenchRunner.Cli.Output;
using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Text;
using BenchRunner.Storage;
using BenchRunner.Core.Runs;

namespace BenchRunner.Cli.Results;

/// <summary>
/// A tuning run as figures over sweeps: per sweep its time since the first sweep, the centre
/// frequency and its change, the loss, the −3 dB bandwidth, the worst mask margin, how many of
/// its checks were outside, and the streak of consecutive sweeps inside every check.
/// </summary>
public static class TuningTrajectoryView
{
    /// <summary>The checks tied to the last sweep of the run (the state the session ended in).</summary>
    public static IReadOnlyList<StoredCheck> LastSweepChecks(IReadOnlyList<StoredSweep> sweeps, IReadOnlyList<StoredCheck> checks) =>
        sweeps.Count == 0 ? checks : [.. checks.Where(c => c.Record.SweepId == sweeps[^1].Id)];

    /// <summary>Writes the trajectory table.</summary>
    public static void Write(IReadOnlyList<StoredSweep> sweeps, IReadOnlyList<StoredFigure> figures, IReadOnlyList<StoredCheck> checks, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(sweeps);
        ArgumentNullException.ThrowIfNull(writer);
        if (sweeps.Count == 0)
        {
            return;
        }

        var bySweep = figures.ToLookup(f => f.SweepId);
        var checksBySweep = checks.Where(c => c.Record.SweepId is not null).ToLookup(c => c.Record.SweepId!.Value);
        var first = sweeps[0].Record.AcquiredUtc ?? DateTimeOffset.MinValue;
        writer.WriteLine();
        writer.WriteLine($"  Trajectory ({Counted.Of(sweeps.Count, "sweep")} of the tuning session)");
        writer.WriteLine($"    {"#",4}  {"time",8}  {"centre",-13}  {"change",-12}  {"loss",-8}  {"-3 dB width",-13}  {"mask margin",-11}  {"checks",-8}  streak");
        double? previousCentre = null;
        int streak = 0;
        foreach (var s in sweeps)
        {
            var values = bySweep[s.Id].ToDictionary(f => f.Figure.Key, f => f.Figure.Value);
            Quantity? Get(FigureKey key) => values.TryGetValue(key, out var v) ? v : null;
            var centre = Get(FigureKeys.CentreFrequency)?.Value;
            var change = centre is { } c && previousCentre is { } p ? Signed(c - p, c) : "";
            previousCentre = centre ?? previousCentre;
            var own = checksBySweep[s.Id].ToList();
            var mask = own.FirstOrDefault(k => k.Record.Kind == CheckKind.Mask)?.Record.Margin;
            int outside = own.Count(k => !k.Record.Passed);
            streak = own.Count > 0 && outside == 0 ? streak + 1 : 0;
            var elapsed = s.Record.AcquiredUtc is { } t ? $"+{(t - first).TotalSeconds.ToString("0.0", CultureInfo.InvariantCulture)} s" : "-";
            var verdict = own.Count == 0 ? "-" : outside == 0 ? "in" : $"{outside} out";
            writer.WriteLine($"    {s.Sequence,4}  {elapsed,8}  {Cell(Get(FigureKeys.CentreFrequency)),-13}  {change,-12}  {Cell(Get(FigureKeys.InsertionLoss)),-8}  {Cell(Get(FigureKeys.Bandwidth3Db)),-13}  {(mask is { } m ? QuantityFormat.Signed(m, QuantityUnit.Decibel) : "-"),-11}  {verdict,-8}  {streak}");
        }
    }

    private static string Cell(Quantity? value) => value is { } v ? QuantityFormat.Format(v) : "-";

    // The change at the resolution the centre itself is shown with (100 Hz at 137 MHz).
    private static string Signed(double hertz, double centre)
    {
        var step = QuantityFormat.Resolution(centre, QuantityUnit.Hertz);
        var shown = step > 0 ? Math.Round(hertz / step) * step : hertz;
        return (shown >= 0 ? "+" : "-") + QuantityFormat.Format(Math.Abs(shown), QuantityUnit.Hertz);
    }
}
