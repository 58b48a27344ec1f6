namespace BenchRunner.Daemon.Status;

/// <summary>
/// What the daemon is doing, as written to its status file (<c>state/daemon-status.json</c>) and
/// shown by <c>benchrunner status</c>. The file is rewritten whole (written beside and renamed
/// over), so a reader never sees half of it; its fields are documented in docs/daemon.md.
/// </summary>
public sealed record DaemonStatus
{
    /// <summary>The format's name and version.</summary>
    public const string FormatName = "benchrunner-daemon-status/1";

    /// <summary>Always <see cref="FormatName"/>.</summary>
    public string Format { get; init; } = FormatName;

    /// <summary><c>starting</c>, <c>running</c>, <c>stopping</c> or <c>stopped</c>.</summary>
    public required string State { get; init; }

    /// <summary>The daemon's process id.</summary>
    public required int ProcessId { get; init; }

    /// <summary>The computer's name.</summary>
    public required string Host { get; init; }

    /// <summary>When the daemon started.</summary>
    public required DateTimeOffset StartedUtc { get; init; }

    /// <summary>When this status was written; a running daemon rewrites it at least every few seconds.</summary>
    public required DateTimeOffset UpdatedUtc { get; init; }

    /// <summary>How often a running daemon rewrites the file at the least, in seconds.</summary>
    public required double HeartbeatSeconds { get; init; }

    /// <summary>The bench's name.</summary>
    public required string Bench { get; init; }

    /// <summary>The result database.</summary>
    public required string Database { get; init; }

    /// <summary>The inbox folder.</summary>
    public required string Inbox { get; init; }

    /// <summary>Plans waiting their turn, oldest first.</summary>
    public IReadOnlyList<JobStatus> Queue { get; init; } = [];

    /// <summary>Plans running now.</summary>
    public IReadOnlyList<JobStatus> Running { get; init; } = [];

    /// <summary>Every bench instrument and its health.</summary>
    public IReadOnlyList<InstrumentStatus> Instruments { get; init; } = [];

    /// <summary>The schedules.</summary>
    public IReadOnlyList<ScheduleStatus> Schedules { get; init; } = [];

    /// <summary>The most recently finished jobs, newest first (at most 20).</summary>
    public IReadOnlyList<FinishedJobStatus> Recent { get; init; } = [];
}
