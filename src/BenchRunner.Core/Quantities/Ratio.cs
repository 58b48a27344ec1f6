using System.Globalization;

namespace BenchRunner.Core.Quantities;

/// <summary>
/// A ratio in decibels: a gain, a loss, a margin or a relative level. Always finite.
/// Parses text such as <c>3 dB</c> or <c>-0.5dB</c>; the unit is required.
/// </summary>
public readonly struct Ratio : IEquatable<Ratio>, IComparable<Ratio>
{
    private Ratio(double decibels) => Decibels = decibels;

    /// <summary>The ratio in decibels.</summary>
    public double Decibels { get; }

    /// <summary>The same ratio as a power ratio, 10^(dB/10).</summary>
    public double PowerRatio => Math.Pow(10, Decibels / 10);

    /// <summary>The same ratio as a voltage (amplitude) ratio, 10^(dB/20).</summary>
    public double VoltageRatio => Math.Pow(10, Decibels / 20);

    /// <summary>Zero decibels (unity).</summary>
    public static Ratio Unity => default;

    /// <summary>Creates a ratio from decibels.</summary>
    /// <exception cref="ArgumentOutOfRangeException">NaN or infinite.</exception>
    public static Ratio FromDecibels(double decibels)
    {
        if (!double.IsFinite(decibels))
        {
            throw new ArgumentOutOfRangeException(nameof(decibels), decibels, "A ratio in dB must be finite.");
        }

        return new Ratio(decibels);
    }

    /// <summary>Parses a ratio; the unit <c>dB</c> (any letter case) is required.</summary>
    public static ParseResult<Ratio> Parse(string? text)
    {
        const string expected = "a ratio such as \"3 dB\"";
        var split = QuantityText.Split(text, expected);
        if (!split.Success)
        {
            return ParseResult<Ratio>.Fail(split.Error);
        }

        var (number, unit) = split.Value;
        return unit.ToLowerInvariant() switch
        {
            "db" => ParseResult<Ratio>.Ok(new Ratio(number)),
            "" => ParseResult<Ratio>.Fail($"\"{text!.Trim()}\" has no unit; expected {expected}"),
            _ => ParseResult<Ratio>.Fail($"unknown ratio unit \"{unit}\" in \"{text!.Trim()}\"; expected dB"),
        };
    }

    /// <summary>Formats as e.g. <c>3 dB</c>.</summary>
    public override string ToString() => $"{QuantityText.RoundForDisplay(Decibels, 6).ToString("0.######", CultureInfo.InvariantCulture)} dB";

    /// <inheritdoc/>
    public bool Equals(Ratio other) => Decibels.Equals(other.Decibels);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is Ratio other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode() => Decibels.GetHashCode();

    /// <inheritdoc/>
    public int CompareTo(Ratio other) => Decibels.CompareTo(other.Decibels);

    public static bool operator ==(Ratio left, Ratio right) => left.Equals(right);

    public static bool operator !=(Ratio left, Ratio right) => !left.Equals(right);

    public static bool operator <(Ratio left, Ratio right) => left.Decibels < right.Decibels;

    public static bool operator >(Ratio left, Ratio right) => left.Decibels > right.Decibels;

    public static bool operator <=(Ratio left, Ratio right) => left.Decibels <= right.Decibels;

    public static bool operator >=(Ratio left, Ratio right) => left.Decibels >= right.Decibels;

    public static Ratio operator +(Ratio left, Ratio right) => new(left.Decibels + right.Decibels);

    public static Ratio operator -(Ratio left, Ratio right) => new(left.Decibels - right.Decibels);

    public static Ratio operator -(Ratio value) => new(-value.Decibels);
}
