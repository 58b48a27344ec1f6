using System.Xml.Linq;

namespace BenchRunner.Reports.Html;

/// <summary>
/// Shorthands for XHTML elements. Elements that must not be self-closing in HTML get an empty
/// text node, so the written file reads the same as HTML and as XML.
/// </summary>
public static class Html
{
    /// <summary>The XHTML namespace.</summary>
    public static readonly XNamespace Ns = "http://www.w3.org/1999/xhtml";

    private static readonly HashSet<string> Void = new(StringComparer.Ordinal) { "meta", "br", "hr", "img", "col", "link" };

    /// <summary>An element with attributes and children (strings become text).</summary>
    public static XElement E(string name, params object?[] content)
    {
        var element = new XElement(Ns + name, content);
        if (!Void.Contains(name) && element.IsEmpty)
        {
            element.Add(string.Empty);
        }

        return element;
    }

    /// <summary>A <c>class</c> attribute.</summary>
    public static XAttribute Class(string value) => new("class", value);

    /// <summary>A table with a header row and body rows; each cell is text or an element.</summary>
    public static XElement Table(string cssClass, IEnumerable<string> headers, IEnumerable<IEnumerable<object?>> rows) =>
        E("table", Class(cssClass),
            E("thead", E("tr", headers.Select(h => E("th", h)))),
            E("tbody", rows.Select(r => E("tr", r.Select(c => c is XElement cell && cell.Name == Ns + "td" ? cell : E("td", c ?? "-"))))));

    /// <summary>A two-column table of names and values.</summary>
    public static XElement Facts(IEnumerable<(string Name, object? Value)> facts) =>
        E("table", Class("facts"), E("tbody", facts.Select(f => E("tr", E("th", f.Name), E("td", f.Value ?? "-")))));

    /// <summary>A verdict word in a span coloured by the stylesheet.</summary>
    public static XElement Verdict(string word, bool? passed) =>
        E("span", Class(passed switch { true => "verdict pass", false => "verdict fail", null => "verdict other" }), word);
}
