using System.CommandLine;
using System.Text.Json;
using System.Text.Json.Nodes;
using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Text;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Preparation;
using BenchRunner.Execution.Validation;

namespace BenchRunner.Cli.Commands;

/// <summary>
/// <c>benchrunner validate PLAN [--bench BENCH] [--json]</c>: every problem of a plan (and of the
/// bench it is to run on) before any instrument is touched. Exit code 0 valid, 2 invalid.
/// </summary>
public static class ValidateCommand
{
    /// <summary>Creates the verb.</summary>
    public static Command Create(CliConsole console)
    {
        var plan = new Argument<string>("PLAN") { Description = "The plan file (YAML; see docs/plan-format.md)." };
        var bench = new Option<string?>("--bench", "-b")
        {
            Description = "The bench file (YAML; see docs/bench-format.md): also check the plan's roles and the safety limits against it.",
            HelpName = "BENCH",
        };
        var json = CommonOptions.Json();
        var command = new Command("validate", "Check a plan (and the bench it is to run on) without touching any instrument; every problem is reported with file:line:column. Exit code 0 valid, 2 invalid.")
        {
            plan, bench, json,
        };
        command.SetAction(parsed =>
        {
            bool asJson = parsed.GetValue(json);
            try
            {
                var validated = RunPreparation.Load(parsed.GetRequiredValue(plan), parsed.GetValue(bench));
                Report(validated, console, asJson);
                return ExitCodes.Success;
            }
            catch (InputFormatException ex)
            {
                foreach (var problem in ex.Problems)
                {
                    console.Error.WriteLine(problem.ToString());
                }

                if (asJson)
                {
                    var problems = new JsonArray();
                    foreach (var p in ex.Problems)
                    {
                        problems.Add(new JsonObject
                        {
                            ["file"] = p.Location.File, ["line"] = p.Location.Line, ["column"] = p.Location.Column, ["message"] = p.Detail,
                        });
                    }

                    console.Out.WriteLine(new JsonObject { ["valid"] = false, ["problems"] = problems }.ToJsonString(Indented));
                }

                return ExitCodes.BadInput;
            }
        });
        return command;
    }

    private static readonly JsonSerializerOptions Indented = new() { WriteIndented = true };

    private static void Report(PreparedRun validated, CliConsole console, bool asJson)
    {
        var p = validated.Plan;
        var steps = p.AllSteps().ToList();
        int overload = steps.Count(s => s is OverloadCheckStep);
        int checks = steps.Count(s => s is MaskCheck) + steps.OfType<FigureCheck>().Sum(f => f.Limits.Count) + overload;
        var roles = string.Join(", ", p.Roles.Select(r => $"{r.Role} ({r.Kind.Word})"));
        if (asJson)
        {
            var roleArray = new JsonArray();
            foreach (var r in p.Roles)
            {
                roleArray.Add(new JsonObject { ["role"] = r.Role, ["kind"] = r.Kind.Word });
            }

            console.Out.WriteLine(new JsonObject
            {
                ["valid"] = true, ["plan"] = p.Name, ["bench"] = validated.Bench?.Definition.Name, ["roles"] = roleArray,
                ["steps"] = steps.Count, ["checks"] = checks,
            }.ToJsonString(Indented));
            return;
        }

        console.Out.WriteLine($"Plan \"{p.Name}\" is valid{(validated.Bench is { } b ? $" on bench \"{b.Definition.Name}\"" : "")}.");
        console.Out.WriteLine($"  roles   {roles}");
        console.Out.WriteLine($"  steps   {steps.Count}");
        console.Out.WriteLine($"  checks  {checks} ({steps.Count(s => s is MaskCheck)} mask, {Counted.Of(checks - overload - steps.Count(s => s is MaskCheck), "figure limit")}{(overload > 0 ? $", {overload} overload" : "")})");
    }
}
