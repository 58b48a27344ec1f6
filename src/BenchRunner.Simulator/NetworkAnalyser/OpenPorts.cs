using System.Numerics;
using BenchRunner.Simulator.Circuits;

namespace BenchRunner.Simulator.NetworkAnalyser;

/// <summary>Nothing connected: both test ports open (S11 = S22 = 1, no transmission).</summary>
public sealed class OpenPorts : ITwoPort
{
    private OpenPorts()
    {
    }

    /// <summary>The one instance.</summary>
    public static OpenPorts Instance { get; } = new();

    /// <inheritdoc/>
    public SParameters Evaluate(double hertz, double referenceOhms) => new(Complex.One, Complex.Zero, Complex.Zero, Complex.One);
}
