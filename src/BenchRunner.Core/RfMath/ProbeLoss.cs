using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.RfMath;

/// <summary>
/// A resistive probe: a series resistor R in front of an input of impedance Z0 (50 Ω when none
/// is given) forms a divider with voltage loss 20·log10((R + Z0)/Z0), ignoring the source impedance.
/// </summary>
public static class ProbeLoss
{
    /// <summary>The loss of a series-resistor probe: 20·log10((R + Z0)/Z0), in positive dB.</summary>
    /// <param name="seriesResistance">The probe's series resistor R.</param>
    /// <param name="systemImpedance">The input impedance Z0; 50 Ω when null.</param>
    /// <exception cref="ArgumentOutOfRangeException">Z0 is zero.</exception>
    public static Ratio LossOf(Resistance seriesResistance, Resistance? systemImpedance = null)
    {
        var z0 = SystemImpedance.OhmsOrDefault(systemImpedance, nameof(systemImpedance));
        return Ratio.FromDecibels(20 * Math.Log10((seriesResistance.Ohms + z0) / z0));
    }

    /// <summary>The series resistor for a wanted loss: R = Z0·(10^(loss/20) − 1).</summary>
    /// <param name="loss">The wanted loss, at least 0 dB.</param>
    /// <param name="systemImpedance">The input impedance Z0; 50 Ω when null.</param>
    /// <exception cref="ArgumentOutOfRangeException">The loss is negative or needs an infinite resistor, or Z0 is zero.</exception>
    public static Resistance ResistanceFor(Ratio loss, Resistance? systemImpedance = null)
    {
        if (loss.Decibels < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(loss), loss.Decibels, "A series resistor cannot give a negative loss (a gain).");
        }

        var z0 = SystemImpedance.OhmsOrDefault(systemImpedance, nameof(systemImpedance));
        var ohms = z0 * (loss.VoltageRatio - 1);
        if (!double.IsFinite(ohms))
        {
            throw new ArgumentOutOfRangeException(nameof(loss), loss.Decibels, "The loss is too large for a finite resistor.");
        }

        return Resistance.FromOhms(ohms);
    }
}
