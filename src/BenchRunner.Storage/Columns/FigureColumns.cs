using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Storage.Columns;

/// <summary>
/// How a figure becomes the columns <c>key</c>, <c>label</c>, <c>value</c>, <c>unit</c> and
/// <c>reason</c> of a row and comes back: the key's word, its label, the value in the key's unit,
/// the unit's stored text (<c>Hz</c>, <c>dB</c>, <c>dBm</c>, empty...) and the reason.
/// </summary>
internal static class FigureColumns
{
    /// <summary>The columns of <paramref name="figure"/>; the value is null when the figure has a reason.</summary>
    public static (string Key, string Label, double? Value, string Unit, string? Reason) From(NamedFigure figure) =>
        (figure.Key.Word, figure.Label, figure.Value?.Value, figure.Unit.Symbol, figure.Reason);

    /// <summary>
    /// The figure a row holds. A listed word gets its <see cref="FigureKeys"/> key (and that key's
    /// label); another word is kept as an unlisted key with the stored label and unit.
    /// </summary>
    /// <exception cref="InvalidDataException">The unit text names no unit, or is not the listed key's unit.</exception>
    public static NamedFigure ToFigure(string key, string label, double? value, string unit, string? reason)
    {
        var stored = QuantityUnit.FromSymbol(unit)
            ?? throw new InvalidDataException($"Figure {key} has the unknown unit \"{unit}\".");
        var figureKey = FigureKeys.Find(key) ?? FigureKey.Unlisted(key, label, stored);
        if (!ReferenceEquals(figureKey.Unit, stored))
        {
            throw new InvalidDataException($"Figure {key} is stored in \"{unit}\" but is a value in \"{figureKey.Unit.Symbol}\".");
        }

        return value is { } v ? NamedFigure.Of(figureKey, v) : NamedFigure.Unavailable(figureKey, reason ?? "no reason stored");
    }
}
