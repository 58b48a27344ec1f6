using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.RfMath;

/// <summary>
/// Power levels as watts and as sine-wave voltages across a resistive impedance R (50 Ω when
/// none is given): P[W] = 10^(dBm/10)·1 mW, Vrms = √(P·R), Vpeak = √2·Vrms,
/// dBµV = 20·log10(Vrms / 1 µV). Hence dBµV = dBm + 10·log10(R / 1 Ω) + 90
/// (1 mW·1 Ω = 10⁻³ V², and 1 V = 120 dBµV), i.e. +106.99 dB into 50 Ω.
/// </summary>
public static class PowerConversion
{
    /// <summary>The power of <paramref name="level"/> in watts (the same as <see cref="Level.Watts"/>).</summary>
    public static double ToWatts(Level level) => level.Watts;

    /// <summary>The level of a power in watts (the same as <see cref="Level.FromWatts"/>).</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not a finite positive power.</exception>
    public static Level FromWatts(double watts) => Level.FromWatts(watts);

    /// <summary>The rms voltage of <paramref name="level"/> across <paramref name="impedance"/>: Vrms = √(P·R), in volts.</summary>
    /// <param name="level">The power level.</param>
    /// <param name="impedance">The load resistance; 50 Ω when null.</param>
    /// <exception cref="ArgumentOutOfRangeException">The impedance is zero.</exception>
    public static double ToVoltsRms(Level level, Resistance? impedance = null) =>
        Math.Sqrt(level.Watts * SystemImpedance.OhmsOrDefault(impedance, nameof(impedance)));

    /// <summary>The level of an rms voltage across <paramref name="impedance"/>: P = Vrms²/R.</summary>
    /// <param name="voltsRms">The rms voltage in volts, above zero.</param>
    /// <param name="impedance">The load resistance; 50 Ω when null.</param>
    /// <exception cref="ArgumentOutOfRangeException">The voltage is not finite and positive, or the impedance is zero.</exception>
    public static Level FromVoltsRms(double voltsRms, Resistance? impedance = null)
    {
        Guard.Positive(voltsRms, nameof(voltsRms));
        var ohms = SystemImpedance.OhmsOrDefault(impedance, nameof(impedance));
        // In dB, so that tiny or huge voltages do not underflow or overflow when squared.
        return Level.FromDbm(20 * Math.Log10(voltsRms) - 10 * Math.Log10(ohms) + 30);
    }

    /// <summary>The peak voltage of a sine wave at <paramref name="level"/>: Vpeak = √2·Vrms, in volts.</summary>
    /// <param name="level">The power level.</param>
    /// <param name="impedance">The load resistance; 50 Ω when null.</param>
    /// <exception cref="ArgumentOutOfRangeException">The impedance is zero.</exception>
    public static double ToVoltsPeak(Level level, Resistance? impedance = null) =>
        Math.Sqrt(2) * ToVoltsRms(level, impedance);

    /// <summary>The level of a sine wave with peak voltage <paramref name="voltsPeak"/>: Vrms = Vpeak/√2.</summary>
    /// <param name="voltsPeak">The peak voltage in volts, above zero.</param>
    /// <param name="impedance">The load resistance; 50 Ω when null.</param>
    /// <exception cref="ArgumentOutOfRangeException">The voltage is not finite and positive, or the impedance is zero.</exception>
    public static Level FromVoltsPeak(double voltsPeak, Resistance? impedance = null) =>
        FromVoltsRms(Guard.Positive(voltsPeak, nameof(voltsPeak)) / Math.Sqrt(2), impedance);

    /// <summary>The rms voltage of <paramref name="level"/> in dBµV (decibels above 1 µV): dBm + <see cref="DbMicrovoltOffset"/>.</summary>
    /// <param name="level">The power level.</param>
    /// <param name="impedance">The load resistance; 50 Ω when null.</param>
    /// <exception cref="ArgumentOutOfRangeException">The impedance is zero.</exception>
    public static double ToDbMicrovolts(Level level, Resistance? impedance = null) =>
        level.Dbm + DbMicrovoltOffset(impedance).Decibels;

    /// <summary>The level of a voltage given in dBµV: dBm = dBµV − <see cref="DbMicrovoltOffset"/>.</summary>
    /// <param name="dbMicrovolts">The rms voltage in dBµV.</param>
    /// <param name="impedance">The load resistance; 50 Ω when null.</param>
    /// <exception cref="ArgumentOutOfRangeException">The value is not finite, or the impedance is zero.</exception>
    public static Level FromDbMicrovolts(double dbMicrovolts, Resistance? impedance = null) =>
        Level.FromDbm(Guard.Finite(dbMicrovolts, nameof(dbMicrovolts)) - DbMicrovoltOffset(impedance).Decibels);

    /// <summary>
    /// dBµV − dBm for a given impedance: 10·log10(R / 1 Ω) + 90 dB, since
    /// Vrms² = P·R = 10⁻³ V²·10^(dBm/10)·R and 1 V = 10⁶ µV. About 106.99 dB for 50 Ω.
    /// </summary>
    /// <param name="impedance">The load resistance; 50 Ω when null.</param>
    /// <exception cref="ArgumentOutOfRangeException">The impedance is zero.</exception>
    public static Ratio DbMicrovoltOffset(Resistance? impedance = null)
    {
        var ohms = SystemImpedance.OhmsOrDefault(impedance, nameof(impedance));
        // 20·log10(1e6 µV/V) = 120 dB, 10·log10(1e-3 W/mW) = −30 dB.
        return Ratio.FromDecibels(10 * Math.Log10(ohms) - 30 + 120);
    }
}
