using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Execution.Plans;

/// <summary><c>message</c>: text shown to the operator, e.g. "connect the board".</summary>
/// <param name="Name">The step's name, or null.</param>
/// <param name="Location">Where the step starts.</param>
/// <param name="Text">The message.</param>
public sealed record MessageStep(string? Name, SourceLocation Location, string Text) : PlanStep(Name, Location)
{
    /// <inheritdoc />
    public override StepKind Kind => StepKinds.Message;
}
