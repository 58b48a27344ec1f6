using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Simulator.Spectrum;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Spectrum;

public class SpectrumAnalyserNoiseTests
{
    // REFERENCES: kT at 290 K = −173.975 dBm/Hz (SI Boltzmann constant, calc).
    private const double KtDbmPerHertz = -173.975;
    private const double NoiseFigureDb = 24;
    private const int ManyPoints = 4001;

    [Theory]
    [InlineData(1e3, 0, -119.975)]
    [InlineData(10e3, 10, -99.975)]
    [InlineData(100e3, 10, -89.975)]
    [InlineData(1e6, 30, -59.975)]
    public void DisplayedAverageNoiseLevel_FollowsKtbPlusNoiseFigurePlusAttenuation(double rbwHz, double attenuationDb, double expectedDbm)
    {
        // DANL = kT + NF + 10·log10(RBW) + attenuation; kT from REFERENCES, NF 24 dB the default.
        var analyser = new SimulatedSpectrumAnalyser(1)
        {
            ResolutionBandwidth = Frequency.FromHertz(rbwHz),
            InputAttenuation = Ratio.FromDecibels(attenuationDb),
        };

        Assert.Equal(KtDbmPerHertz + NoiseFigureDb + 10 * Math.Log10(rbwHz) + attenuationDb, expectedDbm, 9);
        Assert.Equal(expectedDbm, analyser.DisplayedAverageNoiseLevel.Dbm, 3);
    }

    [Theory]
    [InlineData(1e3, 11)]
    [InlineData(10e3, 12)]
    [InlineData(100e3, 13)]
    [InlineData(1e6, 14)]
    public void Sweep_NoSignal_MeanNoisePowerSitsAtTheDanl(double rbwHz, int seed)
    {
        // The sample detector sees exponentially distributed noise power (Rayleigh envelope); the
        // mean of N samples has relative standard deviation 1/√N: 1.6 % (0.07 dB) for 4001 points,
        // so 0.3 dB is over four standard deviations.
        var analyser = QuietInput(seed, rbwHz);
        double danl = KtDbmPerHertz + NoiseFigureDb + 10 * Math.Log10(rbwHz) + 10;

        var trace = analyser.Sweep();

        Assert.Equal(danl, SpectrumReadings.MeanPowerDbm(trace), 0.3);
    }

    [Theory]
    [InlineData(1e3, 21)]
    [InlineData(100e3, 22)]
    public void Sweep_NoSignal_MedianLiesLn2BelowTheMean(double rbwHz, int seed)
    {
        // The median of an exponential power is ln 2 times its mean: 10·log10(ln 2) = −1.592 dB
        // (docs/figures.md, NoiseFloor). The sample median of N points has a standard deviation of
        // about 6.3 dB/√N = 0.1 dB for 4001 points; 0.4 dB is four of them.
        var analyser = QuietInput(seed, rbwHz);
        double danl = KtDbmPerHertz + NoiseFigureDb + 10 * Math.Log10(rbwHz) + 10;

        var floor = PowerFigures.NoiseFloor(analyser.Sweep()).Value;

        Assert.Equal(danl + 10 * Math.Log10(Math.Log(2)), floor.Dbm, 0.4);
    }

    [Fact]
    public void Sweep_TenDbMoreAttenuation_RaisesTheFloorTenDb()
    {
        // The attenuator sits before the mixer and is made up in the IF, so the mixer's own noise
        // rises by the attenuation when referred to the input ("Spectrum Analysis Basics",
        // Application Note 150, ch. "Dynamic Range"; from memory). Two medians: σ ≈ 0.14 dB.
        var analyser = QuietInput(31, 10e3);
        var at10 = PowerFigures.NoiseFloor(analyser.Sweep()).Value;

        analyser.InputAttenuation = Ratio.FromDecibels(20);
        var at20 = PowerFigures.NoiseFloor(analyser.Sweep()).Value;

        Assert.Equal(10, at20.Dbm - at10.Dbm, 0.5);
    }

    [Fact]
    public void Sweep_EveryPointIsFiniteEvenWithoutInput()
    {
        var trace = QuietInput(41, 1e3).Sweep();

        Assert.All(trace.LevelsDb, l => Assert.True(double.IsFinite(l)));
        Assert.Equal(ManyPoints, trace.Count);
    }

    private static SimulatedSpectrumAnalyser QuietInput(int seed, double rbwHz)
    {
        var analyser = new SimulatedSpectrumAnalyser(seed)
        {
            ResolutionBandwidth = Frequency.FromHertz(rbwHz),
            InputAttenuation = Ratio.FromDecibels(10),
            Points = ManyPoints,
        };
        analyser.SetSpan(Frequency.FromMegahertz(400), Frequency.FromMegahertz(500));
        return analyser;
    }
}
