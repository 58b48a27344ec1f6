using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Tests.Quantities;

public class RatioTests
{
    [Theory]
    [InlineData("3 dB", 3)]
    [InlineData("-0.5dB", -0.5)]
    [InlineData("20 DB", 20)]
    [InlineData("+1.25 db", 1.25)]
    public void Parse_ValidText_GivesDecibels(string text, double decibels)
    {
        var result = Ratio.Parse(text);

        Assert.True(result.Success, result.Error);
        Assert.Equal(decibels, result.Value.Decibels, 12);
    }

    [Theory]
    [InlineData("", "empty")]
    [InlineData("abc", "does not start with a number")]
    [InlineData("NaN", "does not start with a number")]
    [InlineData("3", "has no unit")]
    [InlineData("3 dBm", "unknown ratio unit \"dBm\"")]
    [InlineData("3 dBB", "unknown ratio unit \"dBB\"")]
    public void Parse_BadText_FailsWithMessage(string text, string messagePart)
    {
        var result = Ratio.Parse(text);

        Assert.False(result.Success);
        Assert.Contains(messagePart, result.Error);
    }

    [Theory]
    [InlineData(3)]
    [InlineData(-0.5)]
    [InlineData(39.554)]
    public void ToString_ThenParse_RoundTrips(double decibels)
    {
        var ratio = Ratio.FromDecibels(decibels);

        Assert.Equal(ratio, Ratio.Parse(ratio.ToString()).GetValueOrThrow());
    }

    [Fact]
    public void ToString_FormatsDecibels()
    {
        Assert.Equal("3 dB", Ratio.FromDecibels(3).ToString());
        Assert.Equal("-0.5 dB", Ratio.FromDecibels(-0.5).ToString());
        Assert.Equal("0 dB", Ratio.FromDecibels(-1e-9).ToString());
    }

    [Fact]
    public void PowerAndVoltageRatio_TwentyDecibels()
    {
        // Definition of the decibel: 20 dB = power ×100 = voltage ×10.
        Assert.Equal(100, Ratio.FromDecibels(20).PowerRatio, 10);
        Assert.Equal(10, Ratio.FromDecibels(20).VoltageRatio, 12);
    }

    [Fact]
    public void FromDecibels_NotFinite_Throws()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Ratio.FromDecibels(double.NaN));
        Assert.Throws<ArgumentOutOfRangeException>(() => Ratio.FromDecibels(double.NegativeInfinity));
    }
}
