using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.RfMath;

/// <summary>
/// An ideal LC resonator: f0 = 1/(2π·√(L·C)), hence L = 1/(ω0²·C) and C = 1/(ω0²·L) with
/// ω0 = 2π·f0; reactances X_L = ω·L and X_C = −1/(ω·C), in ohms.
/// </summary>
public static class Resonance
{
    /// <summary>The resonant frequency f0 = 1/(2π·√(L·C)).</summary>
    /// <param name="inductanceHenries">L in henries, above zero.</param>
    /// <param name="capacitanceFarads">C in farads, above zero.</param>
    /// <exception cref="ArgumentOutOfRangeException">L or C is not finite and positive.</exception>
    public static Frequency ResonantFrequency(double inductanceHenries, double capacitanceFarads)
    {
        var lc = Guard.Positive(inductanceHenries, nameof(inductanceHenries)) * Guard.Positive(capacitanceFarads, nameof(capacitanceFarads));
        return Frequency.FromHertz(1 / (2 * Math.PI * Math.Sqrt(lc)));
    }

    /// <summary>The inductance that resonates with <paramref name="capacitanceFarads"/> at <paramref name="resonance"/>: L = 1/(ω0²·C), in henries.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The frequency is zero, or C is not finite and positive.</exception>
    public static double InductanceHenriesFor(Frequency resonance, double capacitanceFarads)
    {
        var omega = AngularFrequency(resonance, nameof(resonance));
        return 1 / (omega * omega * Guard.Positive(capacitanceFarads, nameof(capacitanceFarads)));
    }

    /// <summary>The capacitance that resonates with <paramref name="inductanceHenries"/> at <paramref name="resonance"/>: C = 1/(ω0²·L), in farads.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The frequency is zero, or L is not finite and positive.</exception>
    public static double CapacitanceFaradsFor(Frequency resonance, double inductanceHenries)
    {
        var omega = AngularFrequency(resonance, nameof(resonance));
        return 1 / (omega * omega * Guard.Positive(inductanceHenries, nameof(inductanceHenries)));
    }

    /// <summary>The reactance of an inductor: X_L = ω·L, in ohms (positive).</summary>
    /// <exception cref="ArgumentOutOfRangeException">L is negative or not finite.</exception>
    public static double InductiveReactanceOhms(Frequency frequency, double inductanceHenries) =>
        2 * Math.PI * frequency.Hertz * Guard.NotNegative(inductanceHenries, nameof(inductanceHenries));

    /// <summary>The reactance of a capacitor: X_C = −1/(ω·C), in ohms (negative).</summary>
    /// <exception cref="ArgumentOutOfRangeException">The frequency is zero, or C is not finite and positive.</exception>
    public static double CapacitiveReactanceOhms(Frequency frequency, double capacitanceFarads) =>
        -1 / (AngularFrequency(frequency, nameof(frequency)) * Guard.Positive(capacitanceFarads, nameof(capacitanceFarads)));

    private static double AngularFrequency(Frequency frequency, string paramName) =>
        2 * Math.PI * Guard.Positive(frequency.Hertz, paramName);
}
