using BenchRunner.Core.Statistics;

namespace BenchRunner.Core.Tests.Statistics;

public sealed class SampleStatisticsTests
{
    [Fact]
    public void From_TextbookSet_GivesSampleDeviationWithNMinusOne()
    {
        var stats = SampleStatistics.From([2, 4, 4, 4, 5, 5, 7, 9]);

        // calc: mean 40/8 = 5; squared deviations sum to 32; population σ = sqrt(32/8) = 2,
        // sample s = sqrt(32/7) = 2.13809.
        Assert.Equal(8, stats.Count);
        Assert.Equal(5.0, stats.Mean, 12);
        Assert.Equal(Math.Sqrt(32.0 / 7.0), stats.StandardDeviation, 12);
        Assert.Equal(2.138, stats.StandardDeviation, 3);
        Assert.Equal(2.0, stats.Minimum);
        Assert.Equal(9.0, stats.Maximum);
    }

    [Fact]
    public void From_LargeOffset_KeepsTheDeviation()
    {
        // calc: the same set shifted by 137.5e6 (a centre frequency in hertz) has the same s.
        var stats = SampleStatistics.From(new double[] { 2, 4, 4, 4, 5, 5, 7, 9 }.Select(x => x + 137.5e6));

        Assert.Equal(137.5e6 + 5, stats.Mean, 6);
        Assert.Equal(Math.Sqrt(32.0 / 7.0), stats.StandardDeviation, 6);
    }

    [Fact]
    public void From_OneSample_HasZeroDeviation()
    {
        var stats = SampleStatistics.From([137.5]);

        Assert.Equal(1, stats.Count);
        Assert.Equal(137.5, stats.Mean);
        Assert.Equal(0.0, stats.StandardDeviation);
    }

    [Fact]
    public void From_Empty_IsRefused()
    {
        var ex = Assert.Throws<ArgumentException>(() => SampleStatistics.From([]));
        Assert.Contains("No samples", ex.Message);
    }

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    public void From_NonFiniteSample_IsRefused(double bad)
    {
        var ex = Assert.Throws<ArgumentException>(() => SampleStatistics.From([1.0, bad, 3.0]));
        Assert.Contains("Sample 1", ex.Message);
    }
}
