using System.Collections.Immutable;
using System.Numerics;

namespace BenchRunner.Simulator.Circuits;

/// <summary>Two-terminal parts in parallel: Y = ΣY.</summary>
public sealed class ParallelCombination : TwoTerminal
{
    private readonly TwoTerminal[] _parts;

    /// <summary>Creates the combination.</summary>
    /// <exception cref="ArgumentException">No parts, or a null part.</exception>
    public ParallelCombination(params IEnumerable<TwoTerminal> parts)
    {
        _parts = Combinations.Check(parts, nameof(parts));
    }

    /// <summary>The parts, in order.</summary>
    public ImmutableArray<TwoTerminal> Parts => [.. _parts];

    /// <inheritdoc/>
    public override Complex ImpedanceAt(double hertz) => 1 / AdmittanceAt(hertz);

    /// <inheritdoc/>
    public override Complex AdmittanceAt(double hertz)
    {
        var sum = Complex.Zero;
        foreach (var part in _parts)
        {
            sum += part.AdmittanceAt(hertz);
        }

        return sum;
    }
}
