using BenchRunner.Core.Quantities;
using BenchRunner.Core.RfMath;

namespace BenchRunner.Core.Tests.RfMath;

public class PowerConversionTests
{
    [Fact]
    public void ToWatts_ZeroDbm_IsOneMilliwatt()
    {
        // REFERENCES: power and voltage into 50 Ω, 0 dBm = 1 mW [calc].
        Assert.Equal(1e-3, PowerConversion.ToWatts(Level.FromDbm(0)), 1e-15);
        Assert.Equal(0, PowerConversion.FromWatts(1e-3).Dbm, 1e-12);
    }

    [Theory]
    // REFERENCES: power and voltage into 50 Ω [calc]: 0 dBm = 223.61 mV rms,
    // +10 dBm = 707.11 mV rms, −20 dBm = 22.361 mV rms.
    [InlineData(0, 223.61, 0.005)]
    [InlineData(10, 707.11, 0.005)]
    [InlineData(-20, 22.361, 0.0005)]
    public void ToVoltsRms_Into50Ohm_MatchesReferences(double dbm, double millivolts, double tolerance)
    {
        Assert.Equal(millivolts, PowerConversion.ToVoltsRms(Level.FromDbm(dbm)) * 1e3, tolerance);
    }

    [Fact]
    public void ToVoltsPeak_ZeroDbm_Is316Millivolts()
    {
        // REFERENCES: power and voltage into 50 Ω, 0 dBm = 316.23 mV peak [calc].
        Assert.Equal(316.23, PowerConversion.ToVoltsPeak(Level.FromDbm(0)) * 1e3, 0.005);
    }

    [Fact]
    public void FromVoltsRms_OneVolt_Is13Dbm()
    {
        // REFERENCES: power and voltage into 50 Ω, 1 V rms = +13.010 dBm [calc].
        Assert.Equal(13.010, PowerConversion.FromVoltsRms(1).Dbm, 0.0005);
    }

    [Fact]
    public void ToDbMicrovolts_ZeroDbm_Is107DbMicrovolts()
    {
        // REFERENCES: power and voltage into 50 Ω, 0 dBm = 106.99 dBµV [calc].
        Assert.Equal(106.99, PowerConversion.ToDbMicrovolts(Level.FromDbm(0)), 0.005);
        Assert.Equal(106.99, PowerConversion.DbMicrovoltOffset().Decibels, 0.005);
    }

    [Fact]
    public void ToDbMicrovolts_AgreesWithRmsVoltage()
    {
        // dBµV is 20·log10(Vrms / 1 µV) by definition; the offset is derived, so check it against the voltage.
        var level = Level.FromDbm(-47.3);
        var impedance = Resistance.FromOhms(75);

        var fromVolts = 20 * Math.Log10(PowerConversion.ToVoltsRms(level, impedance) / 1e-6);

        Assert.Equal(fromVolts, PowerConversion.ToDbMicrovolts(level, impedance), 1e-9);
    }

    [Theory]
    [InlineData(-113.975, 50)]
    [InlineData(13.01, 50)]
    [InlineData(-20, 75)]
    [InlineData(30, 600)]
    public void Conversions_RoundTrip(double dbm, double ohms)
    {
        var level = Level.FromDbm(dbm);
        var impedance = Resistance.FromOhms(ohms);

        Assert.Equal(dbm, PowerConversion.FromVoltsRms(PowerConversion.ToVoltsRms(level, impedance), impedance).Dbm, 1e-9);
        Assert.Equal(dbm, PowerConversion.FromVoltsPeak(PowerConversion.ToVoltsPeak(level, impedance), impedance).Dbm, 1e-9);
        Assert.Equal(dbm, PowerConversion.FromDbMicrovolts(PowerConversion.ToDbMicrovolts(level, impedance), impedance).Dbm, 1e-9);
    }

    [Fact]
    public void Conversions_BadArguments_Throw()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => PowerConversion.FromVoltsRms(0));
        Assert.Throws<ArgumentOutOfRangeException>(() => PowerConversion.FromVoltsPeak(-1));
        Assert.Throws<ArgumentOutOfRangeException>(() => PowerConversion.FromDbMicrovolts(double.NaN));
        Assert.Throws<ArgumentOutOfRangeException>(() => PowerConversion.ToVoltsRms(Level.FromDbm(0), Resistance.Zero));
    }
}
