using System.Numerics;

namespace BenchRunner.Simulator.Circuits;

/// <summary>An ideal resistor: Z = R at every frequency.</summary>
public sealed class Resistor : TwoTerminal
{
    /// <summary>Creates a resistor.</summary>
    /// <param name="ohms">R in ohms, finite and not negative (0 is a short).</param>
    /// <exception cref="ArgumentOutOfRangeException">R is negative or not finite.</exception>
    public Resistor(double ohms) => Ohms = Require.NotNegative(ohms, nameof(ohms));

    /// <summary>R in ohms.</summary>
    public double Ohms { get; }

    /// <inheritdoc/>
    public override Complex ImpedanceAt(double hertz) => new(Ohms, 0);
}
