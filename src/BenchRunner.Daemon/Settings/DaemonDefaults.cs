namespace BenchRunner.Daemon.Settings;

/// <summary>The defaults of the daemon's settings, in one place (docs/daemon.md lists them too).</summary>
public static class DaemonDefaults
{
    /// <summary>The result database, under the home folder: <c>results.db</c>.</summary>
    public const string Database = "results.db";

    /// <summary>The inbox folder, under the home folder: <c>inbox</c>.</summary>
    public const string Inbox = "inbox";

    /// <summary>Where finished plans go, under the home folder: <c>done</c>.</summary>
    public const string Done = "done";

    /// <summary>Where invalid plans go, under the home folder: <c>rejected</c>.</summary>
    public const string Rejected = "rejected";

    /// <summary>The rolling log files, under the home folder: <c>logs</c>.</summary>
    public const string Logs = "logs";

    /// <summary>The status file's folder, under the home folder: <c>state</c>.</summary>
    public const string State = "state";

    /// <summary>How long a dropped file must stay unchanged before it is taken: 2 s.</summary>
    public static readonly TimeSpan Settle = TimeSpan.FromSeconds(2);

    /// <summary>How often the inbox is looked at: 1 s.</summary>
    public static readonly TimeSpan ScanEvery = TimeSpan.FromSeconds(1);

    /// <summary>How long a stop waits for the sweep in flight before cutting it short: 20 s.</summary>
    public static readonly TimeSpan StopWithin = TimeSpan.FromSeconds(20);

    /// <summary>The first wait before an instrument that failed is tried again: 5 s (then doubled each time).</summary>
    public static readonly TimeSpan RetryFirst = TimeSpan.FromSeconds(5);

    /// <summary>The longest wait between tries of a failed instrument: 5 min.</summary>
    public static readonly TimeSpan RetryLongest = TimeSpan.FromMinutes(5);

    /// <summary>How many times a plan is run in all when its instruments keep failing: 3.</summary>
    public const int RunAttempts = 3;

    /// <summary>The environment variable naming the settings file.</summary>
    public const string SettingsVariable = "BENCHRUNNER_SETTINGS";
}
