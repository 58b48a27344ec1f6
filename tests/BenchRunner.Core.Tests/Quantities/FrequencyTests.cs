using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Tests.Quantities;

public class FrequencyTests
{
    [Theory]
    [InlineData("137.5 MHz", 137.5e6)]
    [InlineData("21.4MHz", 21.4e6)]
    [InlineData("2.5 GHz", 2.5e9)]
    [InlineData("455 kHz", 455e3)]
    [InlineData("1e6", 1e6)]
    [InlineData("1E6 Hz", 1e6)]
    [InlineData("  10.7 mhz  ", 10.7e6)]
    [InlineData("0.5GHZ", 0.5e9)]
    [InlineData("+3 kHz", 3e3)]
    [InlineData(".5 MHz", 0.5e6)]
    [InlineData("0 Hz", 0)]
    public void Parse_ValidText_GivesHertz(string text, double hertz)
    {
        var result = Frequency.Parse(text);

        Assert.True(result.Success, result.Error);
        Assert.Equal(hertz, result.Value.Hertz, 1e-6);
    }

    [Theory]
    [InlineData("", "empty")]
    [InlineData("   ", "empty")]
    [InlineData(null, "empty")]
    [InlineData("abc", "does not start with a number")]
    [InlineData("NaN", "does not start with a number")]
    [InlineData("12 MHzz", "unknown frequency unit \"MHzz\"")]
    [InlineData("12 dBm", "unknown frequency unit \"dBm\"")]
    [InlineData("-5 MHz", "negative")]
    [InlineData("1.2.3 MHz", "not a valid number")]
    [InlineData("1e400 Hz", "not a valid number")]
    [InlineData("1e300 GHz", "too large")]
    public void Parse_BadText_FailsWithMessage(string? text, string messagePart)
    {
        var result = Frequency.Parse(text);

        Assert.False(result.Success);
        Assert.Contains(messagePart, result.Error);
    }

    [Fact]
    public void Parse_BadText_MessageSaysWhatIsExpected()
    {
        var result = Frequency.Parse("abc");

        Assert.Contains("expected a frequency such as \"137.5 MHz\"", result.Error);
    }

    [Fact]
    public void Parse_NegativeZero_GivesPositiveZero()
    {
        var frequency = Frequency.Parse("-0 MHz").GetValueOrThrow();

        Assert.Equal("0 Hz", frequency.ToString());
        Assert.False(double.IsNegative(frequency.Hertz));
    }

    [Theory]
    [InlineData(137.5e6, "137.5 MHz")]
    [InlineData(21.4e6, "21.4 MHz")]
    [InlineData(2.5e9, "2.5 GHz")]
    [InlineData(455e3, "455 kHz")]
    [InlineData(50, "50 Hz")]
    [InlineData(0, "0 Hz")]
    [InlineData(999.9999999e6, "1 GHz")]
    [InlineData(136.123456789e6, "136.123457 MHz")]
    public void ToString_UsesLargestFittingPrefix(double hertz, string expected)
    {
        Assert.Equal(expected, Frequency.FromHertz(hertz).ToString());
    }

    [Theory]
    [InlineData(1e-10)]
    [InlineData(1e-3)]
    [InlineData(0.25)]
    public void ToString_BelowOneHertz_DoesNotThrow(double hertz)
    {
        var text = Frequency.FromHertz(hertz).ToString();

        Assert.EndsWith(" Hz", text);
        Assert.Equal(hertz, Frequency.Parse(text).GetValueOrThrow().Hertz, hertz * 1e-6);
    }

    [Theory]
    [InlineData(137.5e6)]
    [InlineData(21.4e6)]
    [InlineData(2.5e9)]
    [InlineData(455e3)]
    [InlineData(136.000001e6)]
    [InlineData(1)]
    public void ToString_ThenParse_RoundTrips(double hertz)
    {
        var frequency = Frequency.FromHertz(hertz);

        Assert.Equal(frequency, Frequency.Parse(frequency.ToString()).GetValueOrThrow());
    }

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    [InlineData(-1)]
    public void FromHertz_Invalid_Throws(double hertz)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Frequency.FromHertz(hertz));
    }

    [Fact]
    public void Factories_ScaleByPrefix()
    {
        Assert.Equal(455e3, Frequency.FromKilohertz(455).Hertz);
        Assert.Equal(137.5e6, Frequency.FromMegahertz(137.5).Hertz);
        Assert.Equal(2.5e9, Frequency.FromGigahertz(2.5).Hertz);
        Assert.Equal(137.5, Frequency.FromHertz(137.5e6).Megahertz, 12);
    }

    [Fact]
    public void Subtraction_BelowZero_Throws()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Frequency.FromMegahertz(1) - Frequency.FromMegahertz(2));
        Assert.Equal(Frequency.FromMegahertz(3), Frequency.FromMegahertz(139) - Frequency.FromMegahertz(136));
    }
}
