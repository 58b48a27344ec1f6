using System.Collections;
using System.CommandLine;
using BenchRunner.Daemon.Hosting;
using BenchRunner.Daemon.Settings;
using BenchRunner.Instruments.Connections;
using BenchRunner.Storage;

namespace BenchRunner.Cli.Commands;

/// <summary>
/// <c>benchrunner serve [--settings FILE] [--home FOLDER] [--bench FILE] [--db FILE] [--inbox FOLDER]
/// [--logs FOLDER] [--state FOLDER] [--log-level WORD] [--schedule EVERY=PLAN]... [--check]</c>:
/// runs the daemon until SIGTERM or Ctrl+C (docs/daemon.md). Exit 0 after a clean stop, 2 bad
/// settings (every problem listed), 3 the result database cannot be opened.
/// </summary>
public static class ServeCommand
{
    /// <summary>Creates the verb.</summary>
    public static Command Create(CliConsole console, Func<TransportFactory> transports)
    {
        var settings = new Option<string?>("--settings") { Description = $"The daemon's settings file (YAML, docs/daemon.md); also {DaemonDefaults.SettingsVariable}.", HelpName = "FILE" };
        var home = new Option<string?>("--home") { Description = "The folder the inbox, done, rejected, logs and state folders and the database default to. Default: the settings file's folder, else the current folder.", HelpName = "FOLDER" };
        var bench = new Option<string?>("--bench") { Description = "The bench file (docs/bench-format.md); docs/examples/bench-virtual.yaml is the virtual bench.", HelpName = "FILE" };
        var db = new Option<string?>("--db") { Description = $"The result database. Default {DaemonDefaults.Database} in the home folder.", HelpName = "FILE" };
        var inbox = new Option<string?>("--inbox") { Description = $"The folder plans are dropped in. Default {DaemonDefaults.Inbox}/ in the home folder.", HelpName = "FOLDER" };
        var logs = new Option<string?>("--logs") { Description = $"The folder of the rolling log files. Default {DaemonDefaults.Logs}/ in the home folder.", HelpName = "FOLDER" };
        var state = new Option<string?>("--state") { Description = $"The folder of the status file 'benchrunner status' reads. Default {DaemonDefaults.State}/ in the home folder.", HelpName = "FOLDER" };
        var level = new Option<string?>("--log-level") { Description = "debug, information (default), warning or error.", HelpName = "WORD" };
        var schedule = new Option<string[]>("--schedule")
        {
            Description = "Run a plan on a schedule, e.g. --schedule \"1h=plans/reference-filter.yaml\" (repeatable; the first run is at start-up).",
            HelpName = "EVERY=PLAN",
            AllowMultipleArgumentsPerToken = false,
        };
        var check = new Option<bool>("--check") { Description = "Check the settings, the bench and the scheduled plans, print what would run, and exit." };
        var command = new Command("serve", "Run as a daemon: plans dropped in the inbox and scheduled plans are run unattended and recorded. Stops gently on SIGTERM or Ctrl+C.")
        {
            settings, home, bench, db, inbox, logs, state, level, schedule, check,
        };

        // A synchronous action: the host itself handles SIGTERM and Ctrl+C and bounds the stop,
        // rather than the command line's own handler cutting it short.
        command.SetAction(parsed =>
        {
            var given = new CommandLineSettings
            {
                SettingsFile = parsed.GetValue(settings),
                Home = parsed.GetValue(home),
                Bench = parsed.GetValue(bench),
                Database = parsed.GetValue(db),
                Inbox = parsed.GetValue(inbox),
                Logs = parsed.GetValue(logs),
                State = parsed.GetValue(state),
                LogLevel = parsed.GetValue(level),
                Schedules = parsed.GetValue(schedule) ?? [],
            };
            var loaded = DaemonSettingsLoader.Load(given, EnvironmentVariables(), Directory.GetCurrentDirectory());
            if (parsed.GetValue(check))
            {
                WriteCheck(loaded, console.Out);
                return ExitCodes.Success;
            }

            var failure = DaemonHost.RunAsync(loaded, transports(), RunCommand.ThisVersion()).GetAwaiter().GetResult();
            return failure switch
            {
                null => ExitCodes.Success,
                ResultStoreException e => Report(console, ExitCodes.InstrumentFailure, e.Message),
                _ => Report(console, ExitCodes.InstrumentFailure, failure.Message),
            };
        });
        return command;
    }

    private static int Report(CliConsole console, int exitCode, string message)
    {
        console.Error.WriteLine($"benchrunner: {message}");
        return exitCode;
    }

    private static Dictionary<string, string> EnvironmentVariables()
    {
        var variables = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (DictionaryEntry entry in Environment.GetEnvironmentVariables())
        {
            if (entry.Key is string key && key.StartsWith("BENCHRUNNER_", StringComparison.Ordinal) && entry.Value is string value)
            {
                variables[key] = value;
            }
        }

        return variables;
    }

    private static void WriteCheck(DaemonSettings settings, TextWriter writer)
    {
        writer.WriteLine("Settings are valid.");
        writer.WriteLine($"  settings file  {settings.SettingsFile ?? "(none)"}");
        writer.WriteLine($"  bench          {settings.BenchPath}");
        writer.WriteLine($"  database       {settings.DatabasePath}");
        writer.WriteLine($"  inbox          {settings.InboxFolder}");
        writer.WriteLine($"  done           {settings.DoneFolder}");
        writer.WriteLine($"  rejected       {settings.RejectedFolder}");
        writer.WriteLine($"  logs           {settings.LogFolder}");
        writer.WriteLine($"  status file    {settings.StatusFile}");
        foreach (var s in settings.Schedules)
        {
            writer.WriteLine($"  schedule       {s.Name}: {s.PlanPath} every {s.Every}, time limit {s.TimeLimit}");
        }
    }
}
