using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Figures;

/// <summary>The band between the first crossings of (peak − N dB) on either side of the peak.</summary>
/// <param name="BelowPeakDb">N: how far below the peak level the edges were taken, in dB.</param>
/// <param name="Lower">The lower crossing.</param>
/// <param name="Upper">The upper crossing.</param>
/// <param name="Width">Upper − lower.</param>
/// <param name="Centre">The mean of the two crossings.</param>
/// <param name="LoadedQ">Centre / width (unitless).</param>
public sealed record BandwidthResult(
    double BelowPeakDb,
    Frequency Lower,
    Frequency Upper,
    Frequency Width,
    Frequency Centre,
    double LoadedQ);
