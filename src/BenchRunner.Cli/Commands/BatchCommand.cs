using System.CommandLine;
using BenchRunner.Cli.Batch;
using BenchRunner.Cli.Demo;
using BenchRunner.Cli.Results;
using BenchRunner.Execution.Batch;
using BenchRunner.Execution.Bench;
using BenchRunner.Execution.Running;
using BenchRunner.Execution.Validation;
using BenchRunner.Instruments.Connections;
using BenchRunner.Reports.Lots;
using BenchRunner.Simulator.Bench;
using BenchRunner.Simulator.Devices;
using BenchRunner.Simulator.Endpoints;
using BenchRunner.Storage;
using BenchRunner.Core.Runs;
using BenchRunner.Execution.Preparation;

namespace BenchRunner.Cli.Commands;

/// <summary>
/// <c>benchrunner batch PLAN --lot LOT [--bench BENCH] [--serials FILE|-] [--db FILE] [--operator NAME] [--json]</c>:
/// tests a lot of boards one after another, shows each verdict at once and the lot's yield as it
/// goes, and ends with the lot summary. Exit 0 every board passed, 1 a board failed, 2 bad input,
/// 3 a board's test could not finish, 130 stopped.
/// </summary>
public static class BatchCommand
{
    /// <summary>Creates the verb.</summary>
    public static Command Create(CliConsole console, Func<TransportFactory> transports)
    {
        var plan = new Argument<string>("PLAN") { Description = "The test plan every board is tested with (docs/plan-format.md)." };
        var lot = new Option<string>("--lot") { Description = "The lot the boards belong to, e.g. PSF-24-L07. A board that already has a verdict in the result file is tested as a retest.", HelpName = "LOT", Required = true };
        var bench = new Option<string?>("--bench")
        {
            Description = "The bench file (docs/bench-format.md). Default: the built-in virtual bench, whose fixture holds the simulated lot PSF-24-0001 to PSF-24-0020.",
            HelpName = "BENCH",
        };
        var serials = new Option<string?>("--serials")
        {
            Description = "A file with one serial per line ('#' starts a comment), or - to read them from standard input without prompts. Default: ask for each serial (type it, or scan its barcode).",
            HelpName = "FILE",
        };
        var db = CommonOptions.Database(CommonOptions.WrittenDatabase);
        var op = CommonOptions.Operator("Who tests the boards.");
        var json = CommonOptions.Json();
        var command = new Command("batch", "Test a lot of boards one by one: PASS/FAIL for each at once, yield as you go, and a lot summary with Cpk at the end. Exit 0 all passed, 1 a board failed, 2 bad input, 3 a test could not finish, 130 stopped.")
        {
            plan, lot, bench, serials, db, op, json,
        };
        command.SetAction(async (parsed, cancellationToken) =>
        {
            bool asJson = parsed.GetValue(json);
            var view = new BatchTextView(asJson ? console.Error : console.Out, console.UseColour && !asJson);
            var lotName = parsed.GetRequiredValue(lot).Trim();
            if (!BoardSerial.TryRead(lotName, out _, out var lotProblem))
            {
                throw new UsageException($"--lot: {lotProblem!.Replace("serial", "lot name", StringComparison.Ordinal)}");
            }

            var planPath = parsed.GetRequiredValue(plan);
            using var builtIn = parsed.GetValue(bench) is null ? DemoFiles.Extract() : null;
            var benchPath = parsed.GetValue(bench) ?? builtIn!.Bench;
            var prepared = RunPreparation.Load(planPath, benchPath);
            var benchDefinition = prepared.RequiredBench.Definition;
            var source = parsed.GetValue(serials) switch
            {
                null => SerialSource.FromReader(console.In, console.Error, console.Error, echo: !console.InIsTerminal),
                "-" => SerialSource.FromReader(console.In, null, console.Error),
                var file => SerialSource.FromFile(file),
            };

            var (factory, fixture) = Fixture(benchDefinition, transports, console, cancellationToken);
            var dbPath = parsed.GetRequiredValue(db);
            using var store = ResultStoreOpener.Open(dbPath);
            var runner = prepared.Launcher(factory, store);
            var context = prepared.Context(RunCommand.ThisVersion(), Environment.MachineName) with
            {
                Lot = lotName,
                Operator = parsed.GetValue(op),
            };
            var session = new BatchSession(runner, prepared.Plan, context, store, fixture);
            console.Error.WriteLine($"Batch of lot {lotName}: plan {prepared.Plan.Name} on {benchDefinition.Name}{(fixture is VirtualLotFixture ? " (virtual fixture: the simulated lot)" : "")}.");
            console.Error.WriteLine(DemoCommand.SafetyNote);

            var results = new List<BoardResult>();
            bool stopped = false;
            string? current = null;
            try
            {
                while (await source.NextAsync(cancellationToken).ConfigureAwait(false) is { } serial)
                {
                    current = serial;
                    var result = await session.TestAsync(serial, null, cancellationToken).ConfigureAwait(false);
                    results.Add(result);
                    view.Board(result);
                    if (cancellationToken.IsCancellationRequested)
                    {
                        stopped = true;
                        break;
                    }

                    current = null;
                    view.Progress(LotSummary.Read(store, lotName, withFigures: false));
                }
            }
            catch (OperationCanceledException) when (cancellationToken.IsCancellationRequested)
            {
                stopped = true;
            }

            var summary = LotSummary.Read(store, lotName);
            if (stopped)
            {
                console.Error.WriteLine();
                console.Error.WriteLine(current is null
                    ? "Stopped by the operator while waiting for a serial; every verdict so far is kept."
                    : $"Stopped by the operator: {current} was left untested; every verdict so far is kept.");
            }

            if (asJson)
            {
                BatchJsonView.Write(console.Out, results, summary, dbPath);
            }

            view.Summary(summary, dbPath);
            return stopped ? ExitCodes.Stopped
                : results.Any(r => r.Outcome is { Status: RunStatus.Error or RunStatus.Interrupted }) ? ExitCodes.InstrumentFailure
                : summary.Boards.Any(b => !b.Passed) ? ExitCodes.CheckFailed
                : ExitCodes.Success;
        });
        return command;
    }

    /// <summary>
    /// On a bench made only of <c>sim:</c> instruments, the virtual bench with the simulated lot in
    /// its fixture; on any other bench, the given connections and an operator who connects each board.
    /// </summary>
    private static (TransportFactory, IBoardFixture) Fixture(BenchDefinition bench, Func<TransportFactory> transports, CliConsole console, CancellationToken stopping)
    {
        if (bench.Instruments.Values.All(i => i.Connection.Scheme == ConnectionSpec.SimulatorScheme))
        {
            var virtualBench = VirtualBench.CreateDemo(1);
            var factory = SimulatorConnections.Register(transports(), new VirtualBenchServers(virtualBench), stopping);
            return (factory, new VirtualLotFixture(virtualBench, BoardLot.Generate()));
        }

        return (transports(), new OperatorFixture(console.In, console.Error, echo: !console.InIsTerminal));
    }
}
