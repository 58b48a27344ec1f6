using BenchRunner.Core.Quantities;
using BenchRunner.Core.RfMath;

namespace BenchRunner.Core.Tests.RfMath;

public class ThermalNoiseTests
{
    [Fact]
    public void BoltzmannConstant_IsTheExactSiValue()
    {
        // REFERENCES: k = 1.380649e-23 J/K (SI, exact since the 2019 redefinition).
        Assert.Equal(1.380649e-23, ThermalNoise.BoltzmannJoulesPerKelvin);
    }

    [Fact]
    public void DensityDbmPerHertz_At290Kelvin_IsMinus173975()
    {
        // REFERENCES: thermal noise, kT at 290 K = −173.975 dBm/Hz [calc]
        // (the trade's "−174 dBm/Hz": common practice, no source).
        Assert.Equal(-173.975, ThermalNoise.DensityDbmPerHertz(), 0.0005);
    }

    [Theory]
    // REFERENCES: thermal noise at 290 K, in 10 kHz −133.975 dBm, in 1 MHz −113.975 dBm [calc].
    [InlineData(10e3, -133.975)]
    [InlineData(1e6, -113.975)]
    public void NoisePower_At290Kelvin_MatchesReferences(double bandwidthHertz, double dbm)
    {
        Assert.Equal(dbm, ThermalNoise.NoisePower(Frequency.FromHertz(bandwidthHertz)).Dbm, 0.0005);
    }

    [Fact]
    public void NoisePower_DoubleTemperature_IsThreeDecibelsMore()
    {
        // kTB is proportional to T: twice the temperature is 10·log10(2) = 3.0103 dB more.
        var bandwidth = Frequency.FromKilohertz(30);

        var difference = ThermalNoise.NoisePower(bandwidth, 580).Dbm - ThermalNoise.NoisePower(bandwidth, 290).Dbm;

        Assert.Equal(3.0103, difference, 5e-5);
    }

    [Fact]
    public void NoiseFloor_AddsNoiseFigure()
    {
        // REFERENCES: kTB in 1 MHz at 290 K = −113.975 dBm [calc]; floor = kTB + NF.
        var floor = ThermalNoise.NoiseFloor(Frequency.FromMegahertz(1), Ratio.FromDecibels(6));

        Assert.Equal(-107.975, floor.Dbm, 0.0005);
    }

    [Fact]
    public void NoiseFunctions_BadArguments_Throw()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => ThermalNoise.NoisePower(Frequency.Zero));
        Assert.Throws<ArgumentOutOfRangeException>(() => ThermalNoise.NoisePower(Frequency.FromHertz(1), 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => ThermalNoise.DensityDbmPerHertz(double.NaN));
        Assert.Throws<ArgumentOutOfRangeException>(() => ThermalNoise.NoiseFloor(Frequency.FromHertz(1), Ratio.FromDecibels(-1)));
    }
}
