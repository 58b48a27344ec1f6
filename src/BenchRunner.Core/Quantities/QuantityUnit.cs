namespace BenchRunner.Core.Quantities;

/// <summary>
/// The unit of a figure or other measured value: a small closed set (<see cref="None"/>,
/// <see cref="Hertz"/>, <see cref="Second"/>, <see cref="Ohm"/>, <see cref="Decibel"/>,
/// <see cref="DecibelMilliwatt"/>). Each knows the text it is stored and shown with, whether it
/// takes engineering prefixes (kHz, ns, kΩ) or is logarithmic (dB, dBm), and how many
/// significant digits <see cref="QuantityFormat"/> shows of it.
/// </summary>
public sealed class QuantityUnit
{
    private QuantityUnit(string symbol, string name, bool logarithmic, int significantDigits, (double Scale, string Prefix)[] prefixes)
    {
        Symbol = symbol;
        Name = name;
        IsLogarithmic = logarithmic;
        SignificantDigits = significantDigits;
        Prefixes = prefixes;
    }

    /// <summary>A pure number such as a Q or a shape factor; stored as the empty text.</summary>
    public static QuantityUnit None { get; } = new("", "number", false, 4, []);

    /// <summary>Hertz, <c>Hz</c>; shown with k, M, G (never below 1 Hz).</summary>
    public static QuantityUnit Hertz { get; } = new("Hz", "frequency", false, 7, [(1e9, "G"), (1e6, "M"), (1e3, "k"), (1, "")]);

    /// <summary>Seconds, <c>s</c>; shown with m, µ, n, p (never above 1 s).</summary>
    public static QuantityUnit Second { get; } = new("s", "time", false, 4, [(1, ""), (1e-3, "m"), (1e-6, "\u00B5"), (1e-9, "n"), (1e-12, "p")]);

    /// <summary>Ohms, <c>Ω</c>; shown with k, M, G and m.</summary>
    public static QuantityUnit Ohm { get; } = new("\u03A9", "resistance", false, 4, [(1e9, "G"), (1e6, "M"), (1e3, "k"), (1, ""), (1e-3, "m")]);

    /// <summary>A ratio in decibels, <c>dB</c>; logarithmic, no prefixes.</summary>
    public static QuantityUnit Decibel { get; } = new("dB", "ratio", true, 0, []);

    /// <summary>A level in decibels relative to 1 mW, <c>dBm</c>; logarithmic, no prefixes.</summary>
    public static QuantityUnit DecibelMilliwatt { get; } = new("dBm", "level", true, 0, []);

    /// <summary>Every unit, in the order above.</summary>
    public static IReadOnlyList<QuantityUnit> All { get; } = [None, Hertz, Second, Ohm, Decibel, DecibelMilliwatt];

    /// <summary>The text the unit is stored and shown with: <c>Hz</c>, <c>s</c>, <c>Ω</c>, <c>dB</c>, <c>dBm</c>, or empty.</summary>
    public string Symbol { get; }

    /// <summary>What the unit measures, in words (<c>frequency</c>, <c>level</c>...), for messages.</summary>
    public string Name { get; }

    /// <summary>True for dB and dBm: shown to a fixed 0.01 dB, never with a prefix.</summary>
    public bool IsLogarithmic { get; }

    /// <summary>
    /// The significant digits shown of a value of this unit: 7 for hertz, 4 for seconds, ohms and
    /// pure numbers; 0 for logarithmic units, which are shown to two decimals instead.
    /// </summary>
    public int SignificantDigits { get; }

    /// <summary>The prefixes this unit is shown with, largest first, each with its scale; empty when none.</summary>
    internal IReadOnlyList<(double Scale, string Prefix)> Prefixes { get; }

    /// <summary>The unit stored as <paramref name="symbol"/>, or null when no unit is written so.</summary>
    /// <param name="symbol">A stored unit text such as <c>Hz</c> or the empty text; <c>Ohm</c> is read as <see cref="Ohm"/> too.</param>
    public static QuantityUnit? FromSymbol(string? symbol) => symbol switch
    {
        null => null,
        "Ohm" => Ohm,
        _ => All.FirstOrDefault(u => u.Symbol == symbol),
    };

    /// <inheritdoc/>
    public override string ToString() => Symbol;
}
