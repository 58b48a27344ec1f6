using System.CommandLine;
using BenchRunner.Cli.Results;
using BenchRunner.Storage;

namespace BenchRunner.Cli.Commands;

/// <summary>
/// <c>benchrunner results [--db FILE] [--run ID | --last] [--dut SERIAL] [--lot LOT] [--limit N] [--json]</c>:
/// lists stored runs, newest first, or shows one run (or the newest that matches) with its checks
/// and its figures sweep by sweep.
/// Reads only; never creates a database.
/// </summary>
public static class ResultsCommand
{
    /// <summary>The result database used when <c>--db</c> is not given.</summary>
    public const string DefaultDatabase = "benchrunner.db";

    /// <summary>Creates the verb.</summary>
    public static Command Create(CliConsole console)
    {
        var db = CommonOptions.Database(CommonOptions.ReadDatabase);
        var run = new Option<long?>("--run") { Description = "Show this run in detail: instruments, checks, and the figures of every sweep.", HelpName = "ID" };
        var last = new Option<bool>("--last") { Description = "Show the newest run in detail (of the board or lot given, if any), e.g. the tuning session just ended." };
        var dut = new Option<string?>("--dut") { Description = "Only runs of this board serial.", HelpName = "SERIAL" };
        var lot = new Option<string?>("--lot") { Description = "Only runs of this lot.", HelpName = "LOT" };
        var limit = new Option<int>("--limit") { Description = "At most this many runs in the list. Default 50.", HelpName = "N", DefaultValueFactory = _ => 50 };
        var json = CommonOptions.Json();
        var command = new Command("results", "List stored runs, or show one with its checks and figures sweep by sweep.")
        {
            db, run, last, dut, lot, limit, json,
        };
        command.SetAction(parsed =>
        {
            var path = parsed.GetRequiredValue(db);
            if (!File.Exists(path))
            {
                throw new UsageException($"{path}: no result database there (runs write one with --db; the default is {DefaultDatabase}).");
            }

            using var store = ResultStoreOpener.Open(path);
            var filter = new RunFilter { DutSerial = parsed.GetValue(dut), Lot = parsed.GetValue(lot) };
            var chosen = parsed.GetValue(run);
            if (parsed.GetValue(last))
            {
                if (chosen is not null)
                {
                    throw new UsageException("give either --run ID or --last, not both.");
                }

                chosen = store.ListRuns(filter with { Limit = 1 }).FirstOrDefault()?.Id
                    ?? throw new UsageException($"{path} holds no run{(filter.DutSerial is null && filter.Lot is null ? "" : " of that board or lot")} yet.");
            }

            if (chosen is { } id)
            {
                var stored = store.GetRun(id) ?? throw new UsageException($"{path} has no run {id}; 'benchrunner results --db {path}' lists them.");
                var (instruments, sweeps, figures, checks) = (store.GetInstruments(id), store.GetSweeps(id), store.GetFigures(id), store.GetChecks(id));
                if (parsed.GetValue(json))
                {
                    ResultsJsonView.WriteRun(stored, instruments, sweeps, figures, checks, console.Out);
                }
                else
                {
                    ResultsTextView.WriteRun(stored, instruments, sweeps, figures, checks, console.Out);
                }

                return ExitCodes.Success;
            }

            var count = parsed.GetValue(limit);
            if (count < 1)
            {
                throw new UsageException("--limit must be at least 1.");
            }

            var runs = store.ListRuns(filter with { Limit = count });
            if (parsed.GetValue(json))
            {
                ResultsJsonView.WriteList(runs, console.Out);
            }
            else
            {
                ResultsTextView.WriteList(runs, path, console.Out);
            }

            return ExitCodes.Success;
        });
        return command;
    }

}
