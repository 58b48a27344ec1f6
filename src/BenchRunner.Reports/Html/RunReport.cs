using System.Xml.Linq;
using BenchRunner.Core.Figures;
using BenchRunner.Core.Masks;
using BenchRunner.Core.Quantities;
using BenchRunner.Execution.LimitRecords;
using BenchRunner.Reports.Formatting;
using BenchRunner.Reports.Svg;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;
using static BenchRunner.Reports.Html.Html;
using BenchRunner.Core.Runs;

namespace BenchRunner.Reports.Html;

/// <summary>
/// The report of one run: what was run, when, by whom and on which instruments; every check;
/// each trace against its mask with the failing spans shaded; the figures; and, where a trace was
/// swept more than once (a tuning session), each figure over time.
/// </summary>
public static class RunReport
{
    /// <summary>Builds the report of run <paramref name="runId"/>.</summary>
    /// <exception cref="ArgumentException">The store has no such run.</exception>
    /// <exception cref="ResultStoreException">The file cannot be read.</exception>
    public static XDocument Create(SqliteResultStore store, long runId, DateTimeOffset generatedUtc, string softwareVersion)
    {
        ArgumentNullException.ThrowIfNull(store);
        var run = store.GetRun(runId) ?? throw new ArgumentException($"{store.Path} has no run {runId}.", nameof(runId));
        var title = $"Run {run.Id}: {run.Record.PlanName}{(run.Record.DutSerial is { } s ? $" on {s}" : "")}";
        var body = new List<object?>
        {
            E("h1", title, " ", StatusVerdict(run.Status)),
            E("p", Class("lead"), run.Record.Mode == RunMode.Tuning ? "Tuning session: the board was swept again and again while it was adjusted." : "One pass through the plan."),
        };
        body.AddRange(Sections(store, run, $"run{run.Id}"));
        return ReportDocument.Create(title, body, generatedUtc, softwareVersion);
    }

    /// <summary>The sections of one run's report (also used per board in a lot report); element ids start with <paramref name="idPrefix"/>.</summary>
    internal static IEnumerable<XElement> Sections(SqliteResultStore store, StoredRun run, string idPrefix, bool brief = false)
    {
        var limits = PlanLimits.FromRunJson(run.Record.ExtraJson);
        var sweeps = store.GetSweeps(run.Id);
        var checks = store.GetChecks(run.Id);
        if (!brief)
        {
            yield return E("h2", "Record");
            yield return Facts(RunFacts(run));
            yield return E("h2", "Instruments");
            yield return InstrumentTable(store.GetInstruments(run.Id));
        }

        yield return E(brief ? "h3" : "h2", "Checks");
        yield return checks.Count == 0 ? E("p", "The run made no checks.") : Table("checks", ["check", "verdict", "detail", "margin"],
            checks.Select(c => new object?[]
            {
                c.Record.Name, Verdict(c.Record.Passed ? "pass" : "FAIL", c.Record.Passed), c.Record.Message,
                c.Record.Margin is { } m ? E("td", Class("num"), QuantityFormat.Signed(m, c.Record.MarginUnit)) : null,
            }));

        int plot = 0;
        foreach (var group in sweeps.GroupBy(s => s.Record.TraceName ?? $"{s.Record.Trace.Quantity}"))
        {
            var last = group.Last();
            var masks = limits?.Masks.Where(m => m.Trace == group.Key).ToList() ?? [];
            if (!brief)
            {
                yield return E("h2", $"Trace {group.Key}");
                yield return E("p", Class("lead"),
                    $"{last.Record.Trace.Quantity} from {last.Record.InstrumentRole ?? "the instrument"}, {last.Record.Trace.Count} points, step \"{last.Record.StepName}\", acquired {ReportFormat.Time(last.Record.AcquiredUtc!.Value)}"
                    + (group.Count() > 1 ? $"; the last of {group.Count()} sweeps is drawn." : "."));
            }

            if (masks.Count == 0 && !brief)
            {
                yield return TracePlot.Create($"{idPrefix}-plot{++plot}", $"{group.Key} ({last.Record.Trace.Quantity})", last.Record.Trace, null);
                if (limits is null)
                {
                    yield return E("p", "No mask was recorded with this run, so the trace is drawn alone.");
                }
            }

            foreach (var recorded in masks)
            {
                var mask = MaskFile.Parse(recorded.MaskText, $"mask recorded with run {run.Id}");
                var evaluation = mask.Evaluate(last.Record.Trace);
                var verdict = evaluation.Passed ? "passes" : $"fails in {evaluation.FailingSpans.Count} span{(evaluation.FailingSpans.Count == 1 ? "" : "s")}";
                yield return TracePlot.Create($"{idPrefix}-plot{++plot}",
                    $"{(brief ? run.Record.DutSerial + ": " : "")}{group.Key} against mask {mask.Name}: {verdict}", last.Record.Trace, evaluation);
            }

            if (!brief)
            {
                yield return FigureTable(last.Record.Figures);
                foreach (var element in FiguresOverTime(group.ToList(), limits, group.Key, $"{idPrefix}-time{plot}"))
                {
                    yield return element;
                }
            }
        }
    }

    /// <summary>A run's record as name and value pairs.</summary>
    internal static IEnumerable<(string, object?)> RunFacts(StoredRun run)
    {
        var r = run.Record;
        yield return ("run", run.Id.ToString(System.Globalization.CultureInfo.InvariantCulture));
        yield return ("kind", r.Mode.ToString().ToLowerInvariant());
        yield return ("status", StatusVerdict(run.Status));
        if (run.ErrorMessage is not null) yield return ("why", run.ErrorMessage);
        yield return ("board", r.DutSerial);
        yield return ("lot", r.Lot);
        yield return ("retest", r.IsRetest ? "yes: the board had a verdict before" : "no");
        yield return ("plan", r.PlanName);
        yield return ("plan SHA-256", E("code", run.PlanSha256));
        yield return ("bench", r.BenchName);
        yield return ("started", ReportFormat.Time(run.StartedUtc));
        yield return ("ended", run.EndedUtc is { } end ? $"{ReportFormat.Time(end)} (after {ReportFormat.Duration(end - run.StartedUtc)})" : "still running, or the program stopped");
        yield return ("operator", r.Operator);
        yield return ("computer", r.Host);
        yield return ("software", $"BenchRunner {r.SoftwareVersion}");
    }

    /// <summary>A table of instrument identities.</summary>
    internal static XElement InstrumentTable(IEnumerable<InstrumentRecord> instruments)
    {
        var rows = instruments.Select(i => new object?[] { i.Role, i.Kind, i.Maker, i.Model, i.Serial, i.Firmware, i.Connection }).ToList();
        return rows.Count == 0 ? E("p", "No instrument was recorded.")
            : Table("instruments", ["role", "kind", "maker", "model", "serial", "firmware", "connection"], rows);
    }

    /// <summary>A status as a coloured word.</summary>
    internal static XElement StatusVerdict(RunStatus status) => status switch
    {
        RunStatus.Passed => Verdict("PASS", true),
        RunStatus.Failed => Verdict("FAIL", false),
        _ => Verdict(status.ToString().ToUpperInvariant(), null),
    };

    private static XElement FigureTable(IReadOnlyList<NamedFigure> figures) =>
        figures.Count == 0 ? E("p", "No figures.") : Table("figures", ["figure", "key", "value"],
            figures.Select(f => new object?[]
            {
                f.Label, E("code", f.Key.Word),
                f.Value is { } v ? E("td", Class("num"), QuantityFormat.Format(v)) : $"not available: {f.Reason}",
            }));

    private static IEnumerable<XElement> FiguresOverTime(IReadOnlyList<StoredSweep> sweeps, PlanLimits? limits, string trace, string idPrefix)
    {
        if (sweeps.Count < 2)
        {
            yield break;
        }

        var start = sweeps[0].Record.AcquiredUtc!.Value;
        yield return E("h3", $"Figures of {trace} over {sweeps.Count} sweeps");
        int n = 0;
        foreach (var key in sweeps.SelectMany(s => s.Record.Figures).Select(f => f.Key).Distinct())
        {
            var points = sweeps
                .Select(s => (Seconds: (s.Record.AcquiredUtc!.Value - start).TotalSeconds, Figure: s.Record.Figures.FirstOrDefault(f => f.Key == key)))
                .Where(p => p.Figure?.Value is not null)
                .Select(p => (p.Seconds, p.Figure!.Value!.Value.Value))
                .ToList();
            var figure = sweeps.SelectMany(s => s.Record.Figures).First(f => f.Key == key);
            var limit = limits?.Figures.FirstOrDefault(l => l.Trace == trace && l.Key == key.Word);
            if (FigureTimePlot.Create($"{idPrefix}-{++n}", $"{figure.Label} ({key.Word})", figure.Unit.Symbol, points, limit?.Min, limit?.Max) is { } svg)
            {
                yield return svg;
            }
        }
    }
}
