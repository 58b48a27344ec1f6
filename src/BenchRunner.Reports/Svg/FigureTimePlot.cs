using System.Xml.Linq;
using BenchRunner.Reports.Formatting;
using static BenchRunner.Reports.Svg.SvgNames;

namespace BenchRunner.Reports.Svg;

/// <summary>One figure over the course of a run (a tuning session: one run, many sweeps), with its limits when it has any.</summary>
public static class FigureTimePlot
{
    /// <summary>Draws the figure's values against seconds since the run started; null with fewer than two values.</summary>
    /// <param name="id">A name unique in the document.</param>
    /// <param name="title">The plot's title.</param>
    /// <param name="unit">The figure's unit.</param>
    /// <param name="points">Seconds since the start, and the value, in time order.</param>
    /// <param name="min">The lower limit, or null.</param>
    /// <param name="max">The upper limit, or null.</param>
    public static XElement? Create(string id, string title, string unit, IReadOnlyList<(double Seconds, double Value)> points, double? min, double? max)
    {
        ArgumentNullException.ThrowIfNull(points);
        if (points.Count < 2)
        {
            return null;
        }

        var values = points.Select(p => p.Value).Concat(new[] { min, max }.OfType<double>()).ToList();
        var (divisor, shown) = ReportFormat.DisplayUnit(values.Max(Math.Abs), unit);
        var frame = new PlotFrame(id, title, NiceScale.Enclosing(0, points[^1].Seconds, 8),
            NiceScale.Enclosing(values.Min() / divisor, values.Max() / divisor, 6),
            "time since the start (s)", shown.Length == 0 ? "value" : shown, height: 220);
        foreach (var (limit, cssClass) in new[] { (min, "limit lower"), (max, "limit upper") })
        {
            if (limit is { } l)
            {
                frame.Content.Add(frame.Line([(frame.X.Minimum, l / divisor), (frame.X.Maximum, l / divisor)], cssClass));
            }
        }

        frame.Content.Add(frame.Line(points.Select(p => (p.Seconds, p.Value / divisor)), "trace"));
        foreach (var (seconds, value) in points)
        {
            frame.Content.Add(Element("circle", Attr("cx", frame.MapX(seconds)), Attr("cy", frame.MapY(value / divisor)), Attr("r", 2.5), Attr("class", "dot")));
        }

        return frame.Root;
    }
}
