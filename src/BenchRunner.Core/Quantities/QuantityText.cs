using System.Globalization;

namespace BenchRunner.Core.Quantities;

/// <summary>
/// Splits text such as <c>"137.5 MHz"</c>, <c>"21.4MHz"</c>, <c>"-20 dBm"</c> or <c>"1e6"</c>
/// into a number and a unit word, and formats numbers with SI prefixes.
/// Numbers use the invariant culture (a point as decimal separator, optional exponent).
/// </summary>
internal static class QuantityText
{
    /// <summary>Splits <paramref name="text"/> into a finite number and a (possibly empty) unit.</summary>
    public static ParseResult<(double Number, string Unit)> Split(string? text, string expected)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            return ParseResult<(double, string)>.Fail($"empty value; expected {expected}");
        }

        var s = text.Trim();
        int i = 0;
        if (i < s.Length && (s[i] == '+' || s[i] == '-')) i++;
        int digitsStart = i;
        while (i < s.Length && (char.IsAsciiDigit(s[i]) || s[i] == '.')) i++;
        if (i == digitsStart)
        {
            return ParseResult<(double, string)>.Fail($"\"{s}\" does not start with a number; expected {expected}");
        }

        // An exponent only when 'e' is followed by a digit or a sign and a digit, so that units
        // beginning with 'e' would still be seen as units.
        if (i < s.Length && (s[i] == 'e' || s[i] == 'E'))
        {
            int j = i + 1;
            if (j < s.Length && (s[j] == '+' || s[j] == '-')) j++;
            if (j < s.Length && char.IsAsciiDigit(s[j]))
            {
                while (j < s.Length && char.IsAsciiDigit(s[j])) j++;
                i = j;
            }
        }

        var numberText = s[..i];
        if (!double.TryParse(numberText, NumberStyles.Float, CultureInfo.InvariantCulture, out var number)
            || !double.IsFinite(number))
        {
            return ParseResult<(double, string)>.Fail($"\"{numberText}\" is not a valid number; expected {expected}");
        }

        var unit = s[i..].Trim();
        return ParseResult<(double, string)>.Ok((number, unit));
    }

    /// <summary>
    /// Formats <paramref name="value"/> (in base units) with the largest SI prefix from
    /// <paramref name="prefixes"/> that keeps the mantissa at or above 1, using up to
    /// <paramref name="significant"/> significant digits.
    /// </summary>
    public static string FormatScaled(double value, string baseUnit, ReadOnlySpan<(double Scale, string Prefix)> prefixes, int significant = 9)
    {
        if (value == 0 || !double.IsFinite(value))
        {
            // Adding zero turns -0.0 into +0.0, which would otherwise print as "-0".
            return $"{(value + 0.0).ToString(CultureInfo.InvariantCulture)} {baseUnit}";
        }

        var magnitude = Math.Abs(value);
        var chosen = prefixes[^1];
        foreach (var p in prefixes)
        {
            if (magnitude >= p.Scale * 0.9999999995)
            {
                chosen = p;
                break;
            }
        }

        var scaled = value / chosen.Scale;
        // Math.Round accepts at most 15 decimals; more are only asked for below the smallest prefix.
        var decimals = Math.Clamp(significant - 1 - (int)Math.Floor(Math.Log10(Math.Abs(scaled))), 0, 15);
        var rounded = RoundForDisplay(scaled, decimals);
        return $"{rounded.ToString("0.###############", CultureInfo.InvariantCulture)} {chosen.Prefix}{baseUnit}";
    }

    /// <summary>
    /// Rounds to <paramref name="decimals"/> places (0 to 15) and turns a negative zero into
    /// zero, so that a tiny negative value prints as "0", not "-0".
    /// </summary>
    public static double RoundForDisplay(double value, int decimals) => Math.Round(value, decimals) + 0.0;

    /// <summary>Formats a number in the invariant culture with round-trip precision.</summary>
    public static string Invariant(double value) => value.ToString("R", CultureInfo.InvariantCulture);
}
