using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Tests.Figures;

public class PowerFiguresPeaksTests
{
    private const double CarrierHz = 137.5004e6, SpurHz = 137.7996e6, RbwHz = 10e3;

    /// <summary>
    /// 137–138 MHz in 1 kHz bins: a -30 dBm carrier and a -70 dBm spur seen through a Gaussian
    /// 10 kHz RBW filter (a parabola in dB, -3 dB at ±RBW/2), over a -100 dBm floor with a seeded
    /// uniform ±1.5 dB ripple, all added as linear power.
    /// </summary>
    internal static PowerTrace Spectrum()
    {
        var random = new Random(240001);
        var hz = TestTraces.LinearHz(137e6, 1e3, 1001);
        var levels = hz.Select(f =>
        {
            double noise = -100 + (random.NextDouble() * 3 - 1.5);
            double mw = Mw(noise) + Mw(Line(f, CarrierHz, -30)) + Mw(Line(f, SpurHz, -70));
            return 10 * Math.Log10(mw);
        }).ToArray();
        return TestTraces.Power(hz, levels);
    }

    private static double Line(double f, double centre, double dbm) => dbm - 3 * Math.Pow((f - centre) / (RbwHz / 2), 2);

    private static double Mw(double dbm) => Math.Pow(10, dbm / 10);

    [Fact]
    public void Peaks_CarrierSpurAndRipplingFloor_FindsExactlyCarrierAndSpur()
    {
        var peaks = PowerFigures.Peaks(Spectrum(), Level.FromDbm(-90));

        Assert.Equal(2, peaks.Count);
        // Off-grid by 400 Hz. The three-point fit is exact for a parabola in dB; only the floor's
        // share disturbs it: 1e-7 of the carrier (well under 1 Hz, 1e-4 dB) and 1e-3 of the spur
        // (+0.0043 dB, a few hertz of skew from the ripple under it).
        Assert.Equal(CarrierHz, peaks[0].Frequency.Hertz, 1.0);
        Assert.Equal(-30, peaks[0].LevelDb, 1e-4);
        Assert.Equal(SpurHz, peaks[1].Frequency.Hertz, 20.0);
        Assert.Equal(-70, peaks[1].LevelDb, 0.01);
    }

    [Fact]
    public void Peaks_WithoutAnExcursion_AlsoKeepsTheRipples()
    {
        // Shows that the excursion rule, not the threshold, removes the ripples.
        var peaks = PowerFigures.Peaks(Spectrum(), Level.FromDbm(-110), minExcursionDb: 0);

        Assert.True(peaks.Count > 100, $"found only {peaks.Count} local maxima");
    }

    [Fact]
    public void Peaks_ThresholdAboveTheSpur_KeepsOnlyTheCarrier()
    {
        var peaks = PowerFigures.Peaks(Spectrum(), Level.FromDbm(-60));

        Assert.Single(peaks);
        Assert.Equal(CarrierHz, peaks[0].Frequency.Hertz, 1.0);
    }

    [Fact]
    public void Peaks_ShoulderOnASkirt_IsNotALine()
    {
        // A 2 dB bump on the carrier's skirt: its valley towards the carrier is at -52 dBm, so it
        // stands only 2 dB clear; the second carrier beyond a -90 dBm valley stands 50 dB clear.
        double[] dbm = [-90, -60, -30, -50, -52, -50, -70, -90, -40, -90];
        var trace = TestTraces.Power(TestTraces.LinearHz(1e6, 1e3, dbm.Length), dbm);

        var peaks = PowerFigures.Peaks(trace, Level.FromDbm(-80));

        Assert.Equal([2, 8], peaks.Select(p => p.Index));
    }

    [Fact]
    public void Peaks_EqualCarriers_BothCount()
    {
        double[] dbm = [-90, -30, -90, -30, -90];
        var trace = TestTraces.Power(TestTraces.LinearHz(1e6, 1e3, dbm.Length), dbm);

        var peaks = PowerFigures.Peaks(trace, Level.FromDbm(-80));

        Assert.Equal([1, 3], peaks.Select(p => p.Index));
    }

    [Fact]
    public void Peaks_LineAtTheStartOfTheSweep_IsFoundUnrefined()
    {
        double[] dbm = [-30, -60, -90, -90];
        var trace = TestTraces.Power(TestTraces.LinearHz(1e6, 1e3, dbm.Length), dbm);

        var peak = Assert.Single(PowerFigures.Peaks(trace, Level.FromDbm(-80)));

        Assert.Equal(1e6, peak.Frequency.Hertz);
        Assert.Equal(-30, peak.LevelDb);
    }

    [Fact]
    public void Peaks_NegativeExcursion_Throws()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => PowerFigures.Peaks(Spectrum(), Level.FromDbm(-90), -1));
    }
}
