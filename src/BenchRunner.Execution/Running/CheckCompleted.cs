namespace BenchRunner.Execution.Running;

/// <summary>A check was evaluated.</summary>
/// <param name="At">When.</param>
/// <param name="Result">Its result.</param>
public sealed record CheckCompleted(DateTimeOffset At, CheckResult Result) : RunEvent(At);
