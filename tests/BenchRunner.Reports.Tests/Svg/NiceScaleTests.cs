using BenchRunner.Reports.Svg;

namespace BenchRunner.Reports.Tests.Svg;

public sealed class NiceScaleTests
{
    // Axis steps of 1, 2 or 5 times a power of ten: common practice, no source.
    [Theory]
    [InlineData(0.3, 9.7, 6, 0, 10, 2)]
    [InlineData(-51.3, -2.1, 7, -60, 0, 10)]
    [InlineData(137.26, 137.84, 6, 137.2, 138.0, 0.2)]
    [InlineData(0, 8, 6, 0, 8, 2)]
    public void Enclosing_RoundsTheEndsToWholeSteps(double low, double high, int ticks, double min, double max, double step)
    {
        var scale = NiceScale.Enclosing(low, high, ticks);

        Assert.Equal(step, scale.Step, 9);
        Assert.Equal(min, scale.Minimum, 9);
        Assert.Equal(max, scale.Maximum, 9);
        Assert.True(scale.Minimum <= low && scale.Maximum >= high);
    }

    [Fact]
    public void Exact_KeepsTheEndsAndPutsRoundTicksInside()
    {
        var scale = NiceScale.Exact(127.5, 147.5, 9);

        Assert.Equal(127.5, scale.Minimum);
        Assert.Equal(147.5, scale.Maximum);
        Assert.Equal([130.0, 135.0, 140.0, 145.0], scale.Ticks());
    }

    [Fact]
    public void Enclosing_OneValue_GivesItRoomEitherSide()
    {
        var scale = NiceScale.Enclosing(4, 4);

        Assert.True(scale.Minimum < 4 && scale.Maximum > 4);
    }

    [Fact]
    public void Enclosing_NotFinite_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => NiceScale.Enclosing(double.NaN, 1));
        Assert.Throws<ArgumentException>(() => NiceScale.Exact(2, 2));
    }

    [Theory]
    // Sturges' rule, k = ⌈log2 n⌉ + 1 (Sturges 1926, "The choice of a class interval", from memory), never below 5.
    [InlineData(20, 6)]
    [InlineData(100, 8)]
    [InlineData(3, 5)]
    public void HistogramBins_FollowSturges(int count, int bins)
    {
        Assert.Equal(bins, HistogramPlot.Bins(count));
    }
}
