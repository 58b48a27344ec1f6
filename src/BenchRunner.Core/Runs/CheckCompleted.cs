namespace BenchRunner.Core.Runs;

/// <summary>A check was judged.</summary>
/// <param name="At">When.</param>
/// <param name="Result">Its result.</param>
public sealed record CheckCompleted(DateTimeOffset At, CheckResult Result) : RunEvent(At);
