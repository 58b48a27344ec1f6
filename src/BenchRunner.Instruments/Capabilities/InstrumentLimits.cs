using BenchRunner.Core.Quantities;

namespace BenchRunner.Instruments.Capabilities;

/// <summary>
/// What an instrument declares it can take or give. A null field means "not declared";
/// the runner refuses settings outside the declared limits.
/// </summary>
/// <param name="FrequencyRange">The frequencies it measures or generates.</param>
/// <param name="MaxInputLevel">The highest level its RF input tolerates (analysers).</param>
/// <param name="MaxOutputLevel">The highest level it can produce (generators, analyser test ports).</param>
/// <param name="MinOutputLevel">The lowest level it can produce.</param>
public sealed record InstrumentLimits(
    FrequencyRange? FrequencyRange = null,
    Level? MaxInputLevel = null,
    Level? MaxOutputLevel = null,
    Level? MinOutputLevel = null)
{
    /// <summary>No declared limits.</summary>
    public static InstrumentLimits None { get; } = new();
}
