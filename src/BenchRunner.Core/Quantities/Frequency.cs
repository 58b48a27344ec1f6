namespace BenchRunner.Core.Quantities;

/// <summary>
/// A frequency in hertz. Always finite and not negative.
/// Parses text such as <c>137.5 MHz</c>, <c>21.4MHz</c>, <c>2.5 GHz</c>, <c>455 kHz</c> or a bare
/// number of hertz such as <c>1e6</c>; unit words are case-insensitive.
/// </summary>
public readonly struct Frequency : IEquatable<Frequency>, IComparable<Frequency>
{
    // Enough digits that parsing the text gives back the value (docs/quantities.md, round trips).
    private const int ExactDigits = 9;

    private Frequency(double hertz) => Hertz = hertz;

    /// <summary>The frequency in hertz.</summary>
    public double Hertz { get; }

    /// <summary>The frequency in kilohertz.</summary>
    public double Kilohertz => Hertz / 1e3;

    /// <summary>The frequency in megahertz.</summary>
    public double Megahertz => Hertz / 1e6;

    /// <summary>The frequency in gigahertz.</summary>
    public double Gigahertz => Hertz / 1e9;

    /// <summary>Zero hertz.</summary>
    public static Frequency Zero => default;

    /// <summary>Creates a frequency from hertz.</summary>
    /// <exception cref="ArgumentOutOfRangeException">NaN, infinite or negative.</exception>
    public static Frequency FromHertz(double hertz)
    {
        if (!double.IsFinite(hertz) || hertz < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(hertz), hertz, "A frequency must be finite and not negative.");
        }

        return new Frequency(hertz + 0.0);
    }

    /// <summary>Creates a frequency from kilohertz.</summary>
    public static Frequency FromKilohertz(double kilohertz) => FromHertz(kilohertz * 1e3);

    /// <summary>Creates a frequency from megahertz.</summary>
    public static Frequency FromMegahertz(double megahertz) => FromHertz(megahertz * 1e6);

    /// <summary>Creates a frequency from gigahertz.</summary>
    public static Frequency FromGigahertz(double gigahertz) => FromHertz(gigahertz * 1e9);

    /// <summary>
    /// Parses a frequency. Accepted units: Hz, kHz, MHz, GHz (any letter case); no unit means hertz.
    /// </summary>
    public static ParseResult<Frequency> Parse(string? text)
    {
        const string expected = "a frequency such as \"137.5 MHz\", \"455 kHz\" or \"1e6\" (hertz)";
        var split = QuantityText.Split(text, expected);
        if (!split.Success)
        {
            return ParseResult<Frequency>.Fail(split.Error);
        }

        var (number, unit) = split.Value;
        double scale;
        switch (unit.ToLowerInvariant())
        {
            case "": case "hz": scale = 1; break;
            case "khz": scale = 1e3; break;
            case "mhz": scale = 1e6; break;
            case "ghz": scale = 1e9; break;
            default:
                return ParseResult<Frequency>.Fail($"unknown frequency unit \"{unit}\" in \"{text!.Trim()}\"; expected Hz, kHz, MHz or GHz");
        }

        var hertz = number * scale;
        if (hertz < 0)
        {
            return ParseResult<Frequency>.Fail($"\"{text!.Trim()}\" is negative; a frequency must not be negative");
        }

        if (!double.IsFinite(hertz))
        {
            return ParseResult<Frequency>.Fail($"\"{text!.Trim()}\" is too large for a frequency");
        }

        // Adding zero turns "-0 MHz" (-0.0) into +0.0, so that it formats as "0 Hz".
        return ParseResult<Frequency>.Ok(new Frequency(hertz + 0.0));
    }

    /// <summary>
    /// Formats with the largest fitting prefix and up to 9 significant digits, so that
    /// <see cref="Parse"/> reads the text back exactly, e.g. <c>137.5 MHz</c>. Measured figures are
    /// shown with <see cref="QuantityFormat"/>'s 7 digits instead.
    /// </summary>
    public override string ToString() => QuantityFormat.Format(Hertz, QuantityUnit.Hertz, ExactDigits);

    /// <inheritdoc/>
    public bool Equals(Frequency other) => Hertz.Equals(other.Hertz);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is Frequency other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode() => Hertz.GetHashCode();

    /// <inheritdoc/>
    public int CompareTo(Frequency other) => Hertz.CompareTo(other.Hertz);

    public static bool operator ==(Frequency left, Frequency right) => left.Equals(right);

    public static bool operator !=(Frequency left, Frequency right) => !left.Equals(right);

    public static bool operator <(Frequency left, Frequency right) => left.Hertz < right.Hertz;

    public static bool operator >(Frequency left, Frequency right) => left.Hertz > right.Hertz;

    public static bool operator <=(Frequency left, Frequency right) => left.Hertz <= right.Hertz;

    public static bool operator >=(Frequency left, Frequency right) => left.Hertz >= right.Hertz;

    public static Frequency operator +(Frequency left, Frequency right) => new(left.Hertz + right.Hertz);

    /// <summary>The difference; throws when it would be negative.</summary>
    public static Frequency operator -(Frequency left, Frequency right) => FromHertz(left.Hertz - right.Hertz);
}
