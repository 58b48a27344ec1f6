using BenchRunner.Core.Quantities;

namespace BenchRunner.Simulator.Generator;

/// <summary>A harmonic the generator really puts out: its order (2 for 2f) and its level relative to the carrier (dBc).</summary>
public readonly struct GeneratorHarmonic : IEquatable<GeneratorHarmonic>
{
    private GeneratorHarmonic(int order, Ratio relativeLevel)
    {
        Order = order;
        RelativeLevel = relativeLevel;
    }

    /// <summary>The harmonic number, 2 or more: the harmonic lies at Order × the carrier frequency.</summary>
    public int Order { get; }

    /// <summary>Its level relative to the carrier, 0 dB or below (e.g. −30 dB for −30 dBc).</summary>
    public Ratio RelativeLevel { get; }

    /// <summary>The <paramref name="order"/>-th harmonic at <paramref name="relativeLevel"/> dBc.</summary>
    /// <exception cref="ArgumentOutOfRangeException">An order below 2, or a level above the carrier.</exception>
    public static GeneratorHarmonic Of(int order, Ratio relativeLevel)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(order, 2);
        if (relativeLevel.Decibels > 0)
        {
            throw new ArgumentOutOfRangeException(nameof(relativeLevel), relativeLevel.Decibels, "A harmonic must not be above the carrier (0 dBc).");
        }

        return new GeneratorHarmonic(order, relativeLevel);
    }

    /// <inheritdoc/>
    public bool Equals(GeneratorHarmonic other) => Order == other.Order && RelativeLevel == other.RelativeLevel;

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is GeneratorHarmonic other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Order, RelativeLevel);

    /// <summary>Formats as e.g. <c>H2 -30 dBc</c>.</summary>
    public override string ToString() => $"H{Order} {RelativeLevel.Decibels:0.##} dBc";

    public static bool operator ==(GeneratorHarmonic left, GeneratorHarmonic right) => left.Equals(right);

    public static bool operator !=(GeneratorHarmonic left, GeneratorHarmonic right) => !left.Equals(right);
}
