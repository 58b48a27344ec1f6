using System.CommandLine;
using System.Globalization;
using BenchRunner.Cli.Export;
using BenchRunner.Cli.Results;
using BenchRunner.Core.Text;
using BenchRunner.Core.TraceFiles;
using BenchRunner.Storage;

namespace BenchRunner.Cli.Commands;

/// <summary>
/// <c>benchrunner export --run ID --format touchstone|csv -o DIR [--db FILE]</c>: writes a stored
/// run's sweeps as trace files. Never overwrites a file: if any of them exists, nothing is written.
/// </summary>
public static class ExportCommand
{
    /// <summary>Creates the verb.</summary>
    public static Command Create(CliConsole console)
    {
        var db = CommonOptions.Database(CommonOptions.ReadDatabase);
        var run = new Option<long>("--run") { Description = "The run whose sweeps to write.", HelpName = "ID", Required = true };
        var format = new Option<string>("--format") { Description = "touchstone: S-parameters as .s1p/.s2p where a file can hold them, the rest as CSV; csv: every sweep as CSV.", HelpName = "FORMAT", Required = true };
        format.AcceptOnlyFromAmong("touchstone", "csv");
        var output = new Option<string>("--output", "-o") { Description = "The folder to write into; made if missing.", HelpName = "DIR", Required = true };
        var command = new Command("export", "Write a stored run's sweeps as Touchstone or CSV trace files.")
        {
            run, format, output, db,
        };
        command.SetAction(parsed =>
        {
            var path = parsed.GetRequiredValue(db);
            if (!File.Exists(path))
            {
                throw new UsageException($"{path}: no result database there (runs write one with --db; the default is {ResultsCommand.DefaultDatabase}).");
            }

            var id = parsed.GetValue(run);
            var kind = parsed.GetRequiredValue(format) == "csv" ? ExportFormat.Csv : ExportFormat.Touchstone;
            IReadOnlyList<StoredSweep> sweeps;
            using (var store = ResultStoreOpener.Open(path))
            {
                _ = store.GetRun(id) ?? throw new UsageException($"{path} has no run {id}; 'benchrunner results --db {path}' lists them.");
                sweeps = store.GetSweeps(id);
            }

            if (sweeps.Count == 0)
            {
                console.Out.WriteLine($"Run {id} has no sweeps; nothing written.");
                return ExitCodes.Success;
            }

            var folder = parsed.GetRequiredValue(output);
            var files = RunExportPlanner.Plan(id, sweeps, kind);
            var existing = files.Select(f => Path.Combine(folder, f.FileName)).Where(File.Exists).ToList();
            if (existing.Count > 0)
            {
                throw new UsageException($"{string.Join(", ", existing)} already exist{(existing.Count == 1 ? "s" : "")}; export never overwrites, so nothing was written.");
            }

            Directory.CreateDirectory(folder);
            foreach (var file in files)
            {
                var target = Path.Combine(folder, file.FileName);
                Write(target, file, id);
                var sequences = string.Join(", ", file.Sequences.Select(s => s.ToString(CultureInfo.InvariantCulture)));
                var quantities = string.Join(", ", file.Set.Traces.Select(t => t.Quantity));
                console.Out.WriteLine($"wrote {target}  ({quantities}; sweep{(file.Sequences.Count == 1 ? "" : "s")} {sequences}; {Counted.Of(file.Set.Axis.Count, "point")})");
                if (file.Note is not null)
                {
                    console.Out.WriteLine($"  note: {file.Note}");
                }
            }

            return ExitCodes.Success;
        });
        return command;
    }

    private static void Write(string target, ExportFile file, long runId)
    {
        // CreateNew: a file that appeared since the check is still never overwritten.
        using var stream = new FileStream(target, FileMode.CreateNew, FileAccess.Write);
        using var writer = new StreamWriter(stream);
        if (file.IsTouchstone)
        {
            TouchstoneWriter.Write(writer, file.Set, new TouchstoneWriteOptions
            {
                FrequencyUnit = TouchstoneFrequencyUnit.Hertz,
                Comments = [string.Create(CultureInfo.InvariantCulture, $"BenchRunner run {runId}, sweeps {string.Join(", ", file.Sequences)}")],
            });
        }
        else
        {
            CsvTraceFile.Write(writer, file.Set);
        }
    }
}
