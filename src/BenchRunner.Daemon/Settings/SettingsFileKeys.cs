namespace BenchRunner.Daemon.Settings;

/// <summary>The keys of the daemon's settings file (docs/daemon.md), in the order messages list them.</summary>
internal static class SettingsFileKeys
{
    public const string Home = "home";
    public const string Bench = "bench";
    public const string Database = "database";
    public const string InboxKey = "inbox";
    public const string Done = "done";
    public const string Rejected = "rejected";
    public const string Logs = "logs";
    public const string State = "state";
    public const string LogLevelKey = "log-level";
    public const string Timing = "timing";
    public const string InstrumentRetry = "instrument-retry";
    public const string Schedules = "schedules";

    public const string Settle = "settle";
    public const string ScanEvery = "scan-every";
    public const string StopWithin = "stop-within";

    public const string First = "first";
    public const string Longest = "longest";
    public const string Runs = "runs";

    public const string Name = "name";
    public const string Plan = "plan";
    public const string Every = "every";
    public const string TimeLimit = "time-limit";

    /// <summary>The keys that hold one path or word each, which the environment and the command line may also give.</summary>
    public static readonly string[] Simple = [Home, Bench, Database, InboxKey, Done, Rejected, Logs, State, LogLevelKey];

    public static readonly string[] Top = [.. Simple, Timing, InstrumentRetry, Schedules];

    public static readonly string[] TimingKeys = [Settle, ScanEvery, StopWithin];

    public static readonly string[] RetryKeys = [First, Longest, Runs];

    public static readonly string[] ScheduleKeys = [Name, Plan, Every, TimeLimit];
}
