namespace BenchRunner.Reports.Html;

/// <summary>The reports' stylesheet, written into every file so that it needs nothing else to show.</summary>
public static class ReportStyle
{
    /// <summary>The CSS text. It holds no '&lt;', '&gt;' or '&amp;', so it reads the same in HTML and XML.</summary>
    public const string Css = """
        body { font-family: sans-serif; margin: 1.5em auto; max-width: 62em; color: #1c2330; padding: 0 1em; }
        h1 { font-size: 1.5em; margin-bottom: 0.2em; }
        h2 { font-size: 1.2em; border-bottom: 1px solid #c5ccd8; padding-bottom: 0.2em; margin-top: 1.8em; }
        h3 { font-size: 1.0em; margin-top: 1.4em; }
        p.lead { color: #4a5568; margin-top: 0; }
        table { border-collapse: collapse; margin: 0.6em 0; font-size: 0.9em; }
        th, td { border: 1px solid #d5dae3; padding: 0.25em 0.6em; text-align: left; vertical-align: top; }
        thead th { background: #eef1f6; }
        table.facts th { background: #f5f7fa; font-weight: normal; color: #4a5568; }
        td.num { text-align: right; font-variant-numeric: tabular-nums; }
        code { font-size: 0.85em; }
        .verdict { font-weight: bold; padding: 0 0.4em; border-radius: 3px; }
        .verdict.pass { color: #fff; background: #2f855a; }
        .verdict.fail { color: #fff; background: #c53030; }
        .verdict.other { color: #1c2330; background: #ecc94b; }
        svg.plot { display: block; margin: 0.6em 0; max-width: 100%; height: auto; font-size: 11px; }
        svg .area { fill: #fbfcfe; stroke: #9aa5b8; }
        svg .grid line { stroke: #e2e6ee; }
        svg .tick { fill: #4a5568; }
        svg .plot-title { font-weight: bold; fill: #1c2330; font-size: 12px; }
        svg .axis-title { fill: #4a5568; }
        svg .trace { fill: none; stroke: #2b6cb0; stroke-width: 1.5; }
        svg .limit { fill: none; stroke: #c53030; stroke-width: 1.2; stroke-dasharray: 6 3; }
        svg .fail-span { fill: #c53030; fill-opacity: 0.18; }
        svg .bin { fill: #63b3ed; stroke: #2b6cb0; }
        svg .spec-limit line { stroke: #c53030; stroke-width: 1.5; stroke-dasharray: 5 3; }
        svg .spec-limit text { fill: #c53030; }
        svg .mean line { stroke: #2d3748; stroke-width: 1; }
        svg .mean text { fill: #2d3748; }
        svg .dot { fill: #2b6cb0; }
        svg .pass { fill: #2f855a; }
        svg .pass-retest { fill: #9ae6b4; }
        svg .fail { fill: #c53030; }
        svg .bar-label { fill: #fff; font-weight: bold; font-size: 13px; }
        footer { margin-top: 2.5em; color: #718096; font-size: 0.8em; }
        """;
}
