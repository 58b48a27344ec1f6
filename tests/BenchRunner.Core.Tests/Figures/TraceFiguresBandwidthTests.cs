using BenchRunner.Core.Figures;

namespace BenchRunner.Core.Tests.Figures;

public class TraceFiguresBandwidthTests
{
    [Fact]
    public void Bandwidth_PiecewiseLinearTrace_CrossingsAreExact()
    {
        // Straight lines in dB between samples, so linear interpolation must land exactly (calc):
        // -3 dB between 99 (-10) and 100 (0) MHz at 99.7; symmetric above at 100.3.
        // -20 dB between 98 (-30) and 99 (-10) at 98.5; between 101 (-10) and 103 (-40) at 101 + 2·10/30.
        var trace = TestTraces.S21Mhz([98, 99, 100, 101, 103], [-30, -10, 0, -10, -40]);

        var bw3 = TraceFigures.Bandwidth(trace).Value;
        var bw20 = TraceFigures.Bandwidth(trace, 20).Value;

        Assert.Equal(99.7e6, bw3.Lower.Hertz, 1e-3);
        Assert.Equal(100.3e6, bw3.Upper.Hertz, 1e-3);
        Assert.Equal(0.6e6, bw3.Width.Hertz, 1e-3);
        Assert.Equal(100e6, bw3.Centre.Hertz, 1e-3);
        Assert.Equal(3, bw3.BelowPeakDb);
        Assert.Equal(98.5e6, bw20.Lower.Hertz, 1e-3);
        Assert.Equal((101 + 20.0 / 30) * 1e6, bw20.Upper.Hertz, 1e-3);
    }

    [Fact]
    public void Bandwidth_LoadedQ_IsCentreOverWidth()
    {
        // REFERENCES: loaded Q = f0/BW(-3 dB), 100 MHz / 2 MHz -> 50. Slopes of 3 dB/MHz put the
        // -3 dB crossings at 99 and 101 MHz exactly.
        var trace = TestTraces.S21Mhz([96, 100, 104], [-12, 0, -12]);

        var bw = TraceFigures.Bandwidth(trace).Value;

        Assert.Equal(2e6, bw.Width.Hertz, 1e-3);
        Assert.Equal(100e6, bw.Centre.Hertz, 1e-3);
        Assert.Equal(50, bw.LoadedQ, 1e-9);
    }

    [Fact]
    public void Bandwidth_TakesTheFirstCrossingWalkingOutward()
    {
        // A spurious lobe at 134 MHz rises back above -3 dB; the crossing nearest the peak counts:
        // 136 + 2/5 and 137 + 3/5 MHz (calc).
        var trace = TestTraces.S21Mhz([134, 135, 136, 137, 138, 139, 140], [-1, -10, -5, 0, -5, -10, -20]);

        var bw = TraceFigures.Bandwidth(trace).Value;

        Assert.Equal(136.4e6, bw.Lower.Hertz, 1e-3);
        Assert.Equal(137.6e6, bw.Upper.Hertz, 1e-3);
    }

    [Fact]
    public void Bandwidth_FlatTop_WalksOutFromBothEndsOfTheTop()
    {
        var trace = TestTraces.S21Mhz([136, 137, 138, 139, 140], [-10, 0, 0, 0, -10]);

        var bw = TraceFigures.Bandwidth(trace).Value;

        Assert.Equal(136.7e6, bw.Lower.Hertz, 1e-3);
        Assert.Equal(139.3e6, bw.Upper.Hertz, 1e-3);
    }

    [Fact]
    public void Bandwidth_PeakAtTheEdgeWithNoCrossing_IsUnavailableWithAReason()
    {
        var trace = TestTraces.S21Mhz([136, 137, 138], [-10, -5, -1]);

        var bw = TraceFigures.Bandwidth(trace);

        Assert.False(bw.IsAvailable);
        Assert.Contains("high-frequency side", bw.Reason);
    }

    [Fact]
    public void Bandwidth_NoCrossingOnEitherSide_SaysSo()
    {
        var trace = TestTraces.S21Mhz([136, 137, 138], [-1, 0, -1]);

        var bw = TraceFigures.Bandwidth(trace);

        Assert.False(bw.IsAvailable);
        Assert.Contains("either side", bw.Reason);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(-3)]
    [InlineData(double.NaN)]
    public void Bandwidth_DepthNotPositive_Throws(double depth)
    {
        var trace = TestTraces.S21Mhz([96, 100, 104], [-12, 0, -12]);
        Assert.Throws<ArgumentOutOfRangeException>(() => TraceFigures.Bandwidth(trace, depth));
    }

    [Fact]
    public void ShapeFactor_PiecewiseLinear_IsTheRatioOfTheTwoWidths()
    {
        // -3 dB at 99 and 101 MHz; -60 dB at 99 − 9·57/60 = 90.45 and 109.55 MHz; 19.1/2 = 9.55 (calc).
        var trace = TestTraces.S21Mhz([90, 99, 100, 101, 110], [-63, -3, 0, -3, -63]);

        Assert.Equal(9.55, TraceFigures.ShapeFactor(trace).Value, 1e-9);
    }

    [Fact]
    public void ShapeFactor_WideBandOutsideTheSweep_IsUnavailable()
    {
        var trace = TestTraces.S21Mhz([96, 100, 104], [-12, 0, -12]);

        var sf = TraceFigures.ShapeFactor(trace);

        Assert.False(sf.IsAvailable);
        Assert.Contains("60 dB", sf.Reason);
    }
}
