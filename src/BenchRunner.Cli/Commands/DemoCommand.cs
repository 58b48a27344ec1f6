using System.CommandLine;
using System.Text.Json.Nodes;
using System.Text.Json;
using BenchRunner.Cli.Demo;
using BenchRunner.Cli.Output;
using BenchRunner.Cli.Results;
using BenchRunner.Cli.Run;
using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Execution.Running;
using BenchRunner.Execution.Validation;
using BenchRunner.Instruments.Connections;
using BenchRunner.Simulator.Bench;
using BenchRunner.Simulator.Devices;
using BenchRunner.Simulator.Endpoints;
using BenchRunner.Storage;
using BenchRunner.Core.Runs;
using BenchRunner.Execution.Preparation;

namespace BenchRunner.Cli.Commands;

/// <summary>
/// <c>benchrunner demo [--db FILE] [--seed N] [--json]</c>: with no hardware and no questions,
/// tests two demo preselector boards on the virtual bench (one tuned, one detuned), shows the
/// progress, a summary and where the results are. Exit 0 when the demo ran (one board is meant to fail).
/// </summary>
public static class DemoCommand
{
    /// <summary>The demo's result database when <c>--db</c> is not given.</summary>
    public const string DefaultDatabase = "benchrunner-demo.db";

    /// <summary>The usual cautions, shown once.</summary>
    public const string SafetyNote =
        "Safety: on a real bench, never connect an analyser input to mains-powered or high-voltage circuits; " +
        "use a DC block wherever DC may be present; respect every input's maximum level (an attenuator costs less than a mixer); " +
        "mind RF exposure and ESD. Follow local codes and licensed practice.";

    /// <summary>Creates the verb.</summary>
    public static Command Create(CliConsole console)
    {
        var db = new Option<string>("--db") { Description = $"Where to store the runs (created if missing). Default {DefaultDatabase}.", HelpName = "FILE", DefaultValueFactory = _ => DefaultDatabase };
        var seed = new Option<int>("--seed") { Description = "Seeds the virtual bench's noise. Default 1.", DefaultValueFactory = _ => 1 };
        var json = CommonOptions.Json();
        var command = new Command("demo", "Test two demo preselector boards on the virtual bench, one that passes and one that fails; no hardware needed.")
        {
            db, seed, json,
        };
        command.SetAction(async (parsed, cancellationToken) =>
        {
            bool asJson = parsed.GetValue(json);
            var report = asJson ? console.Error : console.Out;
            var dbPath = parsed.GetRequiredValue(db);
            using var files = DemoFiles.Extract();
            var prepared = RunPreparation.Load(files.Plan, files.Bench);
            var bench = VirtualBench.CreateDemo(parsed.GetValue(seed));
            var transports = SimulatorConnections.Register(new TransportFactory(), new VirtualBenchServers(bench), cancellationToken);
            using var store = ResultStoreOpener.Open(dbPath);
            var runner = prepared.Launcher(transports, store);

            report.WriteLine($"BenchRunner demo: the virtual bench tests two 137 MHz preselector boards against the plan \"{prepared.Plan.Name}\".");
            report.WriteLine(SafetyNote);
            var boards = new List<DemoBoardResult>();
            foreach (var (serial, board) in new[] { ("PSF-24-0001", Preselector137.TunedBoard()), ("PSF-24-0002", Preselector137.DetunedBoard()) })
            {
                report.WriteLine();
                report.WriteLine($"Board {serial}");
                bench.NetworkAnalyser.DeviceUnderTest = board;
                var capture = new FigureCapture();
                var view = new RunProgressView(report, console.UseColour && !asJson);
                var context = prepared.Context(RunCommand.ThisVersion(), Environment.MachineName) with
                {
                    DutSerial = serial,
                    Lot = "PSF-24-L07",
                    Operator = "demo",
                };
                var outcome = await runner.RunAsync(prepared.Plan, context,
                    [RunSubscription.Lossless(capture, "figure capture"), RunSubscription.View(view, "progress")], cancellationToken).ConfigureAwait(false);
                boards.Add(new DemoBoardResult(serial, outcome, capture.Figures));
                if (outcome.Status == RunStatus.Stopped)
                {
                    break;
                }
            }

            if (asJson)
            {
                WriteJson(boards, dbPath, console.Out);
            }
            else
            {
                WriteSummary(boards, dbPath, console.Out, console.UseColour);
            }

            return boards.Any(b => b.Outcome.Status == RunStatus.Stopped) ? ExitCodes.Stopped
                : boards.Any(b => b.Outcome.Status == RunStatus.Error) ? ExitCodes.InstrumentFailure
                : ExitCodes.Success;
        });
        return command;
    }

    private static void WriteSummary(IReadOnlyList<DemoBoardResult> boards, string db, TextWriter writer, bool colour)
    {
        writer.WriteLine();
        writer.WriteLine("Summary");
        writer.WriteLine($"  {"board",-12}  {"verdict",-7}  {"centre",-13}  {"-3 dB width",-13}  {"loss",-8}  worst mask margin");
        foreach (var b in boards)
        {
            var verdict = b.Outcome.Status switch
            {
                RunStatus.Passed => Display.Colour("PASS   ", ConsoleColour.Green, colour),
                RunStatus.Failed => Display.Colour("FAIL   ", ConsoleColour.Red, colour),
                var s => s.ToString().ToUpperInvariant().PadRight(7),
            };
            writer.WriteLine($"  {b.Serial,-12}  {verdict}  {Cell(b.Figure(FigureKeys.CentreFrequency)),-13}  {Cell(b.Figure(FigureKeys.Bandwidth3Db)),-13}  {Cell(b.Figure(FigureKeys.InsertionLoss)),-8}  {(b.MaskMargin is { } m ? QuantityFormat.Signed(m, QuantityUnit.Decibel) : "-")}");
            foreach (var failed in b.Outcome.Checks.Where(c => !c.Passed))
            {
                writer.WriteLine($"      failed: {failed.Name}: {failed.Detail}");
            }

            if (b.Outcome.Error is not null)
            {
                writer.WriteLine($"      {b.Outcome.Error}");
            }
        }

        writer.WriteLine();
        var ids = string.Join(" and ", boards.Select(b => b.Outcome.RunId));
        writer.WriteLine($"Every sweep and check is stored in {db} (runs {ids}); it opens in any SQLite browser (docs/storage.md).");
        var list = $"benchrunner results --db {db}";
        var detail = $"{list} --run {boards[^1].Outcome.RunId}";
        writer.WriteLine($"  {list.PadRight(detail.Length)}   lists the runs");
        writer.WriteLine($"  {detail}   shows the last board in detail");
    }

    private static string Cell(Quantity? value) => value is { } v ? QuantityFormat.Format(v) : "-";

    private static void WriteJson(IReadOnlyList<DemoBoardResult> boards, string db, TextWriter writer)
    {
        var array = new JsonArray();
        foreach (var b in boards)
        {
            var figures = new JsonObject();
            foreach (var f in b.Figures)
            {
                figures[f.Key.Word] = f.Value?.Value;
            }

            array.Add(new JsonObject
            {
                ["serial"] = b.Serial,
                ["run_id"] = b.Outcome.RunId,
                ["status"] = b.Outcome.Status.ToString().ToLowerInvariant(),
                ["worst_mask_margin_db"] = b.MaskMargin,
                ["failed_checks"] = new JsonArray(b.Outcome.Checks.Where(c => !c.Passed).Select(c => (JsonNode?)JsonValue.Create(c.Name)).ToArray()),
                ["figures"] = figures,
            });
        }

        writer.WriteLine(new JsonObject { ["database"] = db, ["boards"] = array }.ToJsonString(new JsonSerializerOptions { WriteIndented = true }));
    }
}
