using BenchRunner.Core.Figures;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Tests.Figures;

/// <summary>
/// The REFERENCES exact case: series R = 5 Ω, L = 100 µH, C = 2.5330 pF between 50 Ω ports,
/// S21 = 2Z0/(2Z0 + Z) (Pozar, Microwave Engineering, Table 4.2), sampled at 2001 points over
/// 9.5–10.5 MHz (500 Hz apart).
/// </summary>
public class TraceFiguresQTests
{
    private static readonly ComplexTrace Resonator = TestTraces.SeriesResonator(9.5e6, 10.5e6, 2001);

    // The half-power edges are where the series reactance equals ±(R + 2Z0) = ±105 Ω (calc).
    private static readonly double LowerHalfPower = TestTraces.SeriesReactanceHz(-105);
    private static readonly double UpperHalfPower = TestTraces.SeriesReactanceHz(105);

    [Fact]
    public void Peak_SeriesResonator_IsAtF0WithS21Of100Over105()
    {
        var peak = TraceFigures.Peak(Resonator).Value;

        // REFERENCES: f0 = 10 MHz; C is given to 5 figures, so 1/(2π√(LC)) = 10.00006 MHz.
        Assert.Equal(10e6, peak.Frequency.Hertz, 100.0);
        // The raw sample misses f0 by 58 Hz; the parabola over 500 Hz spacing on a 167 kHz wide
        // peak is good to about 0.01 Hz, so 1 Hz is a generous bound that the raw sample fails.
        Assert.Equal(TestTraces.SeriesF0, peak.Frequency.Hertz, 1.0);
        // REFERENCES: |S21| = 100/105, -0.42379 dB; the peak is flat to 1e-9 dB within 1 Hz.
        Assert.Equal(20 * Math.Log10(100.0 / 105), peak.LevelDb, 1e-6);
        Assert.Equal(-0.42379, peak.LevelDb, 5e-6);
    }

    [Fact]
    public void Bandwidth_HalfPower_SeriesResonator_MatchesTheExactEdges()
    {
        var bw = TraceFigures.Bandwidth(Resonator, TraceFigures.HalfPowerDb).Value;

        // Linear interpolation over 500 Hz of a curve whose slope changes by about 1 % over that
        // span leaves about 0.002 Hz of error (calc); 0.05 Hz allows for it.
        Assert.Equal(LowerHalfPower, bw.Lower.Hertz, 0.05);
        Assert.Equal(UpperHalfPower, bw.Upper.Hertz, 0.05);
        // REFERENCES: BW = (R + 2Z0)/(2πL) = 167.113 kHz.
        Assert.Equal(167_113, bw.Width.Hertz, 0.5);
    }

    [Fact]
    public void Bandwidth_Exactly3Db_SeriesResonator_IsNarrowerThanHalfPower()
    {
        var bw = TraceFigures.Bandwidth(Resonator).Value;

        // At 3.000 dB the reactance is 105·√(10^0.3 − 1) Ω: 166.716 kHz, 0.24 % under the
        // half-power width (calc from the same circuit).
        double x = 105 * Math.Sqrt(Math.Pow(10, 0.3) - 1);
        double expected = TestTraces.SeriesReactanceHz(x) - TestTraces.SeriesReactanceHz(-x);
        Assert.Equal(expected, bw.Width.Hertz, 0.05);
        Assert.Equal(166_716, bw.Width.Hertz, 1.0);
    }

    [Fact]
    public void LoadedQ_SeriesResonator_IsCentreOverHalfPowerWidth()
    {
        var bw = TraceFigures.Bandwidth(Resonator, TraceFigures.HalfPowerDb).Value;

        // The centre is the arithmetic mean of the edges, which for a series resonance lies
        // BW²/(8 f0) ≈ 349 Hz above f0 (the geometric mean); QL computed the same way (calc):
        double exactQ = (LowerHalfPower + UpperHalfPower) / 2 / (UpperHalfPower - LowerHalfPower);
        Assert.Equal(exactQ, bw.LoadedQ, 1e-5);
        // REFERENCES: QL = ω0L/(R + 2Z0) = 59.840, from f0 itself; the arithmetic centre puts
        // ours 4e-5 higher, so the tolerance is 1e-4 relative.
        Assert.Equal(59.840, bw.LoadedQ, 59.840 * 1e-4);
    }

    [Fact]
    public void UnloadedQ_SeriesResonator_IsOmegaLOverR()
    {
        var qu = TraceFigures.UnloadedQ(Resonator).Value;

        // REFERENCES: Qu = ω0L/R = 1256.64 = QL/(1 − |S21|) (Kajfez, Q Factor; from memory);
        // the same 4e-5 offset of the arithmetic centre carries through, hence 1e-4 relative.
        Assert.Equal(2 * Math.PI * TestTraces.SeriesF0 * TestTraces.SeriesL / TestTraces.SeriesR, qu, 1256.64 * 1e-4);
        Assert.Equal(1256.64, qu, 1256.64 * 1e-4);
    }

    [Theory]
    // Kajfez, Q Factor; Ginzton, Microwave Measurements; from memory (REFERENCES).
    [InlineData(50, -6, 100.24)]
    [InlineData(50, -20, 55.556)]
    [InlineData(100, -3, 342.40)]
    public void UnloadedQ_FromLoadedQ_MatchesTheTable(double loadedQ, double s21Db, double expected)
    {
        var qu = TraceFigures.UnloadedQ(loadedQ, s21Db).Value;

        // The table is rounded to 5 significant figures.
        Assert.Equal(expected, qu, expected * 5e-5);
    }

    [Fact]
    public void UnloadedQ_TransmissionAtOrAboveUnity_IsUnavailable()
    {
        Assert.False(TraceFigures.UnloadedQ(50, 0).IsAvailable);
        var gain = TestTraces.S21Mhz([96, 100, 104], [-10, 2, -10]);

        var qu = TraceFigures.UnloadedQ(gain);

        Assert.False(qu.IsAvailable);
        Assert.Contains("passive", qu.Reason);
    }

    [Fact]
    public void UnloadedQ_NoBandwidth_IsUnavailable()
    {
        var trace = TestTraces.S21Mhz([136, 137, 138], [-10, -5, -1]);

        Assert.False(TraceFigures.UnloadedQ(trace).IsAvailable);
    }

    [Fact]
    public void UnloadedQ_ReflectionTrace_IsUnavailable()
    {
        var s11 = TestTraces.FromDb(TraceQuantity.S11, [96e6, 100e6, 104e6], [-1, -20, -1]);

        var qu = TraceFigures.UnloadedQ(s11);

        Assert.False(qu.IsAvailable);
        Assert.Contains("S11", qu.Reason);
    }
}
