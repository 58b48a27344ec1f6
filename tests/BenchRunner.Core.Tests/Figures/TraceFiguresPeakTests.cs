using BenchRunner.Core.Figures;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Tests.Figures;

public class TraceFiguresPeakTests
{
    // A sampled parabola y = A − k(f − fv)²: the three-point fit is exact for it (calc).
    private static double Parabola(double hz) => -2 - 0.5 * Math.Pow((hz - 137.3e6) / 1e6, 2);

    [Fact]
    public void Peak_UniformlySampledParabola_RecoversTheVertexExactly()
    {
        var hz = new[] { 136.0e6, 136.5e6, 137.0e6, 137.5e6, 138.0e6, 138.5e6 };
        var trace = TestTraces.FromDb(TraceQuantity.S21, hz, hz.Select(Parabola).ToArray());

        var peak = TraceFigures.Peak(trace).Value;

        Assert.Equal(137.3e6, peak.Frequency.Hertz, 1e-3);
        Assert.Equal(-2.0, peak.LevelDb, 1e-9);
        Assert.Equal(3, peak.Index); // 137.5 MHz is the highest sample
    }

    [Fact]
    public void Peak_UnequallySpacedParabola_RecoversTheVertexExactly()
    {
        var hz = new[] { 136.0e6, 136.9e6, 137.2e6, 137.8e6, 139.0e6 };
        var trace = TestTraces.FromDb(TraceQuantity.S21, hz, hz.Select(Parabola).ToArray());

        var peak = TraceFigures.Peak(trace).Value;

        Assert.Equal(137.3e6, peak.Frequency.Hertz, 1e-3);
        Assert.Equal(-2.0, peak.LevelDb, 1e-9);
        Assert.Equal(2, peak.Index);
    }

    [Fact]
    public void Peak_SampledResonance_IsCloserThanTheRawSample()
    {
        // Series R-L-C (Pozar, Table 4.2) on a coarse 25 kHz grid that misses f0 by about 12 kHz.
        var trace = TestTraces.SeriesResonator(9.512e6, 10.512e6, 41);
        double f0 = TestTraces.SeriesF0;

        var peak = TraceFigures.Peak(trace).Value;
        double rawError = Math.Abs(trace.Axis.Hertz[peak.Index] - f0);
        double refinedError = Math.Abs(peak.Frequency.Hertz - f0);
        double exactDb = 20 * Math.Log10(100.0 / 105);

        Assert.True(rawError > 10e3, $"the grid should miss f0 by > 10 kHz, missed by {rawError} Hz");
        Assert.True(refinedError < rawError / 10, $"refined error {refinedError} Hz, raw {rawError} Hz");
        Assert.True(Math.Abs(peak.LevelDb - exactDb) < Math.Abs(trace.LevelsDb[peak.Index] - exactDb));
    }

    [Fact]
    public void Peak_AtTheEndOfTheSweep_IsTheRawSample()
    {
        var trace = TestTraces.S21Mhz([136, 137, 138], [-10, -5, -1]);

        var peak = TraceFigures.Peak(trace).Value;

        Assert.Equal(138e6, peak.Frequency.Hertz);
        Assert.Equal(-1, peak.LevelDb, 1e-12);
        Assert.Equal(2, peak.Index);
    }

    [Fact]
    public void Peak_FlatTop_IsTheMiddleOfTheFlatTopAtItsLevel()
    {
        var trace = TestTraces.Power([1e6, 2e6, 3e6, 4e6, 5e6, 6e6], [-40, -20, -20, -20, -20, -40]);

        var peak = TraceFigures.Peak(trace).Value;

        Assert.Equal(3.5e6, peak.Frequency.Hertz);
        Assert.Equal(-20, peak.LevelDb);
        Assert.Equal(2, peak.Index);
    }
}
