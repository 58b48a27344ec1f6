using System.CommandLine;
using System.Text.Json.Nodes;
using System.Text.Json;
using BenchRunner.Cli.Output;
using BenchRunner.Cli.Results;
using BenchRunner.Cli.Run;
using BenchRunner.Core.Text;
using BenchRunner.Execution.Running;
using BenchRunner.Execution.Validation;
using BenchRunner.Instruments.Connections;
using BenchRunner.Storage;
using BenchRunner.Core.Runs;
using BenchRunner.Execution.Preparation;

namespace BenchRunner.Cli.Commands;

/// <summary>
/// <c>benchrunner run PLAN --bench BENCH [--db FILE] [--dut SERIAL] [--lot LOT] [--operator NAME] [--json]</c>:
/// validates the plan against the bench, runs it, records it, and gives the verdict.
/// Exit 0 pass, 1 a check failed, 2 bad input, 3 instrument failure or refused setting, 130 stopped.
/// </summary>
public static class RunCommand
{
    /// <summary>Creates the verb.</summary>
    public static Command Create(CliConsole console, Func<TransportFactory> transports)
    {
        var plan = new Argument<string>("PLAN") { Description = "The test plan (docs/plan-format.md)." };
        var bench = CommonOptions.RequiredBench("The bench file naming the instruments (docs/bench-format.md); docs/examples/bench-virtual.yaml is the built-in virtual bench.");
        var db = CommonOptions.Database(CommonOptions.WrittenDatabase);
        var dut = CommonOptions.Dut("The board's serial number, stored with the run.");
        var lot = new Option<string?>("--lot") { Description = "The lot the board belongs to.", HelpName = "LOT" };
        var op = CommonOptions.Operator("Who runs the test.");
        var json = CommonOptions.Json();
        var command = new Command("run", "Run a test plan on a bench, record every sweep and give the verdict. Exit 0 pass, 1 fail, 2 bad input, 3 instrument failure, 130 stopped.")
        {
            plan, bench, db, dut, lot, op, json,
        };
        command.SetAction(async (parsed, cancellationToken) =>
        {
            var planPath = parsed.GetRequiredValue(plan);
            var benchPath = parsed.GetRequiredValue(bench);
            var prepared = RunPreparation.Load(planPath, benchPath);
            var benchDefinition = prepared.RequiredBench.Definition;
            var dbPath = parsed.GetRequiredValue(db);
            using var store = ResultStoreOpener.Open(dbPath);
            var runner = prepared.Launcher(transports(), store);
            var context = prepared.Context(ThisVersion(), Environment.MachineName) with
            {
                DutSerial = parsed.GetValue(dut),
                Lot = parsed.GetValue(lot),
                Operator = parsed.GetValue(op),
            };
            console.Error.WriteLine($"Running {prepared.Plan.Name} on {benchDefinition.Name}{(context.DutSerial is null ? "" : $" for {context.DutSerial}")}");
            foreach (var caution in prepared.Cautions)
            {
                console.Error.WriteLine(caution);
            }

            var outcome = await runner.RunAsync(prepared.Plan, context, [RunSubscription.View(new RunProgressView(console.Error, console.UseColour), "progress")], cancellationToken).ConfigureAwait(false);
            if (parsed.GetValue(json))
            {
                WriteJson(outcome, dbPath, console.Out);
            }
            else
            {
                WriteText(outcome, dbPath, console.Out, console.UseColour);
            }

            return RunOutcomeView.ExitCode(outcome.Status);
        });
        return command;
    }

    /// <summary>The software version recorded with every run.</summary>
    public static string ThisVersion() => typeof(RunCommand).Assembly.GetName().Version?.ToString(3) ?? "0";


    private static void WriteText(RunOutcome outcome, string db, TextWriter writer, bool colour)
    {
        var verdict = outcome.Status switch
        {
            RunStatus.Passed => Display.Colour("PASS", ConsoleColour.Green, colour),
            RunStatus.Failed => Display.Colour("FAIL", ConsoleColour.Red, colour),
            _ => Display.Colour(outcome.Status.ToString().ToUpperInvariant(), ConsoleColour.Yellow, colour),
        };
        writer.WriteLine($"Verdict  {verdict}{(outcome.Error is null ? "" : $": {outcome.Error}")}");
        foreach (var check in outcome.Checks.Where(c => !c.Passed))
        {
            writer.WriteLine($"  failed: {check.Name}: {check.Detail}");
        }

        foreach (var check in outcome.Checks.Where(c => c.Lines.Count > 0))
        {
            writer.WriteLine($"  {check.Name}:");
            OverloadLinesView.Write(check.Lines, writer, "    ", colour);
        }

        var flagged = outcome.Checks.Count(c => c.TraceOverloaded);
        if (flagged > 0)
        {
            writer.WriteLine(Display.Colour($"  {flagged} check(s) judged a trace measured while the analyser was overloaded; do not trust their verdicts until it is measured again with more attenuation.", ConsoleColour.Yellow, colour));
        }

        writer.WriteLine($"{outcome.Checks.Count(c => c.Passed)} of {Counted.Of(outcome.Checks.Count, "check")} passed; run {outcome.RunId} stored in {db} {RunOutcomeView.ResultsHint(db, outcome.RunId)}.");
    }

    private static void WriteJson(RunOutcome outcome, string db, TextWriter writer)
    {
        var document = RunOutcomeView.JsonHead(outcome, db);
        document["checks"] = new JsonArray(outcome.Checks.Select(c => (JsonNode?)new JsonObject
        {
            ["step"] = c.Step, ["name"] = c.Name, ["passed"] = c.Passed, ["detail"] = c.Detail,
            ["margin"] = c.Margin, ["margin_unit"] = c.MarginUnit, ["trace_overloaded"] = c.TraceOverloaded,
            ["lines"] = c.Lines.Count == 0 ? null : OverloadLinesView.Json(c.Lines),
        }).ToArray());
        writer.WriteLine(document.ToJsonString(new JsonSerializerOptions { WriteIndented = true }));
    }
}
