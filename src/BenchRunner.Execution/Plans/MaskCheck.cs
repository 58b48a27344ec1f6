using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Masks;

namespace BenchRunner.Execution.Plans;

/// <summary><c>check-mask</c>: a named trace against a limit mask.</summary>
/// <param name="Name">The step's name, or null.</param>
/// <param name="Location">Where the step starts.</param>
/// <param name="Trace">The name of the trace checked.</param>
/// <param name="Mask">The mask.</param>
/// <param name="MaskPath">The mask file as the plan names it, or null for a mask written inline.</param>
public sealed record MaskCheck(string? Name, SourceLocation Location, string Trace, LimitMask Mask, string? MaskPath)
    : PlanStep(Name, Location)
{
    /// <inheritdoc />
    public override StepKind Kind => StepKinds.CheckMask;
}
