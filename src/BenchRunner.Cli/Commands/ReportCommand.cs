using System.CommandLine;
using System.Text.Json;
using System.Text.Json.Nodes;
using BenchRunner.Cli.Results;
using BenchRunner.Reports.Html;

namespace BenchRunner.Cli.Commands;

/// <summary>
/// <c>benchrunner report (--run ID | --lot LOT) -o FILE.html [--db FILE] [--replace] [--json]</c>:
/// writes one self-contained HTML file (inline SVG plots, no network needed) for a run or a lot.
/// </summary>
public static class ReportCommand
{
    /// <summary>Creates the verb.</summary>
    public static Command Create(CliConsole console, TimeProvider? time = null)
    {
        var clock = time ?? TimeProvider.System;
        var db = CommonOptions.Database(CommonOptions.ReadDatabase);
        var run = new Option<long?>("--run") { Description = "Report on this run: its record, instruments, checks, each trace against its mask, its figures (and, for a tuning session, the figures over time).", HelpName = "ID" };
        var lot = new Option<string?>("--lot") { Description = "Report on this lot: yield, failures by check, each figure's histogram and Cpk against its limits, every board.", HelpName = "LOT" };
        var output = new Option<string>("--output", "-o") { Description = "The HTML file to write.", HelpName = "FILE.html", Required = true };
        var replace = new Option<bool>("--replace") { Description = "Replace the file if it exists (by default an existing file is left alone and nothing is written)." };
        var json = CommonOptions.Json();
        var command = new Command("report", "Write a self-contained HTML report of a run or a lot that opens in any browser, offline.")
        {
            run, lot, output, db, replace, json,
        };
        command.Validators.Add(result =>
        {
            if ((result.GetValue(run) is null) == (result.GetValue(lot) is null))
            {
                result.AddError("Give either --run ID or --lot LOT (one of them).");
            }
        });
        command.SetAction(parsed =>
        {
            var path = parsed.GetRequiredValue(db);
            if (!File.Exists(path))
            {
                throw new UsageException($"{path}: no result database there (runs write one with --db; the default is {ResultsCommand.DefaultDatabase}).");
            }

            var target = parsed.GetRequiredValue(output);
            if (File.Exists(target) && !parsed.GetValue(replace))
            {
                throw new UsageException($"{target} already exists; nothing was written (add --replace to replace it).");
            }

            string text;
            string subject;
            using (var store = ResultStoreOpener.Open(path))
            {
                try
                {
                    if (parsed.GetValue(run) is { } id)
                    {
                        subject = $"run {id}";
                        text = ReportDocument.ToText(RunReport.Create(store, id, clock.GetUtcNow(), RunCommand.ThisVersion()));
                    }
                    else
                    {
                        var name = parsed.GetValue(lot)!;
                        subject = $"lot {name}";
                        text = ReportDocument.ToText(LotReport.Create(store, name, clock.GetUtcNow(), RunCommand.ThisVersion()));
                    }
                }
                catch (ArgumentException ex)
                {
                    throw new UsageException($"{ex.Message.Split(" (Parameter", StringSplitOptions.None)[0]} 'benchrunner results --db {path}' lists what it holds.");
                }
            }

            var folder = Path.GetDirectoryName(Path.GetFullPath(target));
            if (folder is not null)
            {
                Directory.CreateDirectory(folder);
            }

            File.WriteAllText(target, text);
            if (parsed.GetValue(json))
            {
                console.Out.WriteLine(new JsonObject { ["file"] = target, ["report"] = subject, ["bytes"] = new FileInfo(target).Length }
                    .ToJsonString(new JsonSerializerOptions { WriteIndented = true }));
            }
            else
            {
                console.Out.WriteLine($"wrote {target}  (report of {subject}; one file, opens in any browser without a network)");
            }

            return ExitCodes.Success;
        });
        return command;
    }
}
