using System.Xml.Linq;
using BenchRunner.Core.Statistics;
using BenchRunner.Reports.Formatting;
using static BenchRunner.Reports.Svg.SvgNames;

namespace BenchRunner.Reports.Svg;

/// <summary>A lot's boards as one bar: passed first time, passed on retest, failed.</summary>
public static class YieldPlot
{
    /// <summary>Draws <paramref name="yield"/>.</summary>
    public static XElement Create(string id, LotYield yield)
    {
        ArgumentNullException.ThrowIfNull(yield);
        const double width = 720, left = 16, barWidth = width - 2 * left, barTop = 34, barHeight = 36;
        var parts = new (int Boards, string Class, string Label)[]
        {
            (yield.PassedFirstTime, "pass", "passed first time"),
            (yield.Passed - yield.PassedFirstTime, "pass-retest", "passed on retest"),
            (yield.Failed, "fail", "failed"),
        };
        var svg = Element("svg", Attr("viewBox", $"0 0 {width} 110"), Attr("width", width), Attr("height", 110.0),
            Attr("role", "img"), Attr("class", "plot"), Attr("id", id),
            Element("title", $"yield {ReportFormat.Percent(yield.Yield)}, first-pass yield {ReportFormat.Percent(yield.FirstPassYield)}"),
            Element("text", Attr("x", left), Attr("y", 20.0), Attr("class", "plot-title"),
                $"{yield.Boards} boards: yield {ReportFormat.Percent(yield.Yield)}, first-pass yield {ReportFormat.Percent(yield.FirstPassYield)}"));
        double x = left, legendX = left;
        foreach (var (boards, cssClass, label) in parts)
        {
            var w = barWidth * boards / yield.Boards;
            if (boards > 0)
            {
                svg.Add(Element("rect", Attr("x", x), Attr("y", barTop), Attr("width", w), Attr("height", barHeight), Attr("class", cssClass),
                    Element("title", $"{boards} {label}")));
                svg.Add(Element("text", Attr("x", x + w / 2), Attr("y", barTop + 23), Attr("text-anchor", "middle"), Attr("class", "bar-label"), boards.ToString(System.Globalization.CultureInfo.InvariantCulture)));
            }

            x += w;
            svg.Add(Element("rect", Attr("x", legendX), Attr("y", 84.0), Attr("width", 12.0), Attr("height", 12.0), Attr("class", cssClass)));
            svg.Add(Element("text", Attr("x", legendX + 16), Attr("y", 94.0), Attr("class", "tick"), $"{label} ({boards})"));
            legendX += 200;
        }

        return svg;
    }
}
