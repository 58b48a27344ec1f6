using System.Globalization;
using BenchRunner.Core.Validity;

namespace BenchRunner.Core.Validity;

/// <summary>The words for overload verdicts: for people (<see cref="Describe"/>) and for JSON and the result file (<see cref="Key"/>).</summary>
public static class OverloadWords
{
    /// <summary>For people: <c>real</c>, <c>analyser-made (2nd order)</c>, <c>undecided (hidden by noise)</c>...</summary>
    public static string Describe(OverloadClass verdict) => verdict switch
    {
        OverloadClass.Real => "real",
        OverloadClass.AnalyserSecondOrder => "analyser-made (2nd order)",
        OverloadClass.AnalyserThirdOrder => "analyser-made (3rd order)",
        OverloadClass.VanishedAnalyserMade => "analyser-made (vanished)",
        OverloadClass.ChangedOtherwise => "undecided (changed otherwise)",
        OverloadClass.HiddenByNoise => "undecided (hidden by noise)",
        _ => throw new ArgumentOutOfRangeException(nameof(verdict), verdict, "Not an overload class."),
    };

    /// <summary>For JSON and the stored detail: <c>real</c>, <c>analyser_second_order</c>, <c>analyser_third_order</c>, <c>vanished_analyser_made</c>, <c>changed_otherwise</c>, <c>hidden_by_noise</c>.</summary>
    public static string Key(OverloadClass verdict) => verdict switch
    {
        OverloadClass.Real => "real",
        OverloadClass.AnalyserSecondOrder => "analyser_second_order",
        OverloadClass.AnalyserThirdOrder => "analyser_third_order",
        OverloadClass.VanishedAnalyserMade => "vanished_analyser_made",
        OverloadClass.ChangedOtherwise => "changed_otherwise",
        OverloadClass.HiddenByNoise => "hidden_by_noise",
        _ => throw new ArgumentOutOfRangeException(nameof(verdict), verdict, "Not an overload class."),
    };

    /// <summary>How a line's level moved, for people: <c>+0.3 dB</c>, <c>-10.0 dB</c>, or <c>gone</c> when it was not found again.</summary>
    public static string Change(double? changeDb) =>
        changeDb is { } c ? c.ToString("+0.0;-0.0;0.0", CultureInfo.InvariantCulture) + " dB" : "gone";
}
