using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Execution.Plans;

/// <summary><c>set-generator</c>: the frequency, level and output of a signal generator; what is left out is kept.</summary>
/// <param name="Name">The step's name, or null.</param>
/// <param name="Location">Where the step starts.</param>
/// <param name="Role">The generator's role.</param>
/// <param name="Frequency">The output frequency, or null.</param>
/// <param name="Level">The output level, or null.</param>
/// <param name="Output">True to switch the output on, false for off, null to leave it.</param>
/// <param name="LevelLocation">Where the level is written (for the safety pre-check's message).</param>
public sealed record GeneratorSetup(string? Name, SourceLocation Location, string Role,
    Frequency? Frequency, Level? Level, bool? Output, SourceLocation LevelLocation) : PlanStep(Name, Location)
{
    /// <inheritdoc />
    public override StepKind Kind => StepKinds.SetGenerator;
}
