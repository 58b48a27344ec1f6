using BenchRunner.Core.Figures;
using BenchRunner.Core.Traces;
using static BenchRunner.Core.Figures.FigureKeys;

namespace BenchRunner.Execution.Plans;

/// <summary>
/// The figures a plan may check and the traces each applies to: the keys <c>FigureSummary.ForFilter</c>
/// and <c>FigureSummary.ForSpectrum</c> report (a test keeps the two lists in step).
/// </summary>
public static class FigureCatalogue
{
    /// <summary>Every figure.</summary>
    public static readonly IReadOnlyList<FigureDefinition> All =
    [
        new(PeakFrequency, false), new(PeakLevel, false), new(Bandwidth3Db, false),
        new(CentreFrequency, false), new(LoadedQ, false), new(InsertionLoss, false),
        new(Lower3Db, false), new(Upper3Db, false), new(Bandwidth1Db, false),
        new(ShapeFactor60To3, false), new(UnloadedQ, false, S21Only: true),
        new(PeakFrequency, true), new(PeakPower, true), new(NoiseFloor, true),
        new(OccupiedBandwidth, true), new(OccupiedLower, true), new(OccupiedUpper, true),
    ];

    /// <summary>The figures of a trace of <paramref name="quantity"/>.</summary>
    public static IEnumerable<FigureDefinition> For(TraceQuantity quantity) =>
        All.Where(f => f.OfSpectrum == (quantity == TraceQuantity.Power) && (!f.S21Only || quantity == TraceQuantity.S21));

    /// <summary>The figure stored as <paramref name="word"/> of a trace of <paramref name="quantity"/>, or null.</summary>
    public static FigureDefinition? Find(string word, TraceQuantity quantity) => For(quantity).FirstOrDefault(f => f.Key.Word == word);

    /// <summary>The figure stored as <paramref name="word"/> of any kind of trace, or null when no trace has it.</summary>
    public static FigureDefinition? FindAny(string word) => All.FirstOrDefault(f => f.Key.Word == word);
}
