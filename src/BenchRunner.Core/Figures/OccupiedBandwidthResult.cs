using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Figures;

/// <summary>The band holding a given share of a spectrum's total power.</summary>
/// <param name="Share">The share of the total power inside the band, e.g. 0.99.</param>
/// <param name="Lower">The lower edge: (1 − share)/2 of the power lies below it.</param>
/// <param name="Upper">The upper edge: (1 − share)/2 of the power lies above it.</param>
/// <param name="Width">Upper − lower.</param>
/// <param name="Centre">The mean of the two edges.</param>
public sealed record OccupiedBandwidthResult(
    double Share,
    Frequency Lower,
    Frequency Upper,
    Frequency Width,
    Frequency Centre);
