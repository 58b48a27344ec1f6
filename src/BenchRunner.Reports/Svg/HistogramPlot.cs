using System.Xml.Linq;
using BenchRunner.Core.Quantities;
using BenchRunner.Reports.Formatting;
using BenchRunner.Reports.Lots;
using static BenchRunner.Reports.Svg.SvgNames;

namespace BenchRunner.Reports.Svg;

/// <summary>
/// A histogram of one figure across a lot, with its lower and upper limits and the mean marked.
/// The bin count follows Sturges' rule, ⌈log2 n⌉ + 1 (common practice, no source), over a range
/// that holds both the values and the limits.
/// </summary>
public static class HistogramPlot
{
    /// <summary>The number of bins for <paramref name="count"/> values (at least 5, so a small lot still shows a shape).</summary>
    public static int Bins(int count) => Math.Max(5, (int)Math.Ceiling(Math.Log2(Math.Max(count, 1))) + 1);

    /// <summary>Draws the spread; null when it has no values.</summary>
    /// <param name="id">A name unique in the document.</param>
    /// <param name="spread">The figure's values and limits.</param>
    public static XElement? Create(string id, FigureSpread spread)
    {
        ArgumentNullException.ThrowIfNull(spread);
        if (spread.Values.Count == 0 || spread.Statistics is not { } stats)
        {
            return null;
        }

        var limit = spread.Limit;
        var ends = spread.Values.Select(v => v.Value).Concat(new[] { limit.Min, limit.Max }.OfType<double>()).ToList();
        var (divisor, unit) = ReportFormat.DisplayUnit(ends.Max(Math.Abs), limit.Unit);
        double low = ends.Min() / divisor, high = ends.Max() / divisor;
        var pad = (high - low) * 0.05;
        if (pad == 0)
        {
            pad = Math.Max(Math.Abs(low) * 0.01, 1e-9);
        }

        low -= pad;
        high += pad;
        int bins = Bins(spread.Values.Count);
        var width = (high - low) / bins;
        var counts = new int[bins];
        foreach (var (_, value) in spread.Values)
        {
            counts[Math.Clamp((int)((value / divisor - low) / width), 0, bins - 1)]++;
        }

        var frame = new PlotFrame(id, $"{limit.CheckName}: {spread.Values.Count} boards", NiceScale.Enclosing(low, high, 8),
            NiceScale.Enclosing(0, counts.Max(), Math.Min(counts.Max() + 1, 6)),
            unit.Length == 0 ? limit.Key : $"{limit.Key} ({unit})", "boards", height: 240);
        for (int i = 0; i < bins; i++)
        {
            if (counts[i] == 0)
            {
                continue;
            }

            double from = frame.MapX(low + i * width), to = frame.MapX(low + (i + 1) * width);
            var y = frame.MapY(counts[i]);
            frame.Content.Add(Element("rect", Attr("x", from), Attr("y", y), Attr("width", Math.Max(to - from - 1, 1.0)),
                Attr("height", frame.MapY(0) - y), Attr("class", "bin"),
                Element("title", $"{counts[i]} board{(counts[i] == 1 ? "" : "s")} from {QuantityFormat.Format((low + i * width) * divisor, limit.Unit)} to {QuantityFormat.Format((low + (i + 1) * width) * divisor, limit.Unit)}")));
        }

        if (limit.Min is { } lsl)
        {
            frame.Content.Add(frame.Marker(lsl / divisor, "spec-limit", "LSL"));
        }

        if (limit.Max is { } usl)
        {
            frame.Content.Add(frame.Marker(usl / divisor, "spec-limit", "USL"));
        }

        frame.Content.Add(frame.Marker(stats.Mean / divisor, "mean", "mean"));
        return frame.Root;
    }
}
