using System.Globalization;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Cli.Output;

/// <summary>Number formatting for terminal output: short, unit-bearing, invariant culture.</summary>
public static class Display
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    /// <summary>A frequency with a prefix, e.g. <c>137.5123 MHz</c> (see <see cref="Hertz"/>).</summary>
    public static string Frequency(Frequency frequency) => Hertz(frequency.Hertz);

    /// <summary>
    /// A frequency in hertz with a prefix, resolved to 100 Hz in MHz, 1 Hz in kHz and 1 kHz in
    /// GHz (finer digits of a measured figure are noise), e.g. <c>137.5583 MHz</c>, <c>844.237 kHz</c>.
    /// </summary>
    public static string Hertz(double hertz)
    {
        var magnitude = Math.Abs(hertz);
        var (scale, unit, decimals) = magnitude >= 1e9 ? (1e9, "GHz", 6) : magnitude >= 1e6 ? (1e6, "MHz", 4) : magnitude >= 1e3 ? (1e3, "kHz", 3) : (1, "Hz", 1);
        return $"{Math.Round(hertz / scale, decimals).ToString("0.######", Invariant)} {unit}";
    }

    /// <summary>A level or ratio in dB with two decimals, e.g. <c>-2.31 dB</c>.</summary>
    public static string Decibels(double db, string unit = "dB") => $"{db.ToString("0.00", Invariant)} {unit}";

    /// <summary>A margin with an explicit sign, e.g. <c>+1.20 dB</c> or <c>-0.45 dB</c>.</summary>
    public static string Margin(double db) => $"{(db >= 0 ? "+" : "")}{db.ToString("0.00", Invariant)} dB";

    /// <summary>An absolute level with an explicit sign and no needless decimals, e.g. <c>+10 dBm</c>, <c>-20.5 dBm</c>.</summary>
    public static string Level(double dbm) => $"{(dbm > 0 ? "+" : "")}{dbm.ToString("0.##", Invariant)} dBm";

    /// <summary>A plain number with up to four significant decimals, e.g. a Q of <c>45.7</c>.</summary>
    public static string Number(double value) => value.ToString(Math.Abs(value) >= 100 ? "0.0" : "0.###", Invariant);

    /// <summary>Formats a figure value according to its unit.</summary>
    public static string Value(double value, string unit) => unit switch
    {
        "Hz" => Hertz(value),
        "dB" or "dBm" => Decibels(value, unit),
        "" => Number(value),
        _ => $"{Number(value)} {unit}",
    };

    /// <summary>Wraps <paramref name="text"/> in an ANSI colour when <paramref name="enabled"/>.</summary>
    public static string Colour(string text, ConsoleColour colour, bool enabled) =>
        enabled ? $"\u001b[{(int)colour}m{text}\u001b[0m" : text;
}
