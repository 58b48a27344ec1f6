using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Figures;

/// <summary>
/// The name of a figure: the word it is stored and written in plans with (<c>center_hz</c>), a short
/// label for people, and its unit. The figures the program computes are listed in
/// <see cref="FigureKeys"/>; <see cref="Unlisted"/> names one read back from a store that this
/// version does not compute.
/// </summary>
public sealed record FigureKey
{
    private FigureKey(string word, string label, QuantityUnit unit)
    {
        Word = word;
        Label = label;
        Unit = unit;
    }

    /// <summary>The stored word, e.g. <c>center_hz</c>; plans name the figure by it.</summary>
    public string Word { get; }

    /// <summary>A short label, e.g. <c>Centre frequency (-3 dB)</c>.</summary>
    public string Label { get; }

    /// <summary>The unit every value of this figure is in.</summary>
    public QuantityUnit Unit { get; }

    /// <summary>True for a key of <see cref="FigureKeys.All"/>.</summary>
    public bool IsListed => FigureKeys.Find(Word) is not null;

    /// <summary>Defines one of the program's figures; only <see cref="FigureKeys"/> does.</summary>
    internal static FigureKey Define(string word, string label, QuantityUnit unit) => new(word, label, unit);

    /// <summary>
    /// A key the program does not compute, e.g. a figure read back from a store written by another
    /// version. Use <see cref="FigureKeys.Find"/> first: a listed word is refused here.
    /// </summary>
    /// <exception cref="ArgumentException"><paramref name="word"/> is empty or one of <see cref="FigureKeys.All"/>.</exception>
    public static FigureKey Unlisted(string word, string label, QuantityUnit unit)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(word);
        ArgumentNullException.ThrowIfNull(label);
        ArgumentNullException.ThrowIfNull(unit);
        if (FigureKeys.Find(word) is not null)
        {
            throw new ArgumentException($"{word} is a listed figure; use FigureKeys.", nameof(word));
        }

        return new FigureKey(word, label, unit);
    }

    /// <summary>The stored word.</summary>
    public override string ToString() => Word;
}
