using System.Xml.Linq;
using BenchRunner.Core.Masks;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Reports.Formatting;
using static BenchRunner.Reports.Svg.SvgNames;

namespace BenchRunner.Reports.Svg;

/// <summary>A trace's level against frequency, with its mask's limit lines and the spans that break them shaded.</summary>
public static class TracePlot
{
    /// <summary>The lowest level drawn below the trace's highest, in dB, so that a −400 dB "no signal" floor does not squash the plot.</summary>
    public const double DepthDb = 120;

    /// <summary>Draws <paramref name="trace"/> and, when given, the mask evaluation made of it.</summary>
    /// <param name="id">A name unique in the document.</param>
    /// <param name="title">The plot's title.</param>
    /// <param name="trace">The trace.</param>
    /// <param name="evaluation">The trace checked against its mask, or null to draw the trace alone.</param>
    public static XElement Create(string id, string title, Trace trace, MaskEvaluation? evaluation)
    {
        ArgumentNullException.ThrowIfNull(trace);
        var (divisor, unit) = ReportFormat.DisplayUnit(trace.Axis.Stop.Hertz, "Hz");
        var hertz = trace.Axis.Hertz;
        var levels = trace.LevelsDb;
        var top = levels.Max();
        var floor = top - DepthDb;
        var drawn = levels.Select(l => Math.Max(l, floor)).ToList();
        var limits = evaluation is null ? [] : evaluation.UpperLimitsDb.Concat(evaluation.LowerLimitsDb).OfType<double>().ToList();
        var x = hertz.Length > 1 ? NiceScale.Exact(hertz[0] / divisor, hertz[^1] / divisor, 9) : NiceScale.Enclosing(hertz[0] / divisor, hertz[0] / divisor);
        var y = NiceScale.Enclosing(drawn.Concat(limits).Min(), drawn.Concat(limits).Max(), 7);
        var frame = new PlotFrame(id, title, x, y, $"frequency ({unit})", $"{trace.Quantity} ({trace.UnitSymbol})");

        if (evaluation is not null)
        {
            var spacing = hertz.Length > 1 ? (hertz[^1] - hertz[0]) / (hertz.Length - 1) : 0;
            foreach (var span in evaluation.FailingSpans)
            {
                // A span runs from one failing point to another; widen it by half a point spacing each side so a single point shows.
                var from = frame.MapX((span.Start.Hertz - spacing / 2) / divisor);
                var to = frame.MapX((span.Stop.Hertz + spacing / 2) / divisor);
                frame.Content.Add(Element("rect", Attr("x", from), Attr("y", frame.AreaTop), Attr("width", Math.Max(to - from, 1.0)),
                    Attr("height", frame.AreaBottom - frame.AreaTop), Attr("class", "fail-span"),
                    Element("title", $"fails the {(span.Side == LimitSide.Upper ? "upper" : "lower")} limit from {QuantityFormat.Format(span.Start.Hertz, QuantityUnit.Hertz)} to {QuantityFormat.Format(span.Stop.Hertz, QuantityUnit.Hertz)}, worst {QuantityFormat.Signed(span.WorstMarginDb, QuantityUnit.Decibel)}")));
            }

            AddLimit(frame, hertz, evaluation.UpperLimitsDb, divisor, "limit upper");
            AddLimit(frame, hertz, evaluation.LowerLimitsDb, divisor, "limit lower");
        }

        frame.Content.Add(frame.Line(hertz.Select((h, i) => (h / divisor, drawn[i])), "trace"));
        if (evaluation is not null)
        {
            frame.Root.Add(Element("text", Attr("x", frame.Width - 16), Attr("y", frame.Height - 8), Attr("text-anchor", "end"), Attr("class", "tick"),
                "dashed: mask · shaded: fails"));
        }

        return frame.Root;
    }

    private static void AddLimit(PlotFrame frame, IReadOnlyList<double> hertz, IReadOnlyList<double?> limit, double divisor, string cssClass)
    {
        // Points where the mask has no limit (a gap) break the line.
        var run = new List<(double, double)>();
        for (int i = 0; i <= limit.Count; i++)
        {
            if (i < limit.Count && limit[i] is { } value)
            {
                run.Add((hertz[i] / divisor, value));
                continue;
            }

            frame.Content.Add(frame.Line(run, cssClass));
            run.Clear();
        }
    }
}
