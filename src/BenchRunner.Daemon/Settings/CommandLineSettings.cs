namespace BenchRunner.Daemon.Settings;

/// <summary>The settings given on the command line of <c>benchrunner serve</c>; null where not given. They win over the environment and the settings file.</summary>
public sealed record CommandLineSettings
{
    /// <summary><c>--settings FILE</c>.</summary>
    public string? SettingsFile { get; init; }

    /// <summary><c>--home FOLDER</c>.</summary>
    public string? Home { get; init; }

    /// <summary><c>--bench FILE</c>.</summary>
    public string? Bench { get; init; }

    /// <summary><c>--db FILE</c>.</summary>
    public string? Database { get; init; }

    /// <summary><c>--inbox FOLDER</c>.</summary>
    public string? Inbox { get; init; }

    /// <summary><c>--logs FOLDER</c>.</summary>
    public string? Logs { get; init; }

    /// <summary><c>--state FOLDER</c>.</summary>
    public string? State { get; init; }

    /// <summary><c>--log-level WORD</c>.</summary>
    public string? LogLevel { get; init; }

    /// <summary><c>--schedule EVERY=PLAN</c>, each e.g. <c>1h=plans/reference.yaml</c>; added to the settings file's schedules.</summary>
    public IReadOnlyList<string> Schedules { get; init; } = [];
}
