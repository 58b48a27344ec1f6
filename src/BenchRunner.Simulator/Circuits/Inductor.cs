using System.Numerics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.RfMath;

namespace BenchRunner.Simulator.Circuits;

/// <summary>
/// An inductor with a finite Q and a self-capacitance: (R + jωL) in parallel with Cp. The loss
/// resistance R follows <see cref="Loss"/>. Above its self-resonance 1/(2π·√(L·Cp)) the part is
/// capacitive.
/// </summary>
public sealed class Inductor : TwoTerminal
{
    private readonly double _lossOhmsPerRootHertz;

    private Inductor(double henries, InductorLoss loss, double q, double lossOhmsPerRootHertz, double selfCapacitanceFarads)
    {
        Henries = henries;
        Loss = loss;
        Q = q;
        _lossOhmsPerRootHertz = lossOhmsPerRootHertz;
        SelfCapacitanceFarads = selfCapacitanceFarads;
    }

    /// <summary>L in henries.</summary>
    public double Henries { get; }

    /// <summary>How the loss depends on frequency.</summary>
    public InductorLoss Loss { get; }

    /// <summary>The Q given when the part was made (ωL/R, ignoring Cp); infinity for an ideal part.</summary>
    public double Q { get; }

    /// <summary>The self-capacitance Cp across the winding, in farads.</summary>
    public double SelfCapacitanceFarads { get; }

    /// <summary>The self-resonance 1/(2π·√(L·Cp)); null without a self-capacitance.</summary>
    public Frequency? SelfResonantFrequency =>
        SelfCapacitanceFarads > 0 ? Resonance.ResonantFrequency(Henries, SelfCapacitanceFarads) : null;

    /// <summary>A lossless inductor.</summary>
    /// <param name="henries">L in henries, finite and above zero.</param>
    /// <param name="selfCapacitanceFarads">Cp in farads, not negative; 0 by default.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value out of its range.</exception>
    public static Inductor Ideal(double henries, double selfCapacitanceFarads = 0) =>
        new(Require.Positive(henries, nameof(henries)), InductorLoss.None, double.PositiveInfinity, 0,
            Require.NotNegative(selfCapacitanceFarads, nameof(selfCapacitanceFarads)));

    /// <summary>An inductor with the same Q at every frequency: R = ωL/Q.</summary>
    /// <param name="henries">L in henries, finite and above zero.</param>
    /// <param name="q">Q, finite and above zero.</param>
    /// <param name="selfCapacitanceFarads">Cp in farads, not negative; 0 by default.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value out of its range.</exception>
    public static Inductor WithQ(double henries, double q, double selfCapacitanceFarads = 0) =>
        new(Require.Positive(henries, nameof(henries)), InductorLoss.ConstantQ, Require.Positive(q, nameof(q)), 0,
            Require.NotNegative(selfCapacitanceFarads, nameof(selfCapacitanceFarads)));

    /// <summary>
    /// An inductor whose Q is <paramref name="q"/> at <paramref name="at"/>, with a loss resistance
    /// R(f) = (2π·f_q·L/Q)·√(f/f_q) that grows with the skin effect.
    /// </summary>
    /// <param name="henries">L in henries, finite and above zero.</param>
    /// <param name="q">Q at <paramref name="at"/>, finite and above zero.</param>
    /// <param name="at">The frequency at which Q is given, above 0 Hz.</param>
    /// <param name="selfCapacitanceFarads">Cp in farads, not negative; 0 by default.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value out of its range.</exception>
    public static Inductor WithQAt(double henries, double q, Frequency at, double selfCapacitanceFarads = 0)
    {
        Require.Positive(henries, nameof(henries));
        Require.Positive(q, nameof(q));
        double hz = Require.Positive(at.Hertz, nameof(at));
        double ohmsAt = 2 * Math.PI * hz * henries / q;
        return new Inductor(henries, InductorLoss.SkinEffect, q, ohmsAt / Math.Sqrt(hz),
            Require.NotNegative(selfCapacitanceFarads, nameof(selfCapacitanceFarads)));
    }

    /// <summary>The series loss resistance at <paramref name="hertz"/>, in ohms.</summary>
    public double LossOhmsAt(double hertz) => Loss switch
    {
        InductorLoss.ConstantQ => Omega(hertz) * Henries / Q,
        InductorLoss.SkinEffect => _lossOhmsPerRootHertz * Math.Sqrt(hertz),
        _ => 0,
    };

    /// <inheritdoc/>
    public override Complex ImpedanceAt(double hertz) => 1 / AdmittanceAt(hertz);

    /// <inheritdoc/>
    public override Complex AdmittanceAt(double hertz)
    {
        double omega = Omega(hertz);
        return 1 / new Complex(LossOhmsAt(hertz), omega * Henries) + new Complex(0, omega * SelfCapacitanceFarads);
    }
}
