using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.RfMath;

/// <summary>The reference impedance used when a caller gives none, and its validation.</summary>
internal static class SystemImpedance
{
    /// <summary>The default reference impedance, 50 Ω.</summary>
    public const double DefaultOhms = 50;

    /// <summary>Returns the impedance in ohms, 50 Ω when null.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The impedance is zero.</exception>
    public static double OhmsOrDefault(Resistance? impedance, string paramName)
    {
        var ohms = impedance?.Ohms ?? DefaultOhms;
        if (ohms <= 0)
        {
            throw new ArgumentOutOfRangeException(paramName, ohms, "A reference impedance must be above 0 Ω.");
        }

        return ohms;
    }
}
