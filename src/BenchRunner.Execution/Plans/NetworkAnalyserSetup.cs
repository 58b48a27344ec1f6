using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Execution.Plans;

/// <summary><c>set-network-analyser</c>: the sweep of a network analyser.</summary>
/// <param name="Name">The step's name, or null.</param>
/// <param name="Location">Where the step starts.</param>
/// <param name="Role">The network analyser's role.</param>
/// <param name="Start">The first frequency.</param>
/// <param name="Stop">The last frequency, above <paramref name="Start"/>.</param>
/// <param name="Points">The number of points, 2 to 100001.</param>
/// <param name="IfBandwidth">The IF bandwidth, or null to keep the instrument's.</param>
public sealed record NetworkAnalyserSetup(string? Name, SourceLocation Location, string Role,
    Frequency Start, Frequency Stop, int Points, Frequency? IfBandwidth) : PlanStep(Name, Location)
{
    /// <inheritdoc />
    public override StepKind Kind => StepKinds.SetNetworkAnalyser;
}
