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
    /// Formats <paramref name="hertz"/> divided by <paramref name="scale"/> with the fewest digits
    /// (15 to 17 significant) that read back, multiplied by the scale, to exactly the same hertz,
    /// so that 137.5 MHz is written as <c>137.5</c> rather than <c>137.50000000000003</c>.
    /// </summary>
    public static string FormatScaled(double hertz, double scale)
    {
        var scaled = hertz / scale;
        for (int digits = 15; digits <= 17; digits++)
        {
            var text = scaled.ToString("G" + digits.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
            if (TryParseNumber(text, out var back) && back * scale == hertz)
            {
                return text;
            }
        }

        return Format(scaled);
    }
}
