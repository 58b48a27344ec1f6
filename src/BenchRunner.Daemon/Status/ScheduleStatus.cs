namespace BenchRunner.Daemon.Status;

/// <summary>One schedule, as the status file shows it.</summary>
public sealed record ScheduleStatus
{
    /// <summary>Its name.</summary>
    public required string Name { get; init; }

    /// <summary>The plan file it runs.</summary>
    public required string PlanFile { get; init; }

    /// <summary>Seconds between due times.</summary>
    public required double EverySeconds { get; init; }

    /// <summary>The time limit of one run, in seconds.</summary>
    public required double TimeLimitSeconds { get; init; }

    /// <summary>When it is next due.</summary>
    public DateTimeOffset? NextDueUtc { get; init; }

    /// <summary>When its last run was started.</summary>
    public DateTimeOffset? LastStartedUtc { get; init; }

    /// <summary>How its last run ended, or null while running or before the first.</summary>
    public string? LastStatus { get; init; }

    /// <summary>The last run's id in the result database.</summary>
    public long? LastRunId { get; init; }

    /// <summary>How many due runs were skipped because the one before had not finished.</summary>
    public int Skipped { get; init; }
}
