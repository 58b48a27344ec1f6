using System.Globalization;
using System.Xml.Linq;
using BenchRunner.Core.Quantities;
using BenchRunner.Reports.Formatting;
using BenchRunner.Reports.Lots;
using BenchRunner.Reports.Svg;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;
using static BenchRunner.Reports.Html.Html;

namespace BenchRunner.Reports.Html;

/// <summary>
/// The report of a lot: yield and first-pass yield, the checks that failed most, each limited
/// figure's spread against its limits (table and histogram, with Cpk), every board's verdict and
/// history, the instruments and plans used, and each board's traces against their masks.
/// </summary>
public static class LotReport
{
    /// <summary>Builds the report of lot <paramref name="lot"/>.</summary>
    /// <exception cref="ArgumentException">The store holds no run of that lot.</exception>
    /// <exception cref="ResultStoreException">The file cannot be read.</exception>
    public static XDocument Create(SqliteResultStore store, string lot, DateTimeOffset generatedUtc, string softwareVersion)
    {
        ArgumentNullException.ThrowIfNull(store);
        var summary = LotSummary.Read(store, lot);
        if (summary.Runs.Count == 0)
        {
            throw new ArgumentException($"{store.Path} holds no run of lot \"{lot}\".", nameof(lot));
        }

        var title = $"Lot {lot}";
        var body = new List<object?> { E("h1", title), E("p", Class("lead"), Lead(summary)) };
        body.Add(E("h2", "Yield"));
        if (summary.Yield is { } yield)
        {
            body.Add(YieldPlot.Create("yield", yield));
            body.Add(Facts(
            [
                ("boards with a verdict", Count(yield.Boards)),
                ("passed (latest verdict)", Count(yield.Passed)),
                ("failed (latest verdict)", Count(yield.Failed)),
                ("yield", ReportFormat.Percent(yield.Yield)),
                ("first-pass yield", ReportFormat.Percent(yield.FirstPassYield)),
                ("boards retested", Count(yield.Retested)),
                ("left untested", summary.Untested.Count == 0 ? "none" : string.Join(", ", summary.Untested)),
            ]));
            body.Add(E("h2", "Failures by check"));
            body.Add(yield.FailuresByCheck.Count == 0 ? E("p", "No check failed.")
                : Table("failures", ["check", "failures", "share of tests"], yield.FailuresByCheck.Select(f => new object?[]
                {
                    f.CheckName, E("td", Class("num"), Count(f.Failures)),
                    E("td", Class("num"), ReportFormat.Percent((double)f.Failures / summary.Boards.Sum(b => b.Runs.Count))),
                })));
        }
        else
        {
            body.Add(E("p", "No board of this lot has a verdict yet."));
        }

        body.Add(E("h2", "Figures against their limits"));
        body.AddRange(FigureSections(summary));
        body.Add(E("h2", "Boards"));
        body.Add(BoardTable(summary));
        body.Add(E("h2", "Plans"));
        body.Add(Table("plans", ["plan", "SHA-256", "runs"], summary.Runs
            .GroupBy(r => (r.Record.PlanName, r.PlanSha256))
            .Select(g => new object?[] { g.Key.PlanName, E("code", g.Key.PlanSha256), E("td", Class("num"), Count(g.Count())) })));
        body.Add(E("h2", "Instruments"));
        body.Add(RunReport.InstrumentTable(summary.Boards
            .SelectMany(b => store.GetInstruments(b.Latest.Id))
            .DistinctBy(i => (i.Role, i.Maker, i.Model, i.Serial, i.Firmware))));
        body.Add(E("h2", "Each board against its masks"));
        foreach (var board in summary.Boards)
        {
            body.Add(E("h3", $"{board.Serial}: run {board.Latest.Id} ", RunReport.StatusVerdict(board.Latest.Status)));
            body.AddRange(RunReport.Sections(store, board.Latest, $"board-{Safe(board.Serial)}", brief: true).Where(e => e.Name.LocalName == "svg"));
        }

        return ReportDocument.Create(title, body, generatedUtc, softwareVersion);
    }

    private static string Lead(LotSummary summary)
    {
        var first = summary.Runs[0].StartedUtc;
        var last = summary.Runs[^1].EndedUtc ?? summary.Runs[^1].StartedUtc;
        return $"{summary.Boards.Count + summary.Untested.Count} boards, {summary.Runs.Count} runs, from {ReportFormat.Time(first)} to {ReportFormat.Time(last)}. "
            + "A board counts by its latest verdict; runs that were stopped or could not finish do not count.";
    }

    private static IEnumerable<XElement> FigureSections(LotSummary summary)
    {
        if (summary.Figures.Count == 0)
        {
            yield return E("p", "No figure limits were recorded with the lot's runs.");
            yield break;
        }

        yield return Table("capability", ["figure", "boards", "mean", "std dev", "min", "max", "LSL", "USL", "Cp", "Cpk"],
            summary.Figures.Select(f => new object?[]
            {
                f.Limit.CheckName,
                Num(Count(f.Values.Count)),
                Num(f.Statistics is { } s ? QuantityFormat.Format(s.Mean, f.Limit.Unit) : null),
                Num(f.Statistics is { } sd ? QuantityFormat.Format(sd.StandardDeviation, f.Limit.Unit) : null),
                Num(f.Statistics is { } lo ? QuantityFormat.Format(lo.Minimum, f.Limit.Unit) : null),
                Num(f.Statistics is { } hi ? QuantityFormat.Format(hi.Maximum, f.Limit.Unit) : null),
                Num(f.Limit.Min is { } lsl ? QuantityFormat.Format(lsl, f.Limit.Unit) : null),
                Num(f.Limit.Max is { } usl ? QuantityFormat.Format(usl, f.Limit.Unit) : null),
                Num(f.Capability.IsAvailable && f.Capability.Value.Cp is { } cp ? cp.ToString("0.00", CultureInfo.InvariantCulture) : null),
                f.Capability.IsAvailable ? Num(f.Capability.Value.Cpk.ToString("0.00", CultureInfo.InvariantCulture)) : E("td", $"not available: {f.Capability.Reason}"),
            }));
        yield return E("p", "Cp = (USL − LSL)/6σ and Cpk = min(USL − mean, mean − LSL)/3σ, with σ the sample standard deviation of the boards' latest values (NIST/SEMATECH e-Handbook of Statistical Methods, §6.1.6).");
        int n = 0;
        foreach (var spread in summary.Figures)
        {
            if (HistogramPlot.Create($"histogram{++n}", spread) is { } svg)
            {
                yield return svg;
            }
        }
    }

    private static XElement BoardTable(LotSummary summary)
    {
        var rows = summary.Boards.Select(b => new object?[]
        {
            b.Serial,
            Verdict(b.Passed ? "PASS" : "FAIL", b.Passed),
            Num(Count(b.Runs.Count)),
            b.Retested ? $"yes (first: {(b.PassedFirstTime ? "pass" : "fail")})" : "no",
            Num(b.Latest.Id.ToString(CultureInfo.InvariantCulture)),
            ReportFormat.Time(b.Latest.StartedUtc),
            b.LatestFailedChecks.Count == 0 ? "" : string.Join("; ", b.LatestFailedChecks),
        }).ToList();
        rows.AddRange(summary.Untested.Select(s => new object?[] { s, Verdict("UNTESTED", null), "0", "", "", "", "no run finished with a verdict" }));
        return Table("boards", ["board", "verdict", "tests", "retested", "counting run", "tested", "failed checks"], rows);
    }

    private static XElement Num(string? text) => E("td", Class("num"), text ?? "-");

    private static string Count(int n) => n.ToString(CultureInfo.InvariantCulture);

    private static string Safe(string serial) => new(serial.Select(c => char.IsAsciiLetterOrDigit(c) ? c : '-').ToArray());
}
