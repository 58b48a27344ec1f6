namespace BenchRunner.Daemon.Scheduling;

/// <summary>A run a schedule started.</summary>
/// <param name="JobId">The job's id.</param>
/// <param name="Completion">Completes when the job has ended, however it ended.</param>
internal sealed record ScheduledRun(string JobId, Task Completion);
