using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Figures;

/// <summary>
/// One figure of a summary, ready to print or store: its key and either its value, always in the
/// key's unit, or the reason it could not be computed.
/// </summary>
public sealed record NamedFigure
{
    /// <summary>Creates a figure from a value or a reason.</summary>
    /// <exception cref="ArgumentException">Both or neither of <paramref name="value"/> and
    /// <paramref name="reason"/> are given, or the value's unit is not the key's.</exception>
    public NamedFigure(FigureKey key, Quantity? value, string? reason)
    {
        ArgumentNullException.ThrowIfNull(key);
        if ((value is null) == string.IsNullOrWhiteSpace(reason))
        {
            throw new ArgumentException($"Figure {key.Word} needs either a value or the reason it has none, not both or neither.");
        }

        if (value is { } v && !ReferenceEquals(v.Unit, key.Unit))
        {
            throw new ArgumentException($"Figure {key.Word} is in \"{key.Unit.Symbol}\", not \"{v.Unit.Symbol}\".", nameof(value));
        }

        Key = key;
        Value = value;
        Reason = value is null ? reason : null;
    }

    /// <summary>Which figure it is.</summary>
    public FigureKey Key { get; }

    /// <summary>The value in <see cref="Unit"/>, or null when it could not be computed.</summary>
    public Quantity? Value { get; }

    /// <summary>Why <see cref="Value"/> is null; null when it has a value.</summary>
    public string? Reason { get; }

    /// <summary>The key's label.</summary>
    public string Label => Key.Label;

    /// <summary>The key's unit.</summary>
    public QuantityUnit Unit => Key.Unit;

    /// <summary>The figure <paramref name="key"/> with <paramref name="value"/> in the key's unit.</summary>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is NaN or infinite.</exception>
    public static NamedFigure Of(FigureKey key, double value)
    {
        ArgumentNullException.ThrowIfNull(key);
        return new NamedFigure(key, Quantity.Of(value, key.Unit), null);
    }

    /// <summary>The figure <paramref name="key"/> that could not be computed, and why.</summary>
    public static NamedFigure Unavailable(FigureKey key, string reason) => new(key, null, reason);

    /// <summary>The figure <paramref name="key"/> from a computation that may have failed.</summary>
    public static NamedFigure From(FigureKey key, FigureResult<double> result) =>
        result.IsAvailable ? Of(key, result.Value) : Unavailable(key, result.Reason!);

    /// <summary>The key's word and the formatted value, or the reason.</summary>
    public override string ToString() => $"{Key.Word} = {(Value is { } v ? v.ToString() : "not available: " + Reason)}";
}
