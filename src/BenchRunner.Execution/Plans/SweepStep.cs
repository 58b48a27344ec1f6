using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Execution.Plans;

/// <summary><c>sweep</c>: one sweep of an analyser, acquiring the named traces.</summary>
/// <param name="Name">The step's name, or null.</param>
/// <param name="Location">Where the step starts.</param>
/// <param name="Role">The analyser's role.</param>
/// <param name="Traces">The traces acquired, each with its name.</param>
public sealed record SweepStep(string? Name, SourceLocation Location, string Role, IReadOnlyList<NamedTrace> Traces)
    : PlanStep(Name, Location)
{
    /// <inheritdoc />
    public override StepKind Kind => StepKinds.Sweep;
}
