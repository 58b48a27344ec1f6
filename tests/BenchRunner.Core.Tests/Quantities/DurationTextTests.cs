using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Tests.Quantities;

public class DurationTextTests
{
    [Theory]
    [InlineData("250 ms", 250 * TimeSpan.TicksPerMillisecond)]
    [InlineData("2 s", 2 * TimeSpan.TicksPerSecond)]
    [InlineData("1.5 min", 90 * TimeSpan.TicksPerSecond)]
    [InlineData("2 h", 2 * TimeSpan.TicksPerHour)]
    [InlineData("500 us", 5000)]
    [InlineData("500 µs", 5000)]
    [InlineData("500 \u03BCs", 5000)]
    [InlineData("250ms", 250 * TimeSpan.TicksPerMillisecond)]
    [InlineData("2 S", 2 * TimeSpan.TicksPerSecond)]
    [InlineData("0.1 us", 1)]
    [InlineData("0 s", 0)]
    [InlineData("1e3 ms", TimeSpan.TicksPerSecond)]
    public void Parse_ValidText_GivesDuration(string text, long ticks)
    {
        var result = DurationText.Parse(text);

        Assert.True(result.Success, result.Error);
        Assert.Equal(TimeSpan.FromTicks(ticks), result.Value);
    }

    [Theory]
    [InlineData("", "empty")]
    [InlineData(null, "empty")]
    [InlineData("abc", "does not start with a number")]
    [InlineData("NaN s", "does not start with a number")]
    [InlineData("250", "has no unit")]
    [InlineData("250 mss", "unknown duration unit \"mss\"")]
    [InlineData("5 days", "unknown duration unit \"days\"")]
    [InlineData("5 m", "write \"min\" for minutes")]
    [InlineData("-5 s", "negative")]
    [InlineData("1e300 h", "too long")]
    [InlineData("0.01 us", "shorter than the 0.1 us resolution")]
    public void Parse_BadText_FailsWithMessage(string? text, string messagePart)
    {
        var result = DurationText.Parse(text);

        Assert.False(result.Success);
        Assert.Contains(messagePart, result.Error);
    }

    [Theory]
    [InlineData(250 * TimeSpan.TicksPerMillisecond, "250 ms")]
    [InlineData(2 * TimeSpan.TicksPerSecond, "2 s")]
    [InlineData(90 * TimeSpan.TicksPerSecond, "1.5 min")]
    [InlineData(62 * TimeSpan.TicksPerSecond, "62 s")]
    [InlineData(2 * TimeSpan.TicksPerHour, "2 h")]
    [InlineData(90 * TimeSpan.TicksPerMinute, "1.5 h")]
    [InlineData(5000, "500 us")]
    [InlineData(5, "0.5 us")]
    [InlineData(12_345_678, "1.2345678 s")]
    [InlineData(0, "0 s")]
    [InlineData(-250 * TimeSpan.TicksPerMillisecond, "-250 ms")]
    public void Format_ChoosesReadableUnit(long ticks, string expected)
    {
        Assert.Equal(expected, DurationText.Format(TimeSpan.FromTicks(ticks)));
    }

    [Theory]
    [InlineData(1)]
    [InlineData(5000)]
    [InlineData(2_500_000)]
    [InlineData(12_345_678)]
    [InlineData(62 * TimeSpan.TicksPerSecond + 1)]
    [InlineData(90 * TimeSpan.TicksPerSecond)]
    [InlineData(25 * TimeSpan.TicksPerHour + 7)]
    [InlineData(1_000_000 * TimeSpan.TicksPerHour)]
    public void Format_ThenParse_RoundTripsExactly(long ticks)
    {
        var duration = TimeSpan.FromTicks(ticks);

        Assert.Equal(duration, DurationText.Parse(DurationText.Format(duration)).GetValueOrThrow());
    }

    [Fact]
    public void Format_Extremes_DoNotThrow()
    {
        Assert.StartsWith("-", DurationText.Format(TimeSpan.MinValue));
        Assert.EndsWith(" s", DurationText.Format(TimeSpan.MaxValue));
    }
}
