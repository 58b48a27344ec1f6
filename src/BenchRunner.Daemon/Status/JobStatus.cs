namespace BenchRunner.Daemon.Status;

/// <summary>A plan waiting its turn or running, as the status file shows it.</summary>
public sealed record JobStatus
{
    /// <summary>The daemon's id for the job (<c>J1</c>, <c>J2</c>...; counted afresh at each start).</summary>
    public required string Job { get; init; }

    /// <summary>The plan's name.</summary>
    public required string Plan { get; init; }

    /// <summary>Where it came from: <c>inbox</c> or <c>schedule NAME</c>.</summary>
    public required string Origin { get; init; }

    /// <summary>The plan file.</summary>
    public required string PlanFile { get; init; }

    /// <summary>The bench instruments it needs.</summary>
    public required IReadOnlyList<string> Instruments { get; init; }

    /// <summary>When it was queued.</summary>
    public required DateTimeOffset QueuedUtc { get; init; }

    /// <summary>When its run started, while running.</summary>
    public DateTimeOffset? StartedUtc { get; init; }

    /// <summary>The run's id in the result database, while running.</summary>
    public long? RunId { get; init; }

    /// <summary>The step in progress, while running.</summary>
    public string? Step { get; init; }

    /// <summary>Which try this is (1 unless an instrument failed).</summary>
    public int Attempt { get; init; } = 1;

    /// <summary>What it waits for while queued: instruments in use or faulty.</summary>
    public string? WaitingFor { get; init; }
}
