using System.Collections.Immutable;
using System.Numerics;

namespace BenchRunner.Simulator.Circuits;

/// <summary>Two-terminal parts in series: Z = ΣZ.</summary>
public sealed class SeriesCombination : TwoTerminal
{
    private readonly TwoTerminal[] _parts;

    /// <summary>Creates the combination.</summary>
    /// <exception cref="ArgumentException">No parts, or a null part.</exception>
    public SeriesCombination(params IEnumerable<TwoTerminal> parts)
    {
        _parts = Combinations.Check(parts, nameof(parts));
    }

    /// <summary>The parts, in order.</summary>
    public ImmutableArray<TwoTerminal> Parts => [.. _parts];

    /// <inheritdoc/>
    public override Complex ImpedanceAt(double hertz)
    {
        var sum = Complex.Zero;
        foreach (var part in _parts)
        {
            sum += part.ImpedanceAt(hertz);
        }

        return sum;
    }
}
