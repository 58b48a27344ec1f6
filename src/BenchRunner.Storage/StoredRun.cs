using BenchRunner.Core.Runs;
namespace BenchRunner.Storage;

/// <summary>A run as the file holds it.</summary>
/// <param name="Id">The run's id.</param>
/// <param name="Record">What was given when it started.</param>
/// <param name="PlanSha256">The SHA-256 of the plan text, 64 lower-case hex digits.</param>
/// <param name="Status">Where the run stands.</param>
/// <param name="StartedUtc">When it started (UTC, whole milliseconds).</param>
/// <param name="EndedUtc">When it ended; null while running.</param>
/// <param name="ErrorMessage">Why it ended in error or was interrupted; otherwise usually null.</param>
public sealed record StoredRun(
    long Id,
    RunRecord Record,
    string PlanSha256,
    RunStatus Status,
    DateTimeOffset StartedUtc,
    DateTimeOffset? EndedUtc,
    string? ErrorMessage);
