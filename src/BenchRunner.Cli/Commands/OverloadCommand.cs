using System.CommandLine;
using System.Text.Json;
using System.Text.Json.Nodes;
using BenchRunner.Cli.Output;
using BenchRunner.Cli.Overload;
using BenchRunner.Cli.Results;
using BenchRunner.Cli.Run;
using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Execution.Bench;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Running;
using BenchRunner.Execution.Validation;
using BenchRunner.Instruments.Connections;
using BenchRunner.Instruments.Kinds;
using BenchRunner.Storage;
using BenchRunner.Core.Runs;
using BenchRunner.Execution.Preparation;

namespace BenchRunner.Cli.Commands;

/// <summary>
/// <c>benchrunner overload --bench BENCH --centre F --span F [...]</c>: is the analyser making lines
/// of its own? Sweeps the span, sweeps again with more input attenuation, and labels every line
/// real or analyser-made (docs/measurement-validity.md). Exit 0 when no line relied on is
/// analyser-made, 1 when one is, 2 bad input, 3 instrument failure or refused setting, 130 stopped.
/// </summary>
public static class OverloadCommand
{
    private static readonly JsonSerializerOptions Indented = new() { WriteIndented = true };

    /// <summary>Creates the verb.</summary>
    public static Command Create(CliConsole console, Func<TransportFactory> transports)
    {
        var bench = CommonOptions.RequiredBench("The bench file (docs/bench-format.md); docs/examples/bench-virtual.yaml is the built-in virtual bench.");
        var role = new Option<string?>("--analyser") { Description = "The spectrum analyser's role; needed only when the bench has several.", HelpName = "ROLE" };
        var centre = new Option<string?>("--centre") { Description = "The span's centre, e.g. 137.5MHz (with --span).", HelpName = "FREQ" };
        var span = new Option<string?>("--span") { Description = "The span's width, e.g. 4MHz (with --centre).", HelpName = "FREQ" };
        var start = new Option<string?>("--start") { Description = "The span's lower edge (with --stop), instead of --centre and --span.", HelpName = "FREQ" };
        var stop = new Option<string?>("--stop") { Description = "The span's upper edge (with --start).", HelpName = "FREQ" };
        var rbw = new Option<string>("--rbw") { Description = "Resolution bandwidth.", HelpName = "FREQ", DefaultValueFactory = _ => "10kHz" };
        var attenuation = new Option<string>("--attenuation") { Description = "Input attenuation of the first sweep (0dB is the most sensitive, and the most easily overloaded).", HelpName = "DB", DefaultValueFactory = _ => "0dB" };
        var raiseBy = new Option<string>("--raise-by") { Description = "How much more attenuation the second sweep has.", HelpName = "DB", DefaultValueFactory = _ => "10dB" };
        var threshold = new Option<string>("--threshold") { Description = "Judge lines above this level; keep it well above the raised noise floor.", HelpName = "DBM", DefaultValueFactory = _ => "-90dBm" };
        var tolerance = new Option<string>("--tolerance") { Description = "How far a real line may move, ± dB; below half of --raise-by.", HelpName = "DB", DefaultValueFactory = _ => "1dB" };
        var carriers = new Option<string[]>("--carrier") { Description = "A carrier known to be present, for naming harmonics and two-tone products with dBc; repeat for several. Default: the test tone.", HelpName = "FREQ", AllowMultipleArgumentsPerToken = false };
        var lines = new Option<string[]>("--line") { Description = "A line you rely on; the verdict fails only when one of these is analyser-made. Repeat for several. Default: every line.", HelpName = "FREQ" };
        var tone = new Option<string?>("--tone") { Description = "Set the bench's signal generator to this frequency and switch it on for the check (off afterwards).", HelpName = "FREQ" };
        var toneLevel = new Option<string?>("--tone-level") { Description = "The test tone's level (checked against the bench's safety limits).", HelpName = "DBM" };
        var generator = new Option<string?>("--generator") { Description = "The generator's role for --tone; needed only when the bench has several.", HelpName = "ROLE" };
        var db = CommonOptions.Database("The result database (created if missing).");
        var json = CommonOptions.Json();
        var command = new Command("overload", "Tell real spectral lines from those the spectrum analyser makes itself: sweep, sweep again with more input attenuation, and label each line. Exit 0 no relied-on line analyser-made, 1 one is, 2 bad input, 3 instrument failure, 130 stopped.")
        {
            bench, role, centre, span, start, stop, rbw, attenuation, raiseBy, threshold, tolerance, carriers, lines, tone, toneLevel, generator, db, json,
        };
        command.SetAction(async (parsed, cancellationToken) =>
        {
            var benchPath = parsed.GetRequiredValue(bench);
            var prepared = RunPreparation.LoadBench(benchPath);
            var definition = prepared.Definition;
            var (lo, hi) = Span(parsed.GetValue(centre), parsed.GetValue(span), parsed.GetValue(start), parsed.GetValue(stop));
            var toneFrequency = parsed.GetValue(tone) is { } t ? OverloadRequest.ParseFrequency(t, "--tone") : (Frequency?)null;
            var toneAt = parsed.GetValue(toneLevel) is { } l ? OverloadRequest.Parse(l, "--tone-level", Level.Parse) : (Level?)null;
            if (toneAt is not null && toneFrequency is null)
            {
                throw new UsageException("--tone-level needs --tone FREQ.");
            }

            var carrierList = (parsed.GetValue(carriers) ?? []).Select(c => OverloadRequest.ParseFrequency(c, "--carrier")).ToList();
            var request = new OverloadRequest
            {
                Analyser = OverloadRequest.PickRole(definition, InstrumentKind.SpectrumAnalyser, parsed.GetValue(role), "--analyser"),
                Start = lo,
                Stop = hi,
                Rbw = OverloadRequest.ParseFrequency(parsed.GetRequiredValue(rbw), "--rbw"),
                Attenuation = OverloadRequest.Parse(parsed.GetRequiredValue(attenuation), "--attenuation", Ratio.Parse),
                RaiseBy = OverloadRequest.Parse(parsed.GetRequiredValue(raiseBy), "--raise-by", Ratio.Parse),
                Threshold = OverloadRequest.Parse(parsed.GetRequiredValue(threshold), "--threshold", Level.Parse),
                Tolerance = OverloadRequest.Parse(parsed.GetRequiredValue(tolerance), "--tolerance", Ratio.Parse),
                Carriers = carrierList.Count == 0 && toneFrequency is { } f ? [f] : carrierList,
                Lines = [.. (parsed.GetValue(lines) ?? []).Select(x => OverloadRequest.ParseFrequency(x, "--line"))],
                Generator = toneFrequency is null ? null : OverloadRequest.PickRole(definition, InstrumentKind.SignalGenerator, parsed.GetValue(generator), "--generator"),
                ToneFrequency = toneFrequency,
                ToneLevel = toneAt,
            };

            var run = RunPreparation.FromPlan(request.ToPlan(), prepared, "Written by benchrunner overload.");
            var plan = run.Plan;

            var dbPath = parsed.GetRequiredValue(db);
            using var store = ResultStoreOpener.Open(dbPath);
            console.Error.WriteLine($"Overload check of {request.Analyser} on {definition.Name}: {request.Start} to {request.Stop}, {request.Attenuation} then {request.Attenuation + request.RaiseBy} input attenuation");
            foreach (var caution in run.Cautions)
            {
                console.Error.WriteLine(caution);
            }

            var runner = run.Launcher(transports(), store);
            var context = run.Context(RunCommand.ThisVersion(), Environment.MachineName);
            var outcome = await runner.RunAsync(plan, context, [RunSubscription.View(new RunProgressView(console.Error, console.UseColour), "progress")], cancellationToken).ConfigureAwait(false);
            var check = outcome.Checks.FirstOrDefault();
            if (parsed.GetValue(json))
            {
                WriteJson(outcome, check, request, dbPath, console.Out);
            }
            else
            {
                WriteText(outcome, check, dbPath, console);
            }

            return RunOutcomeView.ExitCode(outcome.Status);
        });
        return command;
    }

    private static (Frequency Start, Frequency Stop) Span(string? centre, string? span, string? start, string? stop)
    {
        bool byCentre = centre is not null || span is not null;
        bool byEdges = start is not null || stop is not null;
        if (byCentre == byEdges)
        {
            throw new UsageException("give the span as --centre and --span, or as --start and --stop (one pair, not both).");
        }

        if (byCentre)
        {
            var c = OverloadRequest.ParseFrequency(centre ?? throw new UsageException("--span needs --centre."), "--centre");
            var w = OverloadRequest.ParseFrequency(span ?? throw new UsageException("--centre needs --span."), "--span");
            return w.Hertz / 2 < c.Hertz
                ? (Frequency.FromHertz(c.Hertz - w.Hertz / 2), Frequency.FromHertz(c.Hertz + w.Hertz / 2))
                : throw new UsageException($"--span {w} around --centre {c} would reach 0 Hz.");
        }

        var lo = OverloadRequest.ParseFrequency(start ?? throw new UsageException("--stop needs --start."), "--start");
        var hi = OverloadRequest.ParseFrequency(stop ?? throw new UsageException("--start needs --stop."), "--stop");
        return hi > lo ? (lo, hi) : throw new UsageException($"--stop {hi} must be above --start {lo}.");
    }

    private static void WriteText(RunOutcome outcome, CheckResult? check, string db, CliConsole console)
    {
        var writer = console.Out;
        if (check is null)
        {
            writer.WriteLine($"Overload check {Display.Colour("NOT MADE", ConsoleColour.Yellow, console.UseColour)}: {outcome.Error}");
            return;
        }

        var verdict = check.Passed ? Display.Colour("PASS", ConsoleColour.Green, console.UseColour) : Display.Colour("FAIL", ConsoleColour.Red, console.UseColour);
        writer.WriteLine($"Overload check {verdict}: {check.Detail}");
        if (check.Lines.Count > 0)
        {
            OverloadLinesView.Write(check.Lines, writer, "  ", console.UseColour);
        }

        writer.WriteLine($"Stored as run {outcome.RunId} in {db} {RunOutcomeView.ResultsHint(db, outcome.RunId)}.");
    }

    private static void WriteJson(RunOutcome outcome, CheckResult? check, OverloadRequest request, string db, TextWriter writer)
    {
        var document = RunOutcomeView.JsonHead(outcome, db);
        document["analyser"] = request.Analyser;
        document["start_hz"] = request.Start.Hertz;
        document["stop_hz"] = request.Stop.Hertz;
        document["attenuation_db"] = request.Attenuation.Decibels;
        document["raised_attenuation_db"] = (request.Attenuation + request.RaiseBy).Decibels;
        document["detail"] = check?.Detail;
        document["overloaded"] = check?.Lines.Any(l => l.IsAnalyserMade || l.Class == Core.Validity.OverloadClass.ChangedOtherwise);
        document["lines"] = check is null ? null : OverloadLinesView.Json(check.Lines);
        writer.WriteLine(document.ToJsonString(Indented));
    }
}
