using System.Globalization;

namespace BenchRunner.Storage.Columns;

/// <summary>
/// Timestamps as stored: ISO 8601 in UTC, millisecond precision, a trailing <c>Z</c>
/// (<c>2025-03-14T09:30:00.000Z</c>). Fixed width, so text order is time order.
/// </summary>
internal static class UtcText
{
    private const string Format = "yyyy-MM-dd'T'HH:mm:ss.fff'Z'";

    /// <summary>The stored text of <paramref name="time"/>, converted to UTC and cut to whole milliseconds.</summary>
    public static string From(DateTimeOffset time) => time.UtcDateTime.ToString(Format, CultureInfo.InvariantCulture);

    /// <summary><paramref name="time"/> cut to the precision the file keeps (whole milliseconds), in UTC.</summary>
    public static DateTimeOffset Truncate(DateTimeOffset time)
    {
        var utc = time.ToUniversalTime();
        return utc.AddTicks(-(utc.Ticks % TimeSpan.TicksPerMillisecond));
    }

    /// <summary>Reads stored text back as a UTC time.</summary>
    /// <exception cref="FormatException">Not in the stored format.</exception>
    public static DateTimeOffset Parse(string text) =>
        DateTimeOffset.ParseExact(text, Format, CultureInfo.InvariantCulture, DateTimeStyles.AssumeUniversal | DateTimeStyles.AdjustToUniversal);
}
