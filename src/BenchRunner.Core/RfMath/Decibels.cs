using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.RfMath;

/// <summary>
/// Conversions between linear ratios and decibels.
/// Power: dB = 10·log10(P2/P1). Voltage (amplitude, same impedance): dB = 20·log10(V2/V1).
/// </summary>
public static class Decibels
{
    /// <summary>A power ratio in decibels: 10·log10(<paramref name="powerRatio"/>).</summary>
    /// <exception cref="ArgumentOutOfRangeException">The ratio is NaN, infinite, zero or negative.</exception>
    public static Ratio FromPowerRatio(double powerRatio) =>
        Ratio.FromDecibels(10 * Math.Log10(Guard.Positive(powerRatio, nameof(powerRatio))));

    /// <summary>A voltage ratio in decibels: 20·log10(<paramref name="voltageRatio"/>).</summary>
    /// <exception cref="ArgumentOutOfRangeException">The ratio is NaN, infinite, zero or negative.</exception>
    public static Ratio FromVoltageRatio(double voltageRatio) =>
        Ratio.FromDecibels(20 * Math.Log10(Guard.Positive(voltageRatio, nameof(voltageRatio))));

    /// <summary>The power ratio of <paramref name="ratio"/>: 10^(dB/10).</summary>
    public static double ToPowerRatio(Ratio ratio) => ratio.PowerRatio;

    /// <summary>The voltage ratio of <paramref name="ratio"/>: 10^(dB/20).</summary>
    public static double ToVoltageRatio(Ratio ratio) => ratio.VoltageRatio;
}
