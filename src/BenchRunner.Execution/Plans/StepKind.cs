namespace BenchRunner.Execution.Plans;

/// <summary>
/// A kind of plan step: its word in the plan file and what the runner must know of it without
/// knowing the step itself. Built-in kinds are in <see cref="StepKinds"/>.
/// </summary>
/// <param name="Word">The step's word in the plan file, e.g. <c>sweep</c>.</param>
/// <param name="DrivesInstrument">
/// Whether the step sets or reads an instrument. A gentle stop (the daemon stopping, a time limit)
/// lets such a step finish, so a sweep in flight is completed and kept; any other step ends at once.
/// </param>
public sealed record StepKind(string Word, bool DrivesInstrument)
{
    /// <summary>
    /// Reads a step of this kind from a plan file, or null for the built-in kinds (the plan reader
    /// knows them). A reader adds every problem to <see cref="StepReading.Problems"/> and returns null
    /// rather than throwing. A kind with a reader joins a plan vocabulary with <see cref="PlanVocabulary.WithStep"/>.
    /// </summary>
    public Func<StepReading, PlanStep?>? Read { get; init; }

    /// <inheritdoc/>
    public override string ToString() => Word;
}
