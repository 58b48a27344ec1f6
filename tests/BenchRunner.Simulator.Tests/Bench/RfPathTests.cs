using System.Numerics;
using BenchRunner.Core.Quantities;
using BenchRunner.Simulator.Bench;
using BenchRunner.Simulator.Spectrum;

namespace BenchRunner.Simulator.Tests.Bench;

public class RfPathTests
{
    private static readonly Frequency At = Frequency.FromMegahertz(137.5);

    [Fact]
    public void FixedPath_Loss_SubtractsItsDecibels()
    {
        Assert.Equal(-30, FixedPath.Loss(Ratio.FromDecibels(10)).Output(At, Level.FromDbm(-20)).Dbm, 12);
        Assert.Equal(-20, FixedPath.Through.Output(At, Level.FromDbm(-20)).Dbm, 12);
        Assert.Throws<ArgumentOutOfRangeException>(() => FixedPath.Loss(Ratio.FromDecibels(-3)));
    }

    [Fact]
    public void FixedPath_WithCompression_OneDbDownAtItsCompressionPoint()
    {
        // The definition of the 1 dB compression point; 20 dB below it the gain is flat to 0.001 dB
        // (calc: (10/2)·log10(1 + (P/Psat)²) with P/Psat = −21.16 dB).
        var amplifier = new FixedPath(Ratio.FromDecibels(20), GainCompression.AtInputPoint(Level.FromDbm(-10)));

        Assert.Equal(9, amplifier.Output(At, Level.FromDbm(-10)).Dbm, 9);
        Assert.Equal(-10, amplifier.Output(At, Level.FromDbm(-30)).Dbm, 0.001);
    }

    [Fact]
    public void GainCompression_FarAbove_SaturatesAtPsat()
    {
        // With p = 2, Psat = P1dB − 5·log10(10^0.2 − 1) = P1dB + 1.1646 dB (calc); the output stops
        // rising there, however hard the input is driven.
        var compression = GainCompression.AtInputPoint(Level.FromDbm(0));

        double output = 40 - compression.CompressionAt(Level.FromDbm(40)).Decibels;

        Assert.Equal(1.1646, output, 3);
        Assert.Equal(0, GainCompression.None.CompressionAt(Level.FromDbm(40)).Decibels);
    }

    [Theory]
    [InlineData(0.5, 0, -6.0206)]
    [InlineData(0.8, -0.4, -0.96910)]
    public void FrequencyResponsePath_FromTransmission_PassesTwentyLogMagnitude(double re, double im, double expectedDb)
    {
        // 20·log10(0.5) = −6.0206 dB (calc); REFERENCES (Pozar, Table 4.2): series j50 Ω gives
        // S21 = 0.8 − j0.4, |S21| = 0.89443, −0.96910 dB (calc).
        var path = FrequencyResponsePath.FromTransmission(_ => new Complex(re, im));

        Assert.Equal(-20 + expectedDb, path.Output(At, Level.FromDbm(-20)).Dbm, 4);
    }

    [Fact]
    public void FrequencyResponsePath_FromTransmission_ZeroIsTheFloor()
    {
        var path = FrequencyResponsePath.FromTransmission(_ => Complex.Zero);

        Assert.Equal(-400, path.GainAt(At).Decibels);
    }

    [Fact]
    public void FrequencyResponsePath_EvaluatesItsFunctionAtTheFrequency()
    {
        var path = new FrequencyResponsePath(f => Ratio.FromDecibels(f.Megahertz > 100 ? -3 : -1));

        Assert.Equal(-23, path.Output(At, Level.FromDbm(-20)).Dbm, 12);
        Assert.Equal(-21, path.Output(Frequency.FromMegahertz(50), Level.FromDbm(-20)).Dbm, 12);
    }

    [Fact]
    public void CascadedPath_GainsAddInDecibels()
    {
        var cascade = new CascadedPath([FixedPath.Loss(Ratio.FromDecibels(1)), new FixedPath(Ratio.FromDecibels(20)), FixedPath.Loss(Ratio.FromDecibels(10))]);

        Assert.Equal(-41, cascade.Output(At, Level.FromDbm(-50)).Dbm, 12);
        Assert.Throws<ArgumentException>(() => new CascadedPath([]));
    }
}
