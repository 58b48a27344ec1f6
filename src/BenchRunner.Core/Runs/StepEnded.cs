namespace BenchRunner.Core.Runs;

/// <summary>A step finished (steps that fail or are stopped end with the run instead).</summary>
/// <param name="At">When.</param>
/// <param name="Step">The step's name, or its kind when it has none.</param>
/// <param name="Kind">The step's word in the plan file.</param>
public sealed record StepEnded(DateTimeOffset At, string Step, string Kind) : RunEvent(At);
