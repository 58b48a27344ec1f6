using System.Numerics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.RfMath;

namespace BenchRunner.Simulator.Circuits;

/// <summary>
/// A capacitor with its parasitics in series: Z = ESR + j·(ω·ESL − 1/(ω·C)). With an ESL it is a
/// series resonator: capacitive below its self-resonance 1/(2π·√(ESL·C)), purely ESR at it, and
/// inductive above, which is why a filter's rejection comes back up at high frequency.
/// </summary>
public sealed class Capacitor : TwoTerminal
{
    /// <summary>Creates a capacitor.</summary>
    /// <param name="farads">C in farads, finite and above zero.</param>
    /// <param name="esrOhms">Equivalent series resistance in ohms, not negative; 0 by default.</param>
    /// <param name="eslHenries">Equivalent series inductance in henries, not negative; 0 by default.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value out of its range.</exception>
    public Capacitor(double farads, double esrOhms = 0, double eslHenries = 0)
    {
        Farads = Require.Positive(farads, nameof(farads));
        EsrOhms = Require.NotNegative(esrOhms, nameof(esrOhms));
        EslHenries = Require.NotNegative(eslHenries, nameof(eslHenries));
    }

    /// <summary>C in farads.</summary>
    public double Farads { get; }

    /// <summary>The equivalent series resistance in ohms.</summary>
    public double EsrOhms { get; }

    /// <summary>The equivalent series inductance in henries.</summary>
    public double EslHenries { get; }

    /// <summary>The series self-resonance 1/(2π·√(ESL·C)); null without an ESL.</summary>
    public Frequency? SelfResonantFrequency =>
        EslHenries > 0 ? Resonance.ResonantFrequency(EslHenries, Farads) : null;

    /// <inheritdoc/>
    public override Complex ImpedanceAt(double hertz)
    {
        double omega = Omega(hertz);
        return new Complex(EsrOhms, omega * EslHenries - 1 / (omega * Farads));
    }
}
