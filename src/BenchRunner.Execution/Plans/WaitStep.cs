using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Execution.Plans;

/// <summary><c>wait</c>: a pause, e.g. for a device to warm up or settle.</summary>
/// <param name="Name">The step's name, or null.</param>
/// <param name="Location">Where the step starts.</param>
/// <param name="Duration">How long.</param>
public sealed record WaitStep(string? Name, SourceLocation Location, TimeSpan Duration) : PlanStep(Name, Location)
{
    /// <inheritdoc />
    public override StepKind Kind => StepKinds.Wait;
}
