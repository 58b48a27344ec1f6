using System.Numerics;

namespace BenchRunner.Simulator.Circuits;

/// <summary>
/// An ideal N:1 transformer, N turns on the port-1 side for each turn on the port-2 side:
/// [[N, 0], [0, 1/N]] (Pozar, <i>Microwave Engineering</i>, Table 4.1). A load Z on port 2 is
/// seen at port 1 as N²·Z.
/// </summary>
public sealed class IdealTransformer : NetworkElement
{
    private readonly Abcd _abcd;

    /// <summary>Creates the transformer.</summary>
    /// <param name="turnsRatio">N, finite and above zero.</param>
    /// <exception cref="ArgumentOutOfRangeException">N is not finite and positive.</exception>
    public IdealTransformer(double turnsRatio)
    {
        TurnsRatio = Require.Positive(turnsRatio, nameof(turnsRatio));
        _abcd = new Abcd(new Complex(turnsRatio, 0), Complex.Zero, Complex.Zero, new Complex(1 / turnsRatio, 0));
    }

    /// <summary>N.</summary>
    public double TurnsRatio { get; }

    /// <summary>The transformer that makes <paramref name="port2Ohms"/> look like <paramref name="port1Ohms"/>: N = √(R1/R2).</summary>
    /// <exception cref="ArgumentOutOfRangeException">A resistance is not finite and positive.</exception>
    public static IdealTransformer Matching(double port1Ohms, double port2Ohms) =>
        new(Math.Sqrt(Require.Positive(port1Ohms, nameof(port1Ohms)) / Require.Positive(port2Ohms, nameof(port2Ohms))));

    /// <inheritdoc/>
    public override Abcd AbcdAt(double hertz) => _abcd;
}
