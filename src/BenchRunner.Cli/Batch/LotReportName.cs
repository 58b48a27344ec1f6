namespace BenchRunner.Cli.Batch;

/// <summary>Names the report file the batch suggests for a lot.</summary>
public static class LotReportName
{
    /// <summary>A file name for lot <paramref name="lot"/>'s report, e.g. <c>lot-PSF-24-L07.html</c>.</summary>
    public static string For(string lot) =>
        "lot-" + new string(lot.Select(c => char.IsAsciiLetterOrDigit(c) || c is '-' or '_' or '.' ? c : '-').ToArray()) + ".html";
}
