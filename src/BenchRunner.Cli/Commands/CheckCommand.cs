using System.CommandLine;
using BenchRunner.Cli.Check;
using BenchRunner.Core.Traces;

namespace BenchRunner.Cli.Commands;

/// <summary>
/// <c>benchrunner check TRACE --mask MASK [--param S21] [--json]</c>: the offline verdict of a
/// saved trace against a limit mask, with the worst margin, the failing spans and the figures.
/// </summary>
public static class CheckCommand
{
    /// <summary>Creates the verb.</summary>
    public static Command Create(CliConsole console)
    {
        var trace = new Argument<string>("TRACE")
        {
            Description = "A saved trace: Touchstone (.s1p, .s2p, .ts) or BenchRunner CSV (.csv).",
        };
        var mask = new Option<string>("--mask", "-m")
        {
            Description = "The limit mask file (YAML; see docs/mask-format.md).",
            Required = true,
            HelpName = "MASK",
        };
        var param = new Option<TraceQuantity?>("--param", "-p")
        {
            Description = "Which trace of the file to check: S11, S21, S12, S22 or Power. Default: the mask's applies-to, else S21, else the file's only trace.",
            HelpName = "NAME",
            CustomParser = result => ParseQuantity(result.Tokens.Single().Value, result),
        };
        var json = CommonOptions.Json();

        var command = new Command("check", "Check a saved trace against a limit mask: verdict, worst margin, failing spans and filter figures. Exit code 0 pass, 1 fail, 2 bad input.")
        {
            trace, mask, param, json,
        };
        command.SetAction(parsed =>
        {
            var outcome = OfflineCheck.Run(parsed.GetRequiredValue(trace), parsed.GetRequiredValue(mask), parsed.GetValue(param));
            if (parsed.GetValue(json))
            {
                CheckJsonView.Write(outcome, console.Out);
            }
            else
            {
                CheckTextView.Write(outcome, console.Out, console.UseColour);
            }

            return outcome.Evaluation.Passed ? ExitCodes.Success : ExitCodes.CheckFailed;
        });
        return command;
    }

    private static TraceQuantity? ParseQuantity(string text, System.CommandLine.Parsing.ArgumentResult result)
    {
        if (Enum.TryParse<TraceQuantity>(text, ignoreCase: true, out var quantity) && !int.TryParse(text, out _))
        {
            return quantity;
        }

        result.AddError($"\"{text}\" is not a trace name; expected S11, S21, S12, S22 or Power.");
        return null;
    }
}
