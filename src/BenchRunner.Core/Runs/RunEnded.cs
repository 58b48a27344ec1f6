namespace BenchRunner.Core.Runs;

/// <summary>The run ended; no event follows.</summary>
/// <param name="At">When.</param>
/// <param name="Status">Passed, failed, error or stopped.</param>
/// <param name="Error">Why it ended in error or was stopped, or null.</param>
public sealed record RunEnded(DateTimeOffset At, RunStatus Status, string? Error) : RunEvent(At);
