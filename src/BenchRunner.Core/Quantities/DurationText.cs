using System.Globalization;

namespace BenchRunner.Core.Quantities;

/// <summary>
/// Reads and writes durations (settle times, timeouts, dwell times) as text such as
/// <c>250 ms</c>, <c>2 s</c>, <c>1.5 min</c>, <c>2 h</c> or <c>500 µs</c>.
/// A <see cref="TimeSpan"/> has a resolution of 100 ns; parsed values are rounded to it.
/// </summary>
public static class DurationText
{
    private const string Expected = "a duration such as \"250 ms\", \"2 s\", \"1.5 min\", \"2 h\" or \"500 us\"";

    /// <summary>
    /// Parses a non-negative duration. The unit is required and its letter case is ignored:
    /// <c>us</c>, <c>µs</c> or <c>μs</c> (microseconds), <c>ms</c>, <c>s</c>, <c>min</c>, <c>h</c>.
    /// A bare <c>m</c> is refused (minutes or metres?); write <c>min</c>.
    /// </summary>
    /// <returns>The duration, or an error for an empty, unitless, negative, too long, or
    /// non-zero but shorter than 100 ns value.</returns>
    public static ParseResult<TimeSpan> Parse(string? text)
    {
        var split = QuantityText.Split(text, Expected);
        if (!split.Success)
        {
            return ParseResult<TimeSpan>.Fail(split.Error);
        }

        var (number, unit) = split.Value;
        var shown = text!.Trim();
        long unitTicks;
        switch (unit.ToLowerInvariant())
        {
            case "us": case "\u00B5s": case "\u03BCs": unitTicks = 10; break;
            case "ms": unitTicks = TimeSpan.TicksPerMillisecond; break;
            case "s": unitTicks = TimeSpan.TicksPerSecond; break;
            case "min": unitTicks = TimeSpan.TicksPerMinute; break;
            case "h": unitTicks = TimeSpan.TicksPerHour; break;
            case "":
                return ParseResult<TimeSpan>.Fail($"\"{shown}\" has no unit; expected {Expected}");
            case "m":
                return ParseResult<TimeSpan>.Fail($"\"{shown}\": write \"min\" for minutes (or \"ms\" for milliseconds)");
            default:
                return ParseResult<TimeSpan>.Fail($"unknown duration unit \"{unit}\" in \"{shown}\"; expected us, ms, s, min or h");
        }

        if (number < 0)
        {
            return ParseResult<TimeSpan>.Fail($"\"{shown}\" is negative; a duration must not be negative");
        }

        var ticks = Math.Round(number * unitTicks);
        // long.MaxValue is not exactly representable; as a double it rounds up to 2^63.
        if (ticks >= long.MaxValue)
        {
            return ParseResult<TimeSpan>.Fail($"\"{shown}\" is too long for a duration");
        }

        if (ticks == 0 && number > 0)
        {
            return ParseResult<TimeSpan>.Fail($"\"{shown}\" is shorter than the 0.1 us resolution of a duration");
        }

        return ParseResult<TimeSpan>.Ok(TimeSpan.FromTicks((long)ticks));
    }

    /// <summary>
    /// Formats a duration so that <see cref="Parse"/> reads back exactly the same value:
    /// in hours or minutes when it is a whole or short decimal number of them (<c>2 h</c>,
    /// <c>1.5 min</c>), otherwise in the largest of s, ms and µs that is not above it
    /// (<c>250 ms</c>, <c>0.5 us</c>). Zero is <c>0 s</c>. A negative duration is formatted
    /// with a leading minus sign, which <see cref="Parse"/> refuses.
    /// </summary>
    public static string Format(TimeSpan duration)
    {
        if (duration == TimeSpan.Zero)
        {
            return "0 s";
        }

        var sign = duration < TimeSpan.Zero ? "-" : "";
        // decimal holds every tick count exactly; TimeSpan.MinValue has no positive twin in long.
        var ticks = Math.Abs((decimal)duration.Ticks);

        foreach (var (unitTicks, symbol) in (ReadOnlySpan<(long, string)>)[(TimeSpan.TicksPerHour, "h"), (TimeSpan.TicksPerMinute, "min")])
        {
            if (ticks >= unitTicks)
            {
                var value = ticks / unitTicks;
                // Only short, exact decimals: 1.5 min yes, 1.0333... min no (that becomes 62 s).
                if (decimal.Round(value, 6) == value)
                {
                    return $"{sign}{value.ToString("0.######", CultureInfo.InvariantCulture)} {symbol}";
                }
            }
        }

        // s, ms and µs are powers of ten of ticks, so these decimals are always exact.
        var (scale, unit) = ticks >= TimeSpan.TicksPerSecond ? (TimeSpan.TicksPerSecond, "s")
            : ticks >= TimeSpan.TicksPerMillisecond ? (TimeSpan.TicksPerMillisecond, "ms")
            : (10L, "us");
        return $"{sign}{(ticks / scale).ToString("0.#######", CultureInfo.InvariantCulture)} {unit}";
    }
}
