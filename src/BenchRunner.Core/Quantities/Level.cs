using System.Globalization;

namespace BenchRunner.Core.Quantities;

/// <summary>
/// An absolute power level in dBm (decibels relative to one milliwatt). Always finite.
/// Parses text such as <c>-20 dBm</c> or <c>+10dBm</c>; the unit is required.
/// </summary>
public readonly struct Level : IEquatable<Level>, IComparable<Level>
{
    private Level(double dbm) => Dbm = dbm;

    /// <summary>The level in dBm.</summary>
    public double Dbm { get; }

    /// <summary>The level in watts.</summary>
    public double Watts => Math.Pow(10, Dbm / 10) * 1e-3;

    /// <summary>Creates a level from dBm.</summary>
    /// <exception cref="ArgumentOutOfRangeException">NaN or infinite.</exception>
    public static Level FromDbm(double dbm)
    {
        if (!double.IsFinite(dbm))
        {
            throw new ArgumentOutOfRangeException(nameof(dbm), dbm, "A level must be finite.");
        }

        return new Level(dbm);
    }

    /// <summary>Creates a level from a power in watts.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not a finite positive power.</exception>
    public static Level FromWatts(double watts)
    {
        if (!double.IsFinite(watts) || watts <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(watts), watts, "A power must be finite and positive.");
        }

        return new Level(10 * Math.Log10(watts / 1e-3));
    }

    /// <summary>Parses a level; the unit <c>dBm</c> (any letter case) is required.</summary>
    public static ParseResult<Level> Parse(string? text)
    {
        const string expected = "a level such as \"-20 dBm\"";
        var split = QuantityText.Split(text, expected);
        if (!split.Success)
        {
            return ParseResult<Level>.Fail(split.Error);
        }

        var (number, unit) = split.Value;
        return unit.ToLowerInvariant() switch
        {
            "dbm" => ParseResult<Level>.Ok(new Level(number)),
            "" => ParseResult<Level>.Fail($"\"{text!.Trim()}\" has no unit; expected {expected}"),
            _ => ParseResult<Level>.Fail($"unknown level unit \"{unit}\" in \"{text!.Trim()}\"; expected dBm"),
        };
    }

    /// <summary>This level changed by a gain (negative for a loss).</summary>
    public Level Plus(Ratio gain) => new(Dbm + gain.Decibels);

    /// <summary>The ratio of this level to <paramref name="reference"/>.</summary>
    public Ratio RelativeTo(Level reference) => Ratio.FromDecibels(Dbm - reference.Dbm);

    /// <summary>Formats as e.g. <c>-20 dBm</c>.</summary>
    public override string ToString() => $"{QuantityText.RoundForDisplay(Dbm, 6).ToString("0.######", CultureInfo.InvariantCulture)} dBm";

    /// <inheritdoc/>
    public bool Equals(Level other) => Dbm.Equals(other.Dbm);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is Level other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode() => Dbm.GetHashCode();

    /// <inheritdoc/>
    public int CompareTo(Level other) => Dbm.CompareTo(other.Dbm);

    public static bool operator ==(Level left, Level right) => left.Equals(right);

    public static bool operator !=(Level left, Level right) => !left.Equals(right);

    public static bool operator <(Level left, Level right) => left.Dbm < right.Dbm;

    public static bool operator >(Level left, Level right) => left.Dbm > right.Dbm;

    public static bool operator <=(Level left, Level right) => left.Dbm <= right.Dbm;

    public static bool operator >=(Level left, Level right) => left.Dbm >= right.Dbm;
}
