namespace BenchRunner.Daemon.Status;

/// <summary>A job that has finished, as the status file's recent list shows it.</summary>
public sealed record FinishedJobStatus
{
    /// <summary>The job's id.</summary>
    public required string Job { get; init; }

    /// <summary>The plan's name.</summary>
    public required string Plan { get; init; }

    /// <summary>Where it came from.</summary>
    public required string Origin { get; init; }

    /// <summary>The run's id in the result database, if a run was recorded.</summary>
    public long? RunId { get; init; }

    /// <summary>How it ended: a run status (<c>passed</c>, <c>failed</c>, <c>error</c>, <c>stopped</c>) or <c>rejected</c>.</summary>
    public required string Status { get; init; }

    /// <summary>When it ended.</summary>
    public required DateTimeOffset EndedUtc { get; init; }

    /// <summary>One line: the checks passed, the error, or the first problem.</summary>
    public required string Summary { get; init; }

    /// <summary>Where the plan file went (done or rejected folder), for inbox plans.</summary>
    public string? FiledAs { get; init; }
}
