using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Figures;

/// <summary>Bandwidth estimates for modulated signals.</summary>
public static class ModulationFigures
{
    /// <summary>
    /// Carson's rule for frequency modulation: B = 2(Δf + fm), the band holding nearly all of
    /// the signal's power.
    /// </summary>
    /// <param name="peakDeviation">The peak frequency deviation Δf.</param>
    /// <param name="highestModulatingFrequency">The highest modulating frequency fm.</param>
    public static Frequency CarsonBandwidth(Frequency peakDeviation, Frequency highestModulatingFrequency) =>
        Frequency.FromHertz(2 * (peakDeviation.Hertz + highestModulatingFrequency.Hertz));
}
