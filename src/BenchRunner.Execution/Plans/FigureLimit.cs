using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Execution.Plans;

/// <summary>
/// A limit on one figure of a trace, in the figure's own unit (<see cref="FigureKey.Unit"/>): at
/// least <see cref="Min"/>, at most <see cref="Max"/>. A target with a tolerance is stored as both
/// ends and keeps the target for display.
/// </summary>
/// <param name="Key">The figure, e.g. <see cref="FigureKeys.CentreFrequency"/>.</param>
/// <param name="Min">The lowest value that passes, or null.</param>
/// <param name="Max">The highest value that passes, or null.</param>
/// <param name="Target">The target, when the limit was given as target ± tolerance.</param>
/// <param name="Location">Where the limit is written.</param>
public sealed record FigureLimit(FigureKey Key, double? Min, double? Max, double? Target, SourceLocation Location)
{
    /// <summary>The unit of the limit's values, the figure's.</summary>
    public QuantityUnit Unit => Key.Unit;

    /// <summary>True when <paramref name="value"/> is inside the limit.</summary>
    public bool Passes(double value) => (Min is not { } lo || value >= lo) && (Max is not { } hi || value <= hi);
}
