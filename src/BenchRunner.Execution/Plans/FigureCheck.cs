using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Execution.Plans;

/// <summary><c>check-figures</c>: figures of a named trace against limits.</summary>
/// <param name="Name">The step's name, or null.</param>
/// <param name="Location">Where the step starts.</param>
/// <param name="Trace">The name of the trace whose figures are checked.</param>
/// <param name="Limits">One limit per figure.</param>
public sealed record FigureCheck(string? Name, SourceLocation Location, string Trace, IReadOnlyList<FigureLimit> Limits)
    : PlanStep(Name, Location)
{
    /// <inheritdoc />
    public override StepKind Kind => StepKinds.CheckFigures;
}
