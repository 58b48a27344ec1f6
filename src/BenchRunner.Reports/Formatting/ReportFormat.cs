using System.Globalization;

namespace BenchRunner.Reports.Formatting;

/// <summary>
/// Axis units, percentages, times and coordinates for reports, in the invariant culture. Measured
/// values are formatted by Core's <c>QuantityFormat</c>, as everywhere else.
/// </summary>
public static class ReportFormat
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    /// <summary>
    /// The display unit for values of <paramref name="unit"/> around <paramref name="magnitude"/>:
    /// hertz get a prefix (kHz, MHz, GHz), every other unit is shown as it is.
    /// </summary>
    /// <returns>The factor to divide by, and the unit to show.</returns>
    public static (double Divisor, string Unit) DisplayUnit(double magnitude, string unit)
    {
        if (unit != "Hz")
        {
            return (1, unit);
        }

        var m = Math.Abs(magnitude);
        return m >= 1e9 ? (1e9, "GHz") : m >= 1e6 ? (1e6, "MHz") : m >= 1e3 ? (1e3, "kHz") : (1, "Hz");
    }

    /// <summary>A fraction from 0 to 1 as a percentage with one decimal, e.g. <c>85.0 %</c>.</summary>
    public static string Percent(double fraction) => $"{(100 * fraction).ToString("0.0", Invariant)} %";

    /// <summary>A time in UTC, to the second, e.g. <c>2026-12-02 05:13:04 UTC</c>.</summary>
    public static string Time(DateTimeOffset time) => time.UtcDateTime.ToString("yyyy-MM-dd HH:mm:ss", Invariant) + " UTC";

    /// <summary>A duration, e.g. <c>4.2 s</c> or <c>3 min 12 s</c>.</summary>
    public static string Duration(TimeSpan span) => span.TotalSeconds < 60
        ? $"{span.TotalSeconds.ToString("0.0", Invariant)} s"
        : $"{(int)span.TotalMinutes} min {span.Seconds} s";

    /// <summary>A coordinate for SVG: invariant, two decimals at most.</summary>
    public static string Coordinate(double value) => Math.Round(value, 2).ToString("0.##", Invariant);
}
