using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Execution.Plans;

/// <summary>
/// <c>repeat</c>: a block of steps run <see cref="Times"/> times, or until <see cref="Until"/>
/// holds after a pass but never more than <see cref="AtMost"/> passes.
/// </summary>
/// <param name="Name">The step's name, or null.</param>
/// <param name="Location">Where the step starts.</param>
/// <param name="Times">The fixed number of passes, or null with a condition.</param>
/// <param name="Until">The condition checked after each pass, or null with a count.</param>
/// <param name="AtMost">The cap on passes: the count itself, or the cap of a conditional repeat.</param>
/// <param name="Steps">The block.</param>
public sealed record RepeatStep(string? Name, SourceLocation Location, int? Times, FigureCondition? Until, int AtMost,
    IReadOnlyList<PlanStep> Steps) : PlanStep(Name, Location)
{
    /// <inheritdoc />
    public override StepKind Kind => StepKinds.Repeat;
}
