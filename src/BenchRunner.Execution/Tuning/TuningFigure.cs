using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Execution.Plans;

namespace BenchRunner.Execution.Tuning;

/// <summary>One figure of a tuning sweep as the operator sees it: value, change since the last sweep, target.</summary>
/// <param name="Key">The figure, e.g. <see cref="FigureKeys.CentreFrequency"/>; <see cref="FigureKeys.MaskMargin"/> for the worst mask margin.</param>
/// <param name="Trace">The trace it belongs to.</param>
/// <param name="Label">A short human label.</param>
/// <param name="Value">Its value in the key's unit, or null when it could not be computed.</param>
/// <param name="Change">Value minus the previous sweep's value; null on the first sweep or when either is missing.</param>
/// <param name="Limit">The plan's limit on it (for the mask margin: at least 0 dB), or null when the plan sets none.</param>
/// <param name="Inside">Whether the value is inside <paramref name="Limit"/>; null when there is no limit.</param>
public sealed record TuningFigure(FigureKey Key, string Trace, string Label, double? Value, double? Change,
    FigureLimit? Limit, bool? Inside)
{
    /// <summary>The unit of <see cref="Value"/> and <see cref="Change"/>, the key's.</summary>
    public QuantityUnit Unit => Key.Unit;
}
