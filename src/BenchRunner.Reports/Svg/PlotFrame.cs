using System.Globalization;
using System.Text;
using System.Xml.Linq;
using static BenchRunner.Reports.Svg.SvgNames;

namespace BenchRunner.Reports.Svg;

/// <summary>
/// A rectangular plot: axes with round ticks and labels, a grid, titles, and a mapping from data
/// values to SVG coordinates. Content is added to <see cref="Content"/>; it is clipped to the plot area.
/// </summary>
public sealed class PlotFrame
{
    private const double Left = 64, Right = 16, Top = 28, Bottom = 44;
    private readonly string _clipId;

    /// <summary>Creates a frame.</summary>
    /// <param name="id">A name unique in the document (used for the clip path).</param>
    /// <param name="title">The plot's title, above it.</param>
    /// <param name="x">The horizontal scale, in displayed units.</param>
    /// <param name="y">The vertical scale, in displayed units.</param>
    /// <param name="xTitle">The horizontal axis's title with unit.</param>
    /// <param name="yTitle">The vertical axis's title with unit.</param>
    /// <param name="width">Overall width in SVG units.</param>
    /// <param name="height">Overall height in SVG units.</param>
    public PlotFrame(string id, string title, NiceScale x, NiceScale y, string xTitle, string yTitle, double width = 720, double height = 300)
    {
        X = x;
        Y = y;
        Width = width;
        Height = height;
        _clipId = $"clip-{id}";
        Content = Element("g", Attr("clip-path", $"url(#{_clipId})"));
        Root = Element("svg",
            Attr("viewBox", string.Create(CultureInfo.InvariantCulture, $"0 0 {width} {height}")),
            Attr("width", width), Attr("height", height), Attr("role", "img"), Attr("class", "plot"), Attr("id", id),
            Element("title", title),
            Element("defs", Element("clipPath", Attr("id", _clipId),
                Element("rect", Attr("x", Left), Attr("y", Top), Attr("width", PlotWidth), Attr("height", PlotHeight)))),
            Element("rect", Attr("x", Left), Attr("y", Top), Attr("width", PlotWidth), Attr("height", PlotHeight), Attr("class", "area")),
            Grid(),
            Element("text", Attr("x", Left), Attr("y", 18.0), Attr("class", "plot-title"), title),
            Element("text", Attr("x", Left + PlotWidth / 2), Attr("y", height - 8), Attr("class", "axis-title"), Attr("text-anchor", "middle"), xTitle),
            Element("text", Attr("transform", string.Create(CultureInfo.InvariantCulture, $"translate(14 {Top + PlotHeight / 2:0.##}) rotate(-90)")),
                Attr("class", "axis-title"), Attr("text-anchor", "middle"), yTitle),
            Content);
    }

    /// <summary>The horizontal scale.</summary>
    public NiceScale X { get; }

    /// <summary>The vertical scale.</summary>
    public NiceScale Y { get; }

    /// <summary>Overall width.</summary>
    public double Width { get; }

    /// <summary>Overall height.</summary>
    public double Height { get; }

    /// <summary>The plot area's width.</summary>
    public double PlotWidth => Width - Left - Right;

    /// <summary>The plot area's height.</summary>
    public double PlotHeight => Height - Top - Bottom;

    /// <summary>The whole <c>svg</c> element.</summary>
    public XElement Root { get; }

    /// <summary>The group, clipped to the plot area, that data is drawn into.</summary>
    public XElement Content { get; }

    /// <summary>The SVG x coordinate of <paramref name="value"/>.</summary>
    public double MapX(double value) => Left + (value - X.Minimum) / (X.Maximum - X.Minimum) * PlotWidth;

    /// <summary>The SVG y coordinate of <paramref name="value"/>.</summary>
    public double MapY(double value) => Top + (Y.Maximum - value) / (Y.Maximum - Y.Minimum) * PlotHeight;

    /// <summary>The top of the plot area.</summary>
    public double AreaTop => Top;

    /// <summary>The bottom of the plot area.</summary>
    public double AreaBottom => Top + PlotHeight;

    /// <summary>A polyline through the points, or null with fewer than two.</summary>
    public XElement? Line(IEnumerable<(double X, double Y)> points, string cssClass)
    {
        var text = new StringBuilder();
        int count = 0;
        foreach (var (x, y) in points)
        {
            text.Append(count++ == 0 ? "" : " ").Append(Formatting.ReportFormat.Coordinate(MapX(x))).Append(',').Append(Formatting.ReportFormat.Coordinate(MapY(y)));
        }

        return count < 2 ? null : Element("polyline", Attr("points", text.ToString()), Attr("class", cssClass));
    }

    /// <summary>A vertical line across the plot area at <paramref name="x"/>, with a label at its top.</summary>
    public XElement Marker(double x, string cssClass, string label) =>
        Element("g", Attr("class", cssClass),
            Element("line", Attr("x1", MapX(x)), Attr("x2", MapX(x)), Attr("y1", AreaTop), Attr("y2", AreaBottom)),
            Element("text", Attr("x", MapX(x) + 3), Attr("y", AreaTop + 12), label));

    private XElement Grid()
    {
        var grid = Element("g", Attr("class", "grid"));
        foreach (var tick in X.Ticks())
        {
            var px = MapX(tick);
            grid.Add(Element("line", Attr("x1", px), Attr("x2", px), Attr("y1", Top), Attr("y2", Top + PlotHeight)));
            grid.Add(Element("text", Attr("x", px), Attr("y", Top + PlotHeight + 16), Attr("text-anchor", "middle"), Attr("class", "tick"), Label(tick, X.Step)));
        }

        foreach (var tick in Y.Ticks())
        {
            var py = MapY(tick);
            grid.Add(Element("line", Attr("x1", Left), Attr("x2", Left + PlotWidth), Attr("y1", py), Attr("y2", py)));
            grid.Add(Element("text", Attr("x", Left - 6), Attr("y", py + 4), Attr("text-anchor", "end"), Attr("class", "tick"), Label(tick, Y.Step)));
        }

        return grid;
    }

    private static string Label(double value, double step)
    {
        var decimals = Math.Clamp((int)Math.Ceiling(-Math.Log10(step) - 1e-9), 0, 9);
        return Math.Round(value, decimals).ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
    }
}
