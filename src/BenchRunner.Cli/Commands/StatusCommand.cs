using System.CommandLine;
using System.Text.Json;
using System.Text.Json.Nodes;
using BenchRunner.Cli.Serve;
using BenchRunner.Daemon.Settings;
using BenchRunner.Daemon.Status;

namespace BenchRunner.Cli.Commands;

/// <summary>
/// <c>benchrunner status [--state FOLDER | --settings FILE] [--json]</c>: shows what the daemon is
/// doing from the status file it keeps: queue, running plans, instrument health, schedules.
/// Exit 0 when the daemon is running, 3 when it is not (stopped, silent, or no status file).
/// </summary>
public static class StatusCommand
{
    /// <summary>Creates the verb.</summary>
    public static Command Create(CliConsole console)
    {
        var state = new Option<string?>("--state") { Description = $"The daemon's state folder. Default: BENCHRUNNER_STATE, else {DaemonDefaults.State}/ in BENCHRUNNER_HOME or the current folder.", HelpName = "FOLDER" };
        var settings = new Option<string?>("--settings") { Description = "Find the state folder from the daemon's settings file instead.", HelpName = "FILE" };
        var json = CommonOptions.Json();
        var command = new Command("status", "Show what the daemon is doing: queued and running plans, instrument health, schedules, recent results. Exit 0 running, 3 not running.")
        {
            state, settings, json,
        };
        command.SetAction(parsed =>
        {
            var folder = StateFolder(parsed.GetValue(state), parsed.GetValue(settings));
            var path = DaemonSettings.StatusFileIn(folder);
            DaemonStatus? status;
            try
            {
                status = StatusFile.Read(path);
            }
            catch (JsonException e)
            {
                throw new UsageException(e.Message);
            }

            var now = DateTimeOffset.UtcNow;
            if (status is null)
            {
                throw new IOException($"{path}: no status file; the daemon has not run with this state folder (give --state or --settings).");
            }

            var (alive, verdict) = Judge(status, now);
            if (parsed.GetValue(json))
            {
                var document = JsonNode.Parse(StatusFile.ToJson(status))!.AsObject();
                document["alive"] = alive;
                document["verdict"] = verdict;
                document["status_file"] = path;
                console.Out.WriteLine(document.ToJsonString(new JsonSerializerOptions { WriteIndented = true }));
            }
            else
            {
                StatusTextView.Write(status, verdict, now, console.Out);
            }

            return alive ? ExitCodes.Success : ExitCodes.InstrumentFailure;
        });
        return command;
    }

    /// <summary>Whether the daemon behind <paramref name="status"/> is alive, and a word on it.</summary>
    public static (bool Alive, string Verdict) Judge(DaemonStatus status, DateTimeOffset now)
    {
        var silent = now - status.UpdatedUtc;
        if (status.State == "stopped")
        {
            return (false, $"stopped at {status.UpdatedUtc.UtcDateTime:yyyy-MM-dd HH:mm:ss}Z");
        }

        // Three missed heartbeats: the process was killed or hangs.
        if (silent.TotalSeconds > 3 * Math.Max(1, status.HeartbeatSeconds))
        {
            return (false, $"not responding: was {status.State}, silent for {silent.TotalSeconds:0} s (killed? the next start marks its runs interrupted)");
        }

        return (true, status.State);
    }

    private static string StateFolder(string? state, string? settingsFile)
    {
        if (state is not null)
        {
            return Path.GetFullPath(state);
        }

        if (settingsFile is not null)
        {
            var environment = new Dictionary<string, string>(StringComparer.Ordinal);
            foreach (var (_, variable) in DaemonSettingsLoader.Variables)
            {
                if (Environment.GetEnvironmentVariable(variable) is { } value)
                {
                    environment[variable] = value;
                }
            }

            return DaemonSettingsLoader.Load(new CommandLineSettings { SettingsFile = settingsFile }, environment, Directory.GetCurrentDirectory()).StateFolder;
        }

        if (Environment.GetEnvironmentVariable("BENCHRUNNER_STATE") is { Length: > 0 } fromEnvironment)
        {
            return Path.GetFullPath(fromEnvironment);
        }

        var home = Environment.GetEnvironmentVariable("BENCHRUNNER_HOME") is { Length: > 0 } h ? h : ".";
        return Path.GetFullPath(Path.Combine(home, DaemonDefaults.State));
    }
}
