namespace BenchRunner.Core.Quantities;

/// <summary>
/// A finite value together with its unit, so that a number cannot lose or change its unit on the
/// way from a computation to a row, a check or a line of text. Formats with <see cref="QuantityFormat"/>.
/// </summary>
public readonly struct Quantity : IEquatable<Quantity>
{
    private readonly QuantityUnit? _unit;

    private Quantity(double value, QuantityUnit unit)
    {
        Value = value;
        _unit = unit;
    }

    /// <summary>The value, in <see cref="Unit"/>.</summary>
    public double Value { get; }

    /// <summary>The unit of <see cref="Value"/>; <see cref="QuantityUnit.None"/> for a default instance.</summary>
    public QuantityUnit Unit => _unit ?? QuantityUnit.None;

    /// <summary>Creates a quantity.</summary>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is NaN or infinite.</exception>
    public static Quantity Of(double value, QuantityUnit unit)
    {
        ArgumentNullException.ThrowIfNull(unit);
        if (!double.IsFinite(value))
        {
            throw new ArgumentOutOfRangeException(nameof(value), value, $"A {unit.Name} value must be finite.");
        }

        // Adding zero turns -0.0 into +0.0.
        return new Quantity(value + 0.0, unit);
    }

    /// <summary>Formats with <see cref="QuantityFormat.Format(Quantity)"/>, e.g. <c>137.5642 MHz</c>.</summary>
    public override string ToString() => QuantityFormat.Format(this);

    /// <inheritdoc/>
    public bool Equals(Quantity other) => Value.Equals(other.Value) && ReferenceEquals(Unit, other.Unit);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is Quantity other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Value, Unit.Symbol);

    public static bool operator ==(Quantity left, Quantity right) => left.Equals(right);

    public static bool operator !=(Quantity left, Quantity right) => !left.Equals(right);
}
