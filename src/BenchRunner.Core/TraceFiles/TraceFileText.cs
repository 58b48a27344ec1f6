using System.Globalization;
using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Core.TraceFiles;

/// <summary>Number reading and writing shared by the trace file formats (invariant culture).</summary>
internal static class TraceFileText
{
    /// <summary>Parses a finite number such as <c>-12.136</c>, <c>.95</c> or <c>1.5E-3</c>.</summary>
    public static bool TryParseNumber(string text, out double value) =>
        double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out value) && double.IsFinite(value);

    /// <summary>Parses a number or throws <see cref="InputFormatException"/> naming where it is.</summary>
    public static double ParseNumber(TextToken token, string source, int line)
    {
        if (TryParseNumber(token.Text, out var value))
        {
            return value;
        }

        var found = token.Text.Length == 0 ? "an empty field" : $"\"{token.Text}\"";
        throw new InputFormatException(new SourceLocation(source, line, token.Column), $"expected a number, found {found}");
    }

    /// <summary>Formats with round-trip precision, e.g. <c>0.1</c>, <c>-1.5E-05</c>.</summary>
    public static string Format(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>
    /// Parses <paramref name="text"/> times 10^<paramref name="powerOfTen"/> by moving the decimal
    /// exponent before conversion, so that "137.5" MHz gives exactly the double nearest
    /// 137 500 000 rather than the product of two rounded numbers.
    /// </summary>
    public static bool TryParseScaled(string text, int powerOfTen, out double value)
    {
        if (powerOfTen == 0)
        {
            return TryParseNumber(text, out value);
        }

        int e = text.IndexOfAny(['e', 'E']);
        int exponent = 0;
        if (e >= 0 && !int.TryParse(text.AsSpan(e + 1), NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out exponent))
        {
            value = 0;
            return false;
        }

        var mantissa = e >= 0 ? text[..e] : text;
        var shifted = mantissa + "E" + (exponent + powerOfTen).ToString(CultureInfo.InvariantCulture);
        return TryParseNumber(shifted, out value);
    }

    /// <summary>
    /// Formats <paramref name="hertz"/> in units of 10^<paramref name="powerOfTen"/> Hz with the
    /// fewest digits (15 to 17 significant) that <see cref="TryParseScaled"/> reads back to exactly
    /// the same hertz, so that 137.5 MHz is written as <c>137.5</c>. Should none do, the hertz are
    /// written with an exponent (<c>133500000.00000001E-9</c>), which also reads back exactly.
    /// </summary>
    public static string FormatScaled(double hertz, int powerOfTen)
    {
        var scaled = hertz / Math.Pow(10, powerOfTen);
        for (int digits = 15; digits <= 17; digits++)
        {
            var text = scaled.ToString("G" + digits.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
            if (TryParseScaled(text, powerOfTen, out var back) && back == hertz)
            {
                return text;
            }
        }

        var exact = Format(hertz);
        int e = exact.IndexOf('E');
        return e < 0
            ? exact + "E" + (-powerOfTen).ToString(CultureInfo.InvariantCulture)
            : exact[..e] + "E" + (int.Parse(exact.AsSpan(e + 1), NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture) - powerOfTen).ToString(CultureInfo.InvariantCulture);
    }
}
