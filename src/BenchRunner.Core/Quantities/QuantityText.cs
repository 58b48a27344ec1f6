using System.Globalization;

namespace BenchRunner.Core.Quantities;

/// <summary>
/// Splits text such as <c>"137.5 MHz"</c>, <c>"21.4MHz"</c>, <c>"-20 dBm"</c> or <c>"1e6"</c>
/// into a number and a unit word. Values are formatted by <see cref="QuantityFormat"/>.
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
    /// Rounds to <paramref name="decimals"/> places (0 to 15) and turns a negative zero into
    /// zero, so that a tiny negative value prints as "0", not "-0".
    /// </summary>
    public static double RoundForDisplay(double value, int decimals) => Math.Round(value, decimals) + 0.0;

    /// <summary>Formats a number in the invariant culture with round-trip precision.</summary>
    public static string Invariant(double value) => value.ToString("R", CultureInfo.InvariantCulture);
}
