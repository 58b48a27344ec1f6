using BenchRunner.Core.Quantities;

namespace BenchRunner.Instruments.Capabilities;

/// <summary>A spectrum analyser's settings.</summary>
/// <param name="Span">The swept range (start and stop both included).</param>
/// <param name="ResolutionBandwidth">RBW.</param>
/// <param name="InputAttenuation">Input attenuation in dB (not negative).</param>
/// <param name="ReferenceLevel">The level at the top of the screen.</param>
/// <param name="Points">Trace points, where the instrument lets it be chosen.</param>
public sealed record SpectrumSettings(
    FrequencyRange Span,
    Frequency ResolutionBandwidth,
    Ratio InputAttenuation,
    Level ReferenceLevel,
    int? Points = null);
