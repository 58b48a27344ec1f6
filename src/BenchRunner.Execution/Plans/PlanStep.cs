using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Execution.Plans;

/// <summary>One step of a test plan. Each kind of step is a record deriving from this one.</summary>
/// <param name="Name">The step's name, unique in the plan, or null.</param>
/// <param name="Location">Where the step starts in the plan file.</param>
public abstract record PlanStep(string? Name, SourceLocation Location)
{
    /// <summary>What kind of step it is.</summary>
    public abstract StepKind Kind { get; }

    /// <summary>The step's word in the plan file, e.g. <c>sweep</c>.</summary>
    public string Word => Kind.Word;
}
