using System.Globalization;

namespace BenchRunner.Core.Quantities;

/// <summary>
/// The one formatter of measured values for people: terminal text, check wording, reports and logs.
/// Invariant culture; the unit follows after a space (none for a pure number).
/// </summary>
/// <remarks>
/// The rule, per unit (<see cref="QuantityUnit"/>):
/// <list type="bullet">
/// <item>Units that take prefixes (Hz, s, Ω) get the engineering prefix that puts the magnitude in
/// [1, 1000) (within the prefixes the unit has: hertz never go below 1 Hz, seconds never above 1 s)
/// and are rounded to the unit's significant digits: 7 for hertz (137.5642 MHz, 100 Hz resolution
/// at 100 MHz), 4 for seconds and ohms (159.2 ns, 1.2 kΩ). When rounding reaches 1000 the next
/// prefix is used (999.99996 kHz is 1 MHz).</item>
/// <item>Logarithmic units (dB, dBm) take no prefix and are rounded to 0.01 dB (-4.41 dB, -20.3 dBm).</item>
/// <item>Pure numbers (a Q, a shape factor) get 4 significant digits, but never lose whole digits
/// (45.7, 123.5, 12345).</item>
/// <item>Trailing zeros after the point are dropped (5 ns, 137.5 MHz); zero is <c>0</c> with the
/// base unit (<c>0 Hz</c>), and a value that rounds to zero never shows a minus sign.</item>
/// <item>NaN and infinities are refused with <see cref="ArgumentOutOfRangeException"/>.</item>
/// </list>
/// Stored values keep every digit; only the text is rounded.
/// </remarks>
public static class QuantityFormat
{
    private const int LogarithmicDecimals = 2;

    /// <summary>Formats <paramref name="quantity"/> by the rule above, e.g. <c>137.5642 MHz</c>.</summary>
    public static string Format(Quantity quantity) => Format(quantity.Value, quantity.Unit);

    /// <summary>Formats <paramref name="value"/> in <paramref name="unit"/> by the rule above.</summary>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is NaN or infinite.</exception>
    public static string Format(double value, QuantityUnit unit)
    {
        ArgumentNullException.ThrowIfNull(unit);
        return Format(value, unit, unit.SignificantDigits);
    }

    /// <summary>
    /// Formats <paramref name="value"/> in <paramref name="unit"/> with <paramref name="significantDigits"/>
    /// significant digits instead of the unit's own (for logarithmic units, the digits are ignored
    /// and the value is rounded to 0.01 dB).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is NaN or infinite, or
    /// <paramref name="significantDigits"/> is not between 1 and 15.</exception>
    public static string Format(double value, QuantityUnit unit, int significantDigits)
    {
        ArgumentNullException.ThrowIfNull(unit);
        RequireFinite(value);
        if (unit.IsLogarithmic)
        {
            return Join(Number(RoundAt(value, LogarithmicDecimals)), unit.Symbol);
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(significantDigits, 1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(significantDigits, 15);
        return Scaled(value, significantDigits, unit.Prefixes, unit.Symbol);
    }

    /// <summary>
    /// Formats <paramref name="value"/> as <see cref="Format(double, QuantityUnit)"/> does, with an
    /// explicit plus sign when it is shown above zero: a margin such as <c>+1.2 dB</c>, <c>-0.45 dB</c>
    /// or <c>0 dB</c>, a level such as <c>+10 dBm</c>.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is NaN or infinite.</exception>
    public static string Signed(double value, QuantityUnit unit) => WithSign(Format(value, unit));

    /// <summary>
    /// Formats a value of a stored unit text with an explicit plus sign, as <see cref="Signed(double, QuantityUnit)"/>
    /// does; a text that names no unit is treated as <see cref="Format(double, string)"/> treats it.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is NaN or infinite.</exception>
    public static string Signed(double value, string? unitSymbol) => WithSign(Format(value, unitSymbol));

    /// <summary>
    /// Formats a value of a stored unit text (<c>Hz</c>, <c>dB</c>, <c>dBm</c>, empty...). A text that
    /// names no <see cref="QuantityUnit"/> is shown after the value as a pure number.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is NaN or infinite.</exception>
    public static string Format(double value, string? unitSymbol) =>
        QuantityUnit.FromSymbol(unitSymbol ?? "") is { } unit
            ? Format(value, unit)
            : Join(Scaled(value, QuantityUnit.None.SignificantDigits, [], ""), unitSymbol!);

    /// <summary>
    /// The place value of the last digit <see cref="Format(double, QuantityUnit)"/> shows of
    /// <paramref name="value"/>, in the unit itself: 100 for 137.5642 MHz, 0.01 for any dB, 0.1
    /// for a Q of 45.7 (shown to four significant digits, 45.70). A change smaller than half of it cannot be seen in the text. Zero for a zero value.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is NaN or infinite.</exception>
    public static double Resolution(double value, QuantityUnit unit)
    {
        ArgumentNullException.ThrowIfNull(unit);
        RequireFinite(value);
        if (unit.IsLogarithmic)
        {
            return Math.Pow(10, -LogarithmicDecimals);
        }

        if (value == 0)
        {
            return 0;
        }

        var scale = unit.Prefixes.Count == 0 ? 1 : Prefix(Math.Abs(value), unit.Prefixes).Scale;
        return scale * Math.Pow(10, -Decimals(value / scale, unit.SignificantDigits));
    }

    /// <summary>
    /// Scales <paramref name="value"/> to the fitting prefix of <paramref name="prefixes"/> (largest
    /// first; none for a plain number) and rounds it to <paramref name="significant"/> digits.
    /// </summary>
    internal static string Scaled(double value, int significant, IReadOnlyList<(double Scale, string Prefix)> prefixes, string symbol)
    {
        RequireFinite(value);
        if (value == 0 || prefixes.Count == 0)
        {
            return Join(Number(RoundSignificant(value, significant)), symbol);
        }

        var index = Prefix(Math.Abs(value), prefixes).Index;
        var rounded = RoundSignificant(value / prefixes[index].Scale, significant);
        if (Math.Abs(rounded) >= 1000 && index > 0 && Math.Abs(prefixes[index - 1].Scale / prefixes[index].Scale - 1000) < 1e-6)
        {
            // Rounding carried into the next prefix: 999.99996 kHz is 1 MHz, not 1000 kHz.
            index--;
            rounded = RoundSignificant(rounded / 1000, significant);
        }

        return Join(Number(rounded), prefixes[index].Prefix + symbol);
    }

    // The text shows zero when its number has no digit but 0 (the minus sign of a negative zero is never written).
    private static string WithSign(string text) =>
        text.StartsWith('-') || !text.TakeWhile(c => c != ' ').Any(c => c is >= '1' and <= '9') ? text : "+" + text;

    // The largest prefix not above the magnitude, or the smallest one.
    private static (int Index, double Scale) Prefix(double magnitude, IReadOnlyList<(double Scale, string Prefix)> prefixes)
    {
        for (var i = 0; i < prefixes.Count; i++)
        {
            if (magnitude >= prefixes[i].Scale)
            {
                return (i, prefixes[i].Scale);
            }
        }

        return (prefixes.Count - 1, prefixes[^1].Scale);
    }

    private static double RoundSignificant(double value, int significant) =>
        value == 0 ? 0 : RoundAt(value, Decimals(value, significant));

    // Decimals that leave `significant` digits, never fewer than the whole digits, at most 15 (Math.Round's limit).
    private static int Decimals(double value, int significant) =>
        Math.Clamp(significant - 1 - (int)Math.Floor(Math.Log10(Math.Abs(value))), 0, 15);

    // Math.Round accepts 0 to 15 decimals; adding zero turns a negative zero into zero.
    private static double RoundAt(double value, int decimals) =>
        Math.Round(value, decimals, MidpointRounding.AwayFromZero) + 0.0;

    private static string Number(double value) => value.ToString("0.###############", CultureInfo.InvariantCulture);

    private static string Join(string number, string unit) => unit.Length == 0 ? number : $"{number} {unit}";

    private static void RequireFinite(double value)
    {
        if (!double.IsFinite(value))
        {
            throw new ArgumentOutOfRangeException(nameof(value), value, "Only a finite value can be formatted.");
        }
    }
}
