using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Execution.Plans;

/// <summary>A figure a plan may check: its key (from <see cref="Core.Figures.FigureKeys"/>) and the traces it applies to.</summary>
/// <param name="Key">The figure, e.g. <see cref="FigureKeys.CentreFrequency"/>.</param>
/// <param name="OfSpectrum">True for figures of a spectrum analyser's power trace, false for an S-parameter trace's.</param>
/// <param name="S21Only">True for figures computed only for S21 (unloaded Q).</param>
public sealed record FigureDefinition(FigureKey Key, bool OfSpectrum, bool S21Only = false)
{
    /// <summary>The figure's unit, the key's.</summary>
    public QuantityUnit Unit => Key.Unit;
}
