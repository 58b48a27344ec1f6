using System.CommandLine;
using System.Text.Json.Nodes;
using BenchRunner.Cli.Commands;
using BenchRunner.Core.Diagnostics;
using BenchRunner.Instruments.Connections;
using BenchRunner.Instruments.Errors;
using BenchRunner.Simulator.Endpoints;

namespace BenchRunner.Cli;

/// <summary>Builds the verb tree and runs one command line, mapping failures to exit codes.</summary>
public static class CliApplication
{
    /// <summary>Parses <paramref name="args"/>, runs the verb and returns its exit code.</summary>
    public static int Run(string[] args, CliConsole console) =>
        Run(args, console, () => SimulatorConnections.Register(new TransportFactory(), new VirtualBenchServers()));

    /// <summary>As <see cref="Run(string[], CliConsole)"/>, with the connection kinds <paramref name="transports"/> offers.</summary>
    public static int Run(string[] args, CliConsole console, Func<TransportFactory> transports)
    {
        var root = BuildRoot(console, transports);
        // Bare "benchrunner" shows what it can do rather than an error.
        var parsed = root.Parse(args.Length == 0 ? ["--help"] : args);
        if (parsed.Errors.Count > 0)
        {
            // "Required command was not provided" only repeats an unrecognised verb's error.
            var errors = parsed.Errors.Count > 1 && parsed.UnmatchedTokens.Count > 0
                ? parsed.Errors.Where(e => !e.Message.StartsWith("Required command", StringComparison.Ordinal))
                : parsed.Errors;
            foreach (var error in errors)
            {
                console.Error.WriteLine($"benchrunner: {error.Message}");
            }

            var verb = parsed.CommandResult.Command;
            var helpHint = verb == root ? "benchrunner --help" : $"benchrunner {verb.Name} --help";
            console.Error.WriteLine($"Run '{helpHint}' to see what it accepts.");
            return ExitCodes.BadInput;
        }

        try
        {
            // InvokeAsync: only the asynchronous path turns Ctrl+C into cancellation (the sync one lets the signal end the process).
            return parsed.InvokeAsync(new InvocationConfiguration
            {
                Output = console.Out,
                Error = console.Error,
                EnableDefaultExceptionHandler = false,
                ProcessTerminationTimeout = TimeSpan.FromSeconds(5),
            }).GetAwaiter().GetResult();
        }
        catch (Exception ex) when (ex is InputFormatException or UsageException)
        {
            return Fail(console, args, ExitCodes.BadInput, ex.Message);
        }
        catch (InstrumentException ex)
        {
            return Fail(console, args, ExitCodes.InstrumentFailure, ex.Message);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            return Fail(console, args, ExitCodes.InstrumentFailure, ex.Message);
        }
        catch (OperationCanceledException)
        {
            return Fail(console, args, ExitCodes.Stopped, "stopped by the operator; everything acquired so far is kept.");
        }
    }

    /// <summary>
    /// Reports a failure in one line on standard error; with <c>--json</c>, also as a JSON
    /// document on standard output so that a script always gets one document.
    /// </summary>
    private static int Fail(CliConsole console, string[] args, int exitCode, string message)
    {
        console.Error.WriteLine($"benchrunner: {message}");
        if (args.Contains(CommonOptions.JsonName))
        {
            var document = new JsonObject
            {
                ["error"] = new JsonObject { ["exit_code"] = exitCode, ["message"] = message },
            };
            console.Out.WriteLine(document.ToJsonString());
        }

        return exitCode;
    }

    private static RootCommand BuildRoot(CliConsole console, Func<TransportFactory> transports)
    {
        var root = new RootCommand(
            "BenchRunner drives low-cost RF instruments, runs test plans against limit masks and logs every sweep.");
        // In the order a bench engineer meets them: measuring, reviewing, checking, running unattended, instruments.
        root.Subcommands.Add(DemoCommand.Create(console));
        root.Subcommands.Add(RunCommand.Create(console, transports));
        root.Subcommands.Add(TuneCommand.Create(console, transports));
        root.Subcommands.Add(BatchCommand.Create(console, transports));
        root.Subcommands.Add(ReportCommand.Create(console));
        root.Subcommands.Add(ResultsCommand.Create(console));
        root.Subcommands.Add(ExportCommand.Create(console));
        root.Subcommands.Add(OverloadCommand.Create(console, transports));
        root.Subcommands.Add(ValidateCommand.Create(console));
        root.Subcommands.Add(CheckCommand.Create(console));
        root.Subcommands.Add(ServeCommand.Create(console, transports));
        root.Subcommands.Add(StatusCommand.Create(console));
        root.Subcommands.Add(IdentifyCommand.Create(console, transports));
        root.Subcommands.Add(PortsCommand.Create(console));
        root.Subcommands.Add(ReplayCommand.Create(console));
        root.Subcommands.Add(SimCommand.Create(console));
        return root;
    }
}
