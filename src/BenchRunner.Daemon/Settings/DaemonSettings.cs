using Microsoft.Extensions.Logging;

namespace BenchRunner.Daemon.Settings;

/// <summary>
/// The daemon's settings once read from the settings file, the environment and the command line
/// and checked: every path is absolute, every folder exists, the bench and the scheduled plans
/// have been read. Built by <see cref="DaemonSettingsLoader"/>; defaults are in <see cref="DaemonDefaults"/>.
/// </summary>
public sealed record DaemonSettings
{
    /// <summary>The settings file read, or null when there was none.</summary>
    public string? SettingsFile { get; init; }

    /// <summary>The folder the other folders default to (and relative folders are taken from).</summary>
    public required string Home { get; init; }

    /// <summary>The bench file.</summary>
    public required string BenchPath { get; init; }

    /// <summary>The result database.</summary>
    public required string DatabasePath { get; init; }

    /// <summary>Where plan files are dropped.</summary>
    public required string InboxFolder { get; init; }

    /// <summary>Where plans that ran go, each with a result summary beside it.</summary>
    public required string DoneFolder { get; init; }

    /// <summary>Where invalid plans go, each with an error file beside it.</summary>
    public required string RejectedFolder { get; init; }

    /// <summary>Where the rolling log files are written.</summary>
    public required string LogFolder { get; init; }

    /// <summary>Where the status file is written.</summary>
    public required string StateFolder { get; init; }

    /// <summary>The least important log events written; information by default.</summary>
    public LogLevel LogLevel { get; init; } = LogLevel.Information;

    /// <summary>How long a dropped file must stay unchanged before it is taken.</summary>
    public TimeSpan Settle { get; init; } = DaemonDefaults.Settle;

    /// <summary>How often the inbox is looked at.</summary>
    public TimeSpan ScanEvery { get; init; } = DaemonDefaults.ScanEvery;

    /// <summary>How long a stop waits for the sweep in flight.</summary>
    public TimeSpan StopWithin { get; init; } = DaemonDefaults.StopWithin;

    /// <summary>The first wait before a failed instrument is tried again.</summary>
    public TimeSpan RetryFirst { get; init; } = DaemonDefaults.RetryFirst;

    /// <summary>The longest wait between tries of a failed instrument.</summary>
    public TimeSpan RetryLongest { get; init; } = DaemonDefaults.RetryLongest;

    /// <summary>How many times a plan is run in all when its instruments keep failing.</summary>
    public int RunAttempts { get; init; } = DaemonDefaults.RunAttempts;

    /// <summary>The schedules, in the order given.</summary>
    public IReadOnlyList<ScheduleSettings> Schedules { get; init; } = [];

    /// <summary>The path of the status file in <paramref name="stateFolder"/>.</summary>
    public static string StatusFileIn(string stateFolder) => Path.Combine(stateFolder, "daemon-status.json");

    /// <summary>The path of this daemon's status file.</summary>
    public string StatusFile => StatusFileIn(StateFolder);
}
