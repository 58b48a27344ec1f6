using System.Globalization;
using System.Text.RegularExpressions;
using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Errors;

namespace BenchRunner.Instruments.Scpi;

/// <summary>
/// Parses a decimal number in a reply: IEEE 488.2 NR1 (<c>+42</c>), NR2 (<c>-1.5</c>) or NR3
/// (<c>1.375E+08</c>). Spaces around the number are ignored; anything else (a unit, a comma, hex)
/// is a failure, not an exception.
/// </summary>
public static partial class ScpiNumber
{
    /// <summary>
    /// The value SCPI instruments send for "not a number" (9.91E37), e.g. a trace point with no
    /// valid measurement. It parses as an ordinary number; callers decide what it means.
    /// </summary>
    public const double NotANumber = 9.91e37;

    /// <summary>The value SCPI instruments send for positive infinity or overrange (9.9E37); negative infinity is its negation.</summary>
    public const double Infinity = 9.9e37;

    /// <summary>
    /// True for the not-a-number and infinity markers (magnitude 9.9E37 or more, allowing for the
    /// rounding of a float32), which stand for "no valid value" rather than a measurement.
    /// </summary>
    public static bool IsMarker(double value) => Math.Abs(value) >= Infinity * (1 - 1e-6);

    /// <summary>Parses an NR1, NR2 or NR3 number.</summary>
    public static ParseResult<double> Parse(string? reply)
    {
        var text = reply?.Trim() ?? "";
        if (!DecimalNumber().IsMatch(text)
            || !double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out double value)
            || !double.IsFinite(value))
        {
            return ParseResult<double>.Fail(
                $"\"{InstrumentException.Printable(text)}\" is not a number; expected a decimal number such as 42, -1.5 or 1.375E+08 (IEEE 488.2 NR1, NR2 or NR3)");
        }

        return ParseResult<double>.Ok(value);
    }

    /// <summary>Parses an NR1 number: an integer with an optional sign, such as <c>+0</c> or <c>-113</c>.</summary>
    public static ParseResult<long> ParseInteger(string? reply)
    {
        var text = reply?.Trim() ?? "";
        if (!Integer().IsMatch(text)
            || !long.TryParse(text, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out long value))
        {
            return ParseResult<long>.Fail(
                $"\"{InstrumentException.Printable(text)}\" is not an integer; expected a whole number such as 0, +1 or -113 (IEEE 488.2 NR1)");
        }

        return ParseResult<long>.Ok(value);
    }

    [GeneratedRegex(@"^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$", RegexOptions.CultureInvariant)]
    private static partial Regex DecimalNumber();

    [GeneratedRegex(@"^[+-]?\d+$", RegexOptions.CultureInvariant)]
    private static partial Regex Integer();
}
