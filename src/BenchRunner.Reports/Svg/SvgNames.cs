using System.Xml.Linq;

namespace BenchRunner.Reports.Svg;

/// <summary>The SVG namespace and a shorthand for its elements.</summary>
public static class SvgNames
{
    /// <summary>The SVG namespace.</summary>
    public static readonly XNamespace Ns = "http://www.w3.org/2000/svg";

    /// <summary>An SVG element with the given attributes (name, value pairs) and children.</summary>
    public static XElement Element(string name, params object?[] content) => new(Ns + name, content);

    /// <summary>An attribute; a double is written in invariant culture with at most two decimals.</summary>
    public static XAttribute Attr(string name, object value) =>
        new(name, value is double d ? Formatting.ReportFormat.Coordinate(d) : value);
}
