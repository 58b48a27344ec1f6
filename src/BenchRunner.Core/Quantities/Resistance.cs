namespace BenchRunner.Core.Quantities;

/// <summary>
/// A resistance (or a real reference impedance) in ohms. Always finite and not negative.
/// Parses text such as <c>50 Ohm</c>, <c>50 ohms</c>, <c>4.7 kOhm</c>, <c>1 MOhm</c>,
/// <c>50 Ω</c> or <c>4.7 kΩ</c>; the unit is required.
/// </summary>
public readonly struct Resistance : IEquatable<Resistance>, IComparable<Resistance>
{
    private static readonly (double Scale, string Prefix)[] Prefixes =
        [(1e6, "M"), (1e3, "k"), (1, "")];

    private Resistance(double ohms) => Ohms = ohms;

    /// <summary>The resistance in ohms.</summary>
    public double Ohms { get; }

    /// <summary>The resistance in kiloohms.</summary>
    public double Kiloohms => Ohms / 1e3;

    /// <summary>The resistance in megaohms.</summary>
    public double Megaohms => Ohms / 1e6;

    /// <summary>Zero ohms (a short).</summary>
    public static Resistance Zero => default;

    /// <summary>Creates a resistance from ohms.</summary>
    /// <exception cref="ArgumentOutOfRangeException">NaN, infinite or negative.</exception>
    public static Resistance FromOhms(double ohms)
    {
        if (!double.IsFinite(ohms) || ohms < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(ohms), ohms, "A resistance must be finite and not negative.");
        }

        // Adding zero turns -0.0 into +0.0, so that it formats as "0 Ohm".
        return new Resistance(ohms + 0.0);
    }

    /// <summary>Creates a resistance from kiloohms.</summary>
    /// <exception cref="ArgumentOutOfRangeException">NaN, infinite or negative.</exception>
    public static Resistance FromKiloohms(double kiloohms) => FromOhms(kiloohms * 1e3);

    /// <summary>Creates a resistance from megaohms.</summary>
    /// <exception cref="ArgumentOutOfRangeException">NaN, infinite or negative.</exception>
    public static Resistance FromMegaohms(double megaohms) => FromOhms(megaohms * 1e6);

    /// <summary>
    /// Parses a resistance. The unit is required: <c>Ohm</c>, <c>Ohms</c> (the word in any
    /// letter case) or the sign <c>Ω</c>, directly preceded by an optional prefix <c>k</c> or
    /// <c>K</c> (kilo) or <c>M</c> (mega). The prefix <c>m</c> is refused because it would mean
    /// milli, which is rarely meant.
    /// </summary>
    public static ParseResult<Resistance> Parse(string? text)
    {
        const string expected = "a resistance such as \"50 Ohm\", \"4.7 kOhm\" or \"1 MOhm\"";
        var split = QuantityText.Split(text, expected);
        if (!split.Success)
        {
            return ParseResult<Resistance>.Fail(split.Error);
        }

        var (number, unit) = split.Value;
        var shown = text!.Trim();
        if (unit.Length == 0)
        {
            return ParseResult<Resistance>.Fail($"\"{shown}\" has no unit; expected {expected}");
        }

        if (!TrySplitOhmUnit(unit, out var prefix))
        {
            return ParseResult<Resistance>.Fail($"unknown resistance unit \"{unit}\" in \"{shown}\"; expected Ohm, kOhm or MOhm");
        }

        double scale;
        switch (prefix)
        {
            case "": scale = 1; break;
            case "k": case "K": scale = 1e3; break;
            case "M": scale = 1e6; break;
            case "m":
                return ParseResult<Resistance>.Fail($"\"{shown}\": the prefix \"m\" would mean milliohms; write \"M\" for megaohms, as in \"1 MOhm\"");
            default:
                return ParseResult<Resistance>.Fail($"unknown resistance unit \"{unit}\" in \"{shown}\"; expected Ohm, kOhm or MOhm");
        }

        var ohms = number * scale;
        if (ohms < 0)
        {
            return ParseResult<Resistance>.Fail($"\"{shown}\" is negative; a resistance must not be negative");
        }

        if (!double.IsFinite(ohms))
        {
            return ParseResult<Resistance>.Fail($"\"{shown}\" is too large for a resistance");
        }

        return ParseResult<Resistance>.Ok(new Resistance(ohms + 0.0));
    }

    /// <summary>Formats with the largest fitting prefix, e.g. <c>4.7 kOhm</c> or <c>50 Ohm</c>, up to 9 significant digits (the text reads back exactly).</summary>
    public override string ToString() => QuantityFormat.Scaled(Ohms, 9, Prefixes, "Ohm");

    /// <inheritdoc/>
    public bool Equals(Resistance other) => Ohms.Equals(other.Ohms);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is Resistance other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode() => Ohms.GetHashCode();

    /// <inheritdoc/>
    public int CompareTo(Resistance other) => Ohms.CompareTo(other.Ohms);

    public static bool operator ==(Resistance left, Resistance right) => left.Equals(right);

    public static bool operator !=(Resistance left, Resistance right) => !left.Equals(right);

    public static bool operator <(Resistance left, Resistance right) => left.Ohms < right.Ohms;

    public static bool operator >(Resistance left, Resistance right) => left.Ohms > right.Ohms;

    public static bool operator <=(Resistance left, Resistance right) => left.Ohms <= right.Ohms;

    public static bool operator >=(Resistance left, Resistance right) => left.Ohms >= right.Ohms;

    /// <summary>Splits a unit such as "kOhm", "ohms" or "kΩ" into its prefix and the ohm word or sign.</summary>
    private static bool TrySplitOhmUnit(string unit, out string prefix)
    {
        // Both the Greek capital omega (U+03A9) and the ohm sign (U+2126) are typed in practice.
        foreach (var word in (ReadOnlySpan<string>)["ohms", "ohm", "\u03A9", "\u2126"])
        {
            if (unit.EndsWith(word, StringComparison.OrdinalIgnoreCase))
            {
                prefix = unit[..^word.Length];
                return true;
            }
        }

        prefix = "";
        return false;
    }
}
