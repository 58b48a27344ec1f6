using System.CommandLine;
using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
using BenchRunner.Cli.Demo;
using BenchRunner.Cli.Results;
using BenchRunner.Cli.Tune;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Running;
using BenchRunner.Execution.Tuning;
using BenchRunner.Execution.Validation;
using BenchRunner.Instruments.Connections;
using BenchRunner.Simulator.Bench;
using BenchRunner.Simulator.Endpoints;
using BenchRunner.Storage;
using BenchRunner.Core.Runs;
using BenchRunner.Execution.Preparation;

namespace BenchRunner.Cli.Commands;

/// <summary>
/// <c>benchrunner tune [PLAN --bench BENCH] [--settle-sweeps N] [--settle-time S] [--interval S]
/// [--stop-when-settled] [--bell] [--max-sweeps N] [--plain] [--db FILE] [--json]</c>: sweeps again
/// and again while someone turns the trimmers, shows the figures and a plot after every sweep, says
/// when the response has settled inside the plan's targets, and stores every sweep as one tuning
/// run. Without PLAN, the demo: the detuned board on the virtual bench, tuned by a virtual hand.
/// Exit 0 settled at the end, 1 not settled, 2 bad input, 3 instrument failure, 130 stopped (Ctrl+C).
/// </summary>
public static class TuneCommand
{
    /// <summary>The tuning plan of the demo, as embedded with the demo files.</summary>
    public const string DemoPlan = "plans/psf-137-tune.yaml";

    /// <summary>Creates the verb.</summary>
    public static Command Create(CliConsole console, Func<TransportFactory> transports)
    {
        var plan = new Argument<string?>("PLAN")
        {
            Description = "The plan to tune against (docs/plan-format.md): its figure limits are the targets. Leave out for the demo on the virtual bench.",
            Arity = ArgumentArity.ZeroOrOne,
        };
        var bench = new Option<string?>("--bench") { Description = "The bench file naming the instruments (docs/bench-format.md); needed with PLAN.", HelpName = "BENCH" };
        var sweeps = new Option<int>("--settle-sweeps") { Description = "Settled after this many consecutive sweeps inside every target.", HelpName = "N", DefaultValueFactory = _ => SettleOptions.DefaultSweeps };
        var time = new Option<double>("--settle-time") { Description = "Settled only once every target has also stayed inside this long, in seconds.", HelpName = "SECONDS", DefaultValueFactory = _ => SettleOptions.DefaultMinimumTime.TotalSeconds };
        var interval = new Option<double>("--interval") { Description = "Least time from one sweep's start to the next, in seconds; 0 sweeps as fast as the instrument can.", HelpName = "SECONDS", DefaultValueFactory = _ => TuningOptions.DefaultInterval.TotalSeconds };
        var stop = new Option<bool>("--stop-when-settled") { Description = "End the session by itself once settled (the demo always does). Otherwise it runs until Ctrl+C." };
        var bell = new Option<bool>("--bell") { Description = "Ring the terminal bell when the response settles." };
        var max = new Option<int?>("--max-sweeps") { Description = "End after this many sweeps whatever happens.", HelpName = "N" };
        var plain = new Option<bool>("--plain") { Description = "One plain line per sweep even on a terminal (the default when the output is not a terminal)." };
        var db = new Option<string?>("--db") { Description = $"The result database (created if missing). Default {ResultsCommand.DefaultDatabase}; {DemoCommand.DefaultDatabase} for the demo.", HelpName = "FILE" };
        var dut = CommonOptions.Dut("The board's serial number, stored with the run.");
        var op = CommonOptions.Operator("Who tunes the board.");
        var turn = new Option<double>("--turn-time") { Description = "Demo only: how long the virtual technician takes to turn the trimmer, in seconds.", HelpName = "SECONDS", DefaultValueFactory = _ => TuningDemo.DefaultTurnTime.TotalSeconds };
        var seed = new Option<int>("--seed") { Description = "Demo only: seeds the virtual bench's noise.", HelpName = "N", DefaultValueFactory = _ => 1 };
        var json = CommonOptions.Json();
        var command = new Command("tune", "Sweep continuously while you turn the trimmers: live figures with their change and target, a plot against the mask, and word when the response has settled. Every sweep is stored. Without PLAN, a demo on the virtual bench.")
        {
            plan, bench, sweeps, time, interval, stop, bell, max, plain, db, dut, op, turn, seed, json,
        };
        command.SetAction(async (parsed, cancellationToken) =>
        {
            var planPath = parsed.GetValue(plan);
            var benchPath = parsed.GetValue(bench);
            bool demo = planPath is null;
            if (demo && benchPath is not null)
            {
                throw new UsageException("--bench needs a PLAN to go with it; leave both out for the demo.");
            }

            if (!demo && benchPath is null)
            {
                throw new UsageException("tune PLAN needs --bench BENCH (docs/examples/bench-virtual.yaml is the virtual bench); leave both out for the demo.");
            }

            var options = new TuningOptions
            {
                Settle = new SettleOptions { Sweeps = parsed.GetValue(sweeps), MinimumTime = Seconds(parsed.GetValue(time), "--settle-time") },
                Interval = Seconds(parsed.GetValue(interval), "--interval"),
                StopWhenSettled = demo || parsed.GetValue(stop),
                MaxSweeps = parsed.GetValue(max),
            };
            var problems = options.Validate();
            if (problems.Count > 0)
            {
                throw new UsageException(string.Join("; ", problems) + ".");
            }

            using var files = demo ? DemoFiles.Extract() : null;
            TransportFactory factory;
            if (files is not null)
            {
                planPath = Path.Combine(files.Folder, DemoPlan);
                benchPath = files.Bench;
                var virtualBench = TuningDemo.CreateBench(parsed.GetValue(seed), TimeProvider.System, Seconds(parsed.GetValue(turn), "--turn-time", allowZero: false));
                // Not stopped by Ctrl+C: each in-process server ends when its connection closes, after the run is finished.
                factory = SimulatorConnections.Register(new TransportFactory(), new VirtualBenchServers(virtualBench));
            }
            else
            {
                factory = transports();
            }

            var prepared = RunPreparation.Load(planPath!, benchPath);
            var benchDefinition = prepared.RequiredBench.Definition;
            if (!prepared.Plan.AllSteps().OfType<SweepStep>().Any())
            {
                throw new UsageException($"{planPath}: the plan has no sweep step, so there is nothing to tune against; add a sweep and the checks to watch.");
            }
            var dbPath = parsed.GetValue(db) ?? (demo ? DemoCommand.DefaultDatabase : ResultsCommand.DefaultDatabase);
            using var store = ResultStoreOpener.Open(dbPath);
            var context = prepared.Context(RunCommand.ThisVersion(), Environment.MachineName) with
            {
                DutSerial = parsed.GetValue(dut) ?? (demo ? "PSF-24-0002" : null),
                Operator = parsed.GetValue(op) ?? (demo ? "demo" : null),
            };

            bool asJson = parsed.GetValue(json);
            bool live = console.IsTerminal && !asJson && !parsed.GetValue(plain);
            var report = asJson ? console.Error : console.Out;
            var title = $"{prepared.Plan.Name} on {benchDefinition.Name}{(context.DutSerial is null ? "" : $" ({context.DutSerial})")}";
            ITuningObserver view = live
                ? new TuningLiveView(console.Out, title, options.Settle, console.UseColour, parsed.GetValue(bell), PlotWidth(), PlotHeight(prepared.Plan))
                : new TuningLogView(report, options.Settle, parsed.GetValue(bell));
            if (!live)
            {
                report.WriteLine($"Tuning {title}: one line per sweep; Ctrl+C ends the session and keeps every sweep.");
                if (demo)
                {
                    report.WriteLine("Demo: a virtual technician turns the middle trimmer of the detuned board PSF-24-0002 towards alignment.");
                }

                report.WriteLine(DemoCommand.SafetyNote);
            }

            var session = new TuningSession(prepared.Launcher(factory, store), options);
            using var signals = new StopSignal(cancellationToken);
            var outcome = await session.RunAsync(prepared.Plan, context, view, null, signals.Token).ConfigureAwait(false);
            if (asJson)
            {
                WriteJson(outcome, dbPath, console.Out);
            }
            else
            {
                WriteSummary(outcome, dbPath, report, safety: live);
            }

            return outcome.Run.Status switch
            {
                RunStatus.Stopped => ExitCodes.Stopped,
                RunStatus.Error => ExitCodes.InstrumentFailure,
                _ when outcome.Settled => ExitCodes.Success,
                _ => ExitCodes.CheckFailed,
            };
        });
        return command;
    }

    /// <summary>The plot as wide as the terminal allows (64 columns when its size is unknown).</summary>
    private static int PlotWidth() => TerminalSize(() => Console.WindowWidth) is { } columns ? Math.Clamp(columns - 12, 40, 120) : 64;

    /// <summary>The plot as tall as fits with the figures in the terminal, so that redrawing never scrolls (12 rows when unknown).</summary>
    private static int PlotHeight(TestPlan plan)
    {
        var targets = TuningTargets.From(plan);
        int figureRows = TuningTargets.StandardKeys.Count + 1
            + targets.Limits.Count(l => !(l.Trace == targets.Trace && TuningTargets.StandardKeys.Contains(l.Limit.Key)));
        return TerminalSize(() => Console.WindowHeight) is { } rows
            ? Math.Clamp(rows - TuningLiveView.LinesBesidesPlot - Math.Max(0, figureRows - 5), 4, 16)
            : 12;
    }

    private static int? TerminalSize(Func<int> read)
    {
        try
        {
            int size = read();
            return size > 0 ? size : null;
        }
        catch (Exception ex) when (ex is IOException or InvalidOperationException or PlatformNotSupportedException)
        {
            return null;
        }
    }

    private static TimeSpan Seconds(double seconds, string option, bool allowZero = true)
    {
        if (!double.IsFinite(seconds) || seconds < 0 || (!allowZero && seconds == 0) || seconds > TimeSpan.FromDays(1).TotalSeconds)
        {
            throw new UsageException($"{option} takes seconds, {(allowZero ? "zero or more" : "more than zero")} and at most a day, not {seconds.ToString(CultureInfo.InvariantCulture)}.");
        }

        return TimeSpan.FromSeconds(seconds);
    }

    private static void WriteSummary(TuningOutcome outcome, string db, TextWriter writer, bool safety)
    {
        writer.WriteLine();
        var how = outcome.Run.Status switch
        {
            RunStatus.Stopped => "stopped by the operator",
            RunStatus.Error => $"ended by an error: {outcome.Run.Error}",
            _ => "ended",
        };
        var settled = outcome.FirstSettledAt is { } at
            ? $"settled first at sweep {at}{(outcome.Settled ? " and still settled at the end" : ", but not settled at the end")}"
            : "never settled";
        writer.WriteLine($"Session {how} after {outcome.Sweeps} sweep{(outcome.Sweeps == 1 ? "" : "s")}: {settled}.");
        if (outcome.Run.RunId is { } id)
        {
            writer.WriteLine($"Every sweep is stored as run {id} in {db}; 'benchrunner results --db {db} --run {id}' shows the trajectory.");
        }

        if (safety)
        {
            // The live view cleared the screen the note would have been on.
            writer.WriteLine(DemoCommand.SafetyNote);
        }
    }

    private static void WriteJson(TuningOutcome outcome, string db, TextWriter writer)
    {
        var document = new JsonObject
        {
            ["run_id"] = outcome.Run.RunId,
            ["database"] = db,
            ["status"] = outcome.Run.Status.ToString().ToLowerInvariant(),
            ["error"] = outcome.Run.Error,
            ["sweeps"] = outcome.Sweeps,
            ["settled"] = outcome.Settled,
            ["first_settled_at_sweep"] = outcome.FirstSettledAt,
            ["last_sweep"] = outcome.Last is not { } last ? null : new JsonObject
            {
                ["sweep"] = last.Sweep,
                ["elapsed_s"] = last.Elapsed.TotalSeconds,
                ["inside"] = last.Settle.Inside,
                ["failed_checks"] = new JsonArray(last.FailedChecks.Select(c => (JsonNode?)c).ToArray()),
                ["figures"] = new JsonArray(last.Figures.Select(f => (JsonNode?)new JsonObject
                {
                    ["key"] = f.Key.Word, ["trace"] = f.Trace, ["value"] = f.Value, ["unit"] = f.Unit.Symbol, ["change"] = f.Change,
                    ["min"] = f.Limit?.Min, ["max"] = f.Limit?.Max, ["target"] = f.Limit?.Target, ["inside"] = f.Inside,
                }).ToArray()),
            },
        };
        writer.WriteLine(document.ToJsonString(new JsonSerializerOptions { WriteIndented = true }));
    }
}
