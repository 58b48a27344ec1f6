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
    /// <inheritdoc/>
    public override string ToString() => Word;
}
