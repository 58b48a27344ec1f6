using System.Text;
using System.Xml;
using System.Xml.Linq;
using static BenchRunner.Reports.Html.Html;

namespace BenchRunner.Reports.Html;

/// <summary>
/// Wraps a report's body into one self-contained page (stylesheet inline, plots as inline SVG,
/// no scripts, no links out) and writes it as XHTML, which every browser opens as HTML and any
/// XML parser reads.
/// </summary>
public static class ReportDocument
{
    /// <summary>Builds the page.</summary>
    /// <param name="title">The page title.</param>
    /// <param name="body">The body's content.</param>
    /// <param name="generatedUtc">When the report was made (shown in the footer).</param>
    /// <param name="softwareVersion">The version of BenchRunner that made it.</param>
    public static XDocument Create(string title, IEnumerable<object?> body, DateTimeOffset generatedUtc, string softwareVersion) =>
        new(E("html", new XAttribute("lang", "en"),
                E("head",
                    E("meta", new XAttribute("charset", "utf-8")),
                    E("meta", new XAttribute("name", "viewport"), new XAttribute("content", "width=device-width, initial-scale=1")),
                    E("meta", new XAttribute("name", "generator"), new XAttribute("content", $"BenchRunner {softwareVersion}")),
                    E("title", title),
                    E("style", ReportStyle.Css)),
                E("body", body,
                    E("footer", $"Made by BenchRunner {softwareVersion} on {Formatting.ReportFormat.Time(generatedUtc)} from the result file. Plots are drawn from the stored sweeps."))));

    /// <summary>The page as text (UTF-8 without a byte order mark, no XML declaration).</summary>
    public static string ToText(XDocument document)
    {
        ArgumentNullException.ThrowIfNull(document);
        var text = new StringBuilder();
        using (var writer = XmlWriter.Create(new StringWriter(text), new XmlWriterSettings
        {
            OmitXmlDeclaration = true,
            Indent = true,
            IndentChars = " ",
            NewLineChars = "\n",
        }))
        {
            document.Save(writer);
        }

        // Written by hand: XDocumentType would write "<!DOCTYPE html >".
        return "<!DOCTYPE html>\n" + text.Append('\n');
    }
}
