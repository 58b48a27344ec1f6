using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Daemon.Settings;

/// <summary>What a settings file gave, before the environment and command line are laid over it.</summary>
internal sealed class SettingsFileContent
{
    /// <summary>The one-value settings by key (<see cref="SettingsFileKeys.Simple"/>).</summary>
    public Dictionary<string, SettingValue> Values { get; } = new(StringComparer.Ordinal);

    public TimeSpan? Settle { get; set; }

    public TimeSpan? ScanEvery { get; set; }

    public TimeSpan? StopWithin { get; set; }

    public TimeSpan? RetryFirst { get; set; }

    public TimeSpan? RetryLongest { get; set; }

    public int? RunAttempts { get; set; }

    /// <summary>Where <see cref="RetryFirst"/> was given, for a problem between it and <see cref="RetryLongest"/>.</summary>
    public SourceLocation? RetryAt { get; set; }

    /// <summary>The schedules: name (or null), plan value, interval, time limit (or null), where.</summary>
    public List<(string? Name, SettingValue Plan, TimeSpan Every, TimeSpan? TimeLimit, SourceLocation At)> Schedules { get; } = [];
}
