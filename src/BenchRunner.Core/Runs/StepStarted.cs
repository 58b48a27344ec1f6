namespace BenchRunner.Core.Runs;

/// <summary>A step began.</summary>
/// <param name="At">When.</param>
/// <param name="Step">The step's name, or its kind when it has none.</param>
/// <param name="Kind">The step's word in the plan file (e.g. <c>sweep</c>).</param>
/// <param name="DrivesInstrument">Whether the step sets or reads an instrument (a gentle stop lets such a step finish).</param>
public sealed record StepStarted(DateTimeOffset At, string Step, string Kind, bool DrivesInstrument = false) : RunEvent(At);
