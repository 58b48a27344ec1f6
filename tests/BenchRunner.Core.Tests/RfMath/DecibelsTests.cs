using BenchRunner.Core.Quantities;
using BenchRunner.Core.RfMath;

namespace BenchRunner.Core.Tests.RfMath;

public class DecibelsTests
{
    [Theory]
    // Definition of the decibel, 10·log10 for power (from memory: IEC 60027-3).
    [InlineData(2, 3.0103, 5e-5)]
    [InlineData(100, 20, 1e-12)]
    [InlineData(0.5, -3.0103, 5e-5)]
    [InlineData(1, 0, 0)]
    public void FromPowerRatio_GivesTenLog10(double powerRatio, double decibels, double tolerance)
    {
        Assert.Equal(decibels, Decibels.FromPowerRatio(powerRatio).Decibels, tolerance);
    }

    [Theory]
    // Definition of the decibel, 20·log10 for voltage (from memory: IEC 60027-3).
    [InlineData(10, 20, 1e-12)]
    [InlineData(2, 6.0206, 5e-5)]
    [InlineData(0.1, -20, 1e-12)]
    public void FromVoltageRatio_GivesTwentyLog10(double voltageRatio, double decibels, double tolerance)
    {
        Assert.Equal(decibels, Decibels.FromVoltageRatio(voltageRatio).Decibels, tolerance);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(-1)]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    public void FromRatio_NotPositiveOrNotFinite_Throws(double ratio)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Decibels.FromPowerRatio(ratio));
        Assert.Throws<ArgumentOutOfRangeException>(() => Decibels.FromVoltageRatio(ratio));
    }

    [Fact]
    public void ToPowerAndVoltageRatio_TwentyDecibels()
    {
        // Definition of the decibel: 20 dB is a power ratio of 100 and a voltage ratio of 10.
        Assert.Equal(100, Decibels.ToPowerRatio(Ratio.FromDecibels(20)), 1e-10);
        Assert.Equal(10, Decibels.ToVoltageRatio(Ratio.FromDecibels(20)), 1e-12);
    }

    [Theory]
    [InlineData(1e-12)]
    [InlineData(0.37)]
    [InlineData(4.2e9)]
    public void PowerAndVoltage_RoundTrip(double ratio)
    {
        Assert.Equal(ratio, Decibels.ToPowerRatio(Decibels.FromPowerRatio(ratio)), ratio * 1e-12);
        Assert.Equal(ratio, Decibels.ToVoltageRatio(Decibels.FromVoltageRatio(ratio)), ratio * 1e-12);
    }
}
