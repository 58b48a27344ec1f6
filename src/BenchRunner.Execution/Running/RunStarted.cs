namespace BenchRunner.Execution.Running;

/// <summary>The run began: it is recorded (when there is a store) and its instruments are about to be connected.</summary>
/// <param name="At">When.</param>
/// <param name="RunId">The run's id in the result store, or null when nothing is recorded.</param>
/// <param name="PlanName">The plan's name.</param>
public sealed record RunStarted(DateTimeOffset At, long? RunId, string PlanName) : RunEvent(At);
