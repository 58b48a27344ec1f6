using BenchRunner.Core.TraceFiles;

namespace BenchRunner.Core.Tests.TraceFiles;

public class TraceFileTextTests
{
    [Theory]
    [InlineData("137.5", 6, 137.5e6)]
    [InlineData("0.1335", 9, 133.5e6)]
    [InlineData("1.5E-3", 6, 1500.0)]
    [InlineData("-2e+1", 3, -20e3)]
    [InlineData(".95", 0, 0.95)]
    public void TryParseScaled_MovesTheExponent(string text, int power, double expected)
    {
        Assert.True(TraceFileText.TryParseScaled(text, power, out var value));
        Assert.Equal(expected, value);
    }

    [Theory]
    [InlineData("0.9x")]
    [InlineData("1e")]
    [InlineData("NaN")]
    [InlineData("Infinity")]
    [InlineData("")]
    public void TryParseScaled_NotAFiniteNumber_Fails(string text)
    {
        Assert.False(TraceFileText.TryParseScaled(text, 6, out _));
    }

    [Fact]
    public void FormatScaled_HertzWithNoShortScaledText_StillReadsBackExactly()
    {
        var hertz = Math.BitIncrement(133.5e6);

        var text = TraceFileText.FormatScaled(hertz, 9);

        Assert.True(TraceFileText.TryParseScaled(text, 9, out var back));
        Assert.Equal(hertz, back);
    }
}
