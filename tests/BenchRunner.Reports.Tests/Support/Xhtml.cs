using System.Xml.Linq;
using BenchRunner.Reports.Html;

namespace BenchRunner.Reports.Tests.Support;

/// <summary>Reads a written report back as XML, which fails on anything not well-formed.</summary>
public static class Xhtml
{
    public static readonly XNamespace H = "http://www.w3.org/1999/xhtml";
    public static readonly XNamespace S = "http://www.w3.org/2000/svg";

    /// <summary>Writes <paramref name="document"/> as the report verb does and parses the text.</summary>
    public static (string Text, XDocument Parsed) RoundTrip(XDocument document)
    {
        var text = ReportDocument.ToText(document);
        // The doctype is HTML's; the rest must parse as XML.
        return (text, XDocument.Parse(text, LoadOptions.None));
    }

    public static IEnumerable<XElement> Svgs(XDocument page) => page.Descendants(S + "svg");

    public static string TextOf(XDocument page) => page.Root!.Value;

    /// <summary>Checks that the page needs nothing from outside itself: no scripts, no links out, no external images or styles.</summary>
    public static void AssertSelfContained(string text, XDocument page)
    {
        Assert.StartsWith("<!DOCTYPE html>\n<html", text);
        Assert.Equal(H + "html", page.Root!.Name);
        Assert.Empty(page.Descendants(H + "script"));
        Assert.Empty(page.Descendants(H + "link"));
        Assert.Empty(page.Descendants(H + "img"));
        Assert.DoesNotContain(page.Descendants().Attributes(), a => a.Name.LocalName is "href" or "src");
        Assert.DoesNotContain("http://", page.Descendants().Attributes().Where(a => !a.IsNamespaceDeclaration).Select(a => a.Value).Aggregate("", string.Concat));
        Assert.Single(page.Descendants(H + "style"));
        // No empty non-void HTML element is written self-closed (HTML would read "<td/>" as an open tag).
        Assert.DoesNotContain(page.Descendants().Where(e => e.Name.Namespace == H && e.Name.LocalName is not ("meta" or "br")), e => e.IsEmpty);
    }
}
