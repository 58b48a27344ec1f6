using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Execution.Plans;

/// <summary><c>set-spectrum-analyser</c>: the span and the settings of a spectrum analyser.</summary>
/// <param name="Name">The step's name, or null.</param>
/// <param name="Location">Where the step starts.</param>
/// <param name="Role">The spectrum analyser's role.</param>
/// <param name="Start">The lower edge of the span.</param>
/// <param name="Stop">The upper edge of the span, above <paramref name="Start"/>.</param>
/// <param name="Rbw">The resolution bandwidth, or null to keep the instrument's.</param>
/// <param name="Attenuation">The input attenuation, or null to keep the instrument's.</param>
/// <param name="ReferenceLevel">The reference level, or null to keep the instrument's.</param>
/// <remarks>A span given as centre and width is stored as its two edges.</remarks>
public sealed record SpectrumAnalyserSetup(string? Name, SourceLocation Location, string Role,
    Frequency Start, Frequency Stop, Frequency? Rbw, Ratio? Attenuation, Level? ReferenceLevel) : PlanStep(Name, Location)
{
    /// <inheritdoc />
    public override StepKind Kind => StepKinds.SetSpectrumAnalyser;
}
