namespace BenchRunner.Execution.Running;

/// <summary>A step began.</summary>
/// <param name="At">When.</param>
/// <param name="Step">The step's name, or its kind when it has none.</param>
/// <param name="Kind">The step's keyword in the plan file (e.g. <c>sweep</c>).</param>
public sealed record StepStarted(DateTimeOffset At, string Step, string Kind) : RunEvent(At);
