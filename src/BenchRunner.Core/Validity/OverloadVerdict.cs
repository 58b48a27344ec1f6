using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Validity;

/// <summary>The outcome of an attenuation-step comparison (<see cref="OverloadCheck"/>).</summary>
/// <param name="Step">The attenuation step between the two sweeps.</param>
/// <param name="Peaks">One entry per line above the threshold in the lower-attenuation sweep, by frequency.</param>
/// <param name="NoiseFloorAtHigher">The higher-attenuation sweep's noise floor (median level).</param>
public sealed record OverloadVerdict(Ratio Step, IReadOnlyList<OverloadPeak> Peaks, Level NoiseFloorAtHigher)
{
    /// <summary>What to do when the analyser makes lines of its own.</summary>
    public const string OverloadAdvice = "raise the input attenuation, add an external pad, or filter the carrier before the analyser";

    /// <summary>True when any line is judged to be made in the analyser.</summary>
    public bool AnyAnalyserMade => Peaks.Any(p => p.IsAnalyserMade);

    /// <summary><see cref="OverloadAdvice"/> when <see cref="AnyAnalyserMade"/>; otherwise null.</summary>
    public string? Advice => AnyAnalyserMade ? OverloadAdvice : null;
}
