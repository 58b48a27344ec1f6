using BenchRunner.Core.Quantities;
using BenchRunner.Core.Validity;

namespace BenchRunner.Core.Runs;

/// <summary>One line an overload check judged: where, how strong, what it is and whether the analyser made it.</summary>
/// <param name="Frequency">Where it was found at the lower attenuation.</param>
/// <param name="LevelDbm">Its level at the lower attenuation (at the probed point when compensated), dBm.</param>
/// <param name="ChangeDb">How its corrected level moved when the attenuation was raised; null when it was not found again.</param>
/// <param name="Class">The verdict on it.</param>
/// <param name="Label">What it is by frequency (<c>carrier 1</c>, <c>H2 of carrier 1</c>, <c>2f1-f2</c>, <c>unidentified</c>).</param>
/// <param name="RelativeDbc">Its level relative to its carrier, dBc; null when unidentified or no carriers were named.</param>
/// <param name="Relied">True when the plan relies on this line (it is one of the step's <c>lines</c>, or the step names none).</param>
public sealed record JudgedLine(Frequency Frequency, double LevelDbm, double? ChangeDb, OverloadClass Class, string Label, double? RelativeDbc, bool Relied)
{
    /// <summary>True when the analyser made it.</summary>
    public bool IsAnalyserMade => Class is OverloadClass.AnalyserSecondOrder or OverloadClass.AnalyserThirdOrder or OverloadClass.VanishedAnalyserMade;

    /// <summary>The verdict in words, e.g. <c>analyser-made (3rd order)</c>.</summary>
    public string Verdict => OverloadWords.Describe(Class);
}
