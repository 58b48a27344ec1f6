namespace BenchRunner.Core.Runs;

/// <summary>The plan (or the runner) has something to tell the operator.</summary>
/// <param name="At">When.</param>
/// <param name="Text">The message.</param>
public sealed record OperatorMessage(DateTimeOffset At, string Text) : RunEvent(At);
