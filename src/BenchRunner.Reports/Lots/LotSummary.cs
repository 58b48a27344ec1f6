using BenchRunner.Core.Statistics;
using BenchRunner.Execution.LimitRecords;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;
using BenchRunner.Core.Runs;

namespace BenchRunner.Reports.Lots;

/// <summary>
/// What a lot's record says: each board's history (the latest verdict counts), the yield and
/// first-pass yield, the checks that failed most, and the spread and Cpk of each limited figure.
/// Only single and batch runs that ended with a verdict count; a stopped run, or one that could
/// not finish, leaves the board as it was (untested, if it has no verdict).
/// </summary>
public sealed class LotSummary
{
    private LotSummary(string lot, IReadOnlyList<LotBoard> boards, IReadOnlyList<string> untested, LotYield? yield,
        IReadOnlyList<FigureSpread> figures, IReadOnlyList<StoredRun> runs)
    {
        Lot = lot;
        Boards = boards;
        Untested = untested;
        Yield = yield;
        Figures = figures;
        Runs = runs;
    }

    /// <summary>The lot's name.</summary>
    public string Lot { get; }

    /// <summary>The boards with a verdict, in serial order.</summary>
    public IReadOnlyList<LotBoard> Boards { get; }

    /// <summary>Serials of the lot whose runs all ended without a verdict, in serial order.</summary>
    public IReadOnlyList<string> Untested { get; }

    /// <summary>Yield, first-pass yield and failures by check; null when no board has a verdict.</summary>
    public LotYield? Yield { get; }

    /// <summary>The spread of each limited figure, in the order of the latest run's plan.</summary>
    public IReadOnlyList<FigureSpread> Figures { get; }

    /// <summary>Every single and batch run of the lot, with or without verdict, oldest first.</summary>
    public IReadOnlyList<StoredRun> Runs { get; }

    /// <summary>Reads lot <paramref name="lot"/> from <paramref name="store"/>.</summary>
    /// <param name="store">The result file.</param>
    /// <param name="lot">The lot's name.</param>
    /// <param name="withFigures">False to skip the figure spreads (which read every board's sweeps), e.g. for a progress line.</param>
    /// <exception cref="ResultStoreException">The file cannot be read.</exception>
    public static LotSummary Read(SqliteResultStore store, string lot, bool withFigures = true)
    {
        ArgumentNullException.ThrowIfNull(store);
        ArgumentException.ThrowIfNullOrWhiteSpace(lot);
        var runs = store.ListRuns(new RunFilter { Lot = lot })
            .Where(r => r.Record.Mode != RunMode.Tuning && r.Record.DutSerial is not null)
            .OrderBy(r => r.StartedUtc).ThenBy(r => r.Id)
            .ToList();

        var boards = new List<LotBoard>();
        var untested = new List<string>();
        foreach (var group in runs.GroupBy(r => r.Record.DutSerial!).OrderBy(g => g.Key, StringComparer.Ordinal))
        {
            var verdicts = group.Where(r => r.Status is RunStatus.Passed or RunStatus.Failed).ToList();
            if (verdicts.Count == 0)
            {
                untested.Add(group.Key);
                continue;
            }

            var failed = verdicts.Select(r => (IReadOnlyList<string>)store.GetChecks(r.Id)
                .Where(c => !c.Record.Passed).Select(c => c.Record.Name).Distinct().ToList()).ToList();
            boards.Add(new LotBoard(group.Key, verdicts, failed, group.Count() - verdicts.Count));
        }

        var yield = boards.Count == 0 ? null
            : LotYield.From(boards.Select(b => new BoardHistory(b.Serial,
                b.Runs.Select((r, i) => new BoardTest(r.Status == RunStatus.Passed, b.FailedChecks[i])).ToList())));
        return new LotSummary(lot, boards, untested, yield, withFigures ? Spreads(store, boards) : [], runs);
    }

    private static List<FigureSpread> Spreads(SqliteResultStore store, IReadOnlyList<LotBoard> boards)
    {
        // The limits of the newest counting run decide which figures are summarised.
        var newest = boards.Select(b => b.Latest).OrderBy(r => r.StartedUtc).ThenBy(r => r.Id).LastOrDefault();
        var limits = PlanLimits.FromRunJson(newest?.Record.ExtraJson)?.Figures
            .DistinctBy(l => (l.Trace, l.Key)).ToList() ?? [];
        if (limits.Count == 0)
        {
            return [];
        }

        var values = limits.ToDictionary(l => (l.Trace, l.Key), _ => new List<(string, double)>());
        foreach (var board in boards)
        {
            // The last sweep of each trace is the one the checks judged.
            var latestByTrace = store.GetSweeps(board.Latest.Id)
                .Where(s => s.Record.TraceName is not null)
                .GroupBy(s => s.Record.TraceName!)
                .Select(g => g.Last());
            foreach (var sweep in latestByTrace)
            {
                foreach (var figure in sweep.Record.Figures)
                {
                    if (figure.Value is { } v && values.TryGetValue((sweep.Record.TraceName!, figure.Key.Word), out var list))
                    {
                        list.Add((board.Serial, v.Value));
                    }
                }
            }
        }

        return limits.Select(l => FigureSpread.Of(l, values[(l.Trace, l.Key)])).ToList();
    }
}
