using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Validity;

/// <summary>One line of the lower-attenuation sweep and what raising the attenuation did to it.</summary>
/// <param name="Frequency">Where it was found in the lower-attenuation sweep.</param>
/// <param name="LevelAtLowerDbm">Its corrected level at the lower attenuation, dBm.</param>
/// <param name="LevelAtHigherDbm">The matched line's corrected level at the higher attenuation, dBm; null when none matched.</param>
/// <param name="ChangeDb">Higher minus lower level in dB; null when none matched.</param>
/// <param name="Class">The verdict on this line.</param>
public sealed record OverloadPeak(Frequency Frequency, double LevelAtLowerDbm, double? LevelAtHigherDbm, double? ChangeDb, OverloadClass Class)
{
    /// <summary>True when the line is judged to be made in the analyser.</summary>
    public bool IsAnalyserMade => Class is OverloadClass.AnalyserSecondOrder or OverloadClass.AnalyserThirdOrder or OverloadClass.VanishedAnalyserMade;
}
