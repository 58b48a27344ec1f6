using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Tests.Figures;

public class PowerFiguresLevelTests
{
    private static Frequency Khz(double khz) => Frequency.FromKilohertz(khz);

    [Fact]
    public void NoiseFloor_CarrierSpurAndRipplingFloor_IsNearMinus100()
    {
        var floor = PowerFigures.NoiseFloor(PowerFiguresPeaksTests.Spectrum()).Value;

        // The ripple is symmetric about -100 dBm; about 8 % of the bins are lifted by the carrier
        // and spur, which moves the median to the 54th percentile of a 3 dB wide spread (+0.12 dB),
        // plus the median's own scatter over 1001 bins (about 0.05 dB): 0.5 dB bounds both (calc).
        Assert.InRange(floor.Dbm, -100.5, -99.5);
    }

    [Fact]
    public void NoiseFloor_EvenCount_IsTheMeanOfTheMiddleTwo()
    {
        var trace = TestTraces.Power([1e6, 2e6, 3e6, 4e6], [-90, -100, -101, -20]);

        Assert.Equal(-95, PowerFigures.NoiseFloor(trace).Value.Dbm, 1e-12);
    }

    [Theory]
    [InlineData(0.99)]
    [InlineData(0.5)]
    public void OccupiedBandwidth_FlatTopBand_IsTheShareOfItsWidth(double share)
    {
        // 21.4 MHz IF: 21 bins of 1 kHz at -20 dBm (21.3895 to 21.4105 MHz), the rest at -300 dBm
        // (28 orders of magnitude down, so negligible): the band is share × 21 kHz, centred (calc).
        var hz = TestTraces.LinearHz(21.3e6, 1e3, 201);
        var trace = TestTraces.Power(hz, hz.Select(f => Math.Abs(f - 21.4e6) <= 10.5e3 ? -20.0 : -300.0).ToArray());

        var obw = PowerFigures.OccupiedBandwidth(trace, share).Value;

        Assert.Equal(share * 21e3, obw.Width.Hertz, 1e-3);
        Assert.Equal(21.4e6, obw.Centre.Hertz, 1e-3);
        Assert.Equal(21.3895e6 + (1 - share) / 2 * 21e3, obw.Lower.Hertz, 1e-3);
        Assert.Equal(share, obw.Share);
    }

    [Fact]
    public void OccupiedBandwidth_InterpolatesInsideTheBin()
    {
        // Bins 500–1500 Hz at 1 mW and 1500–2500 Hz at 3 mW; half of 4 mW: the lower edge is where
        // 1 mW has passed (1500 Hz) and the upper where 3 mW has (1500 + 2/3 of the bin) (calc).
        var trace = TestTraces.Power([1000, 2000], [0, 10 * Math.Log10(3)]);

        var obw = PowerFigures.OccupiedBandwidth(trace, 0.5).Value;

        Assert.Equal(1500, obw.Lower.Hertz, 1e-6);
        Assert.Equal(1500 + 2000.0 / 3, obw.Upper.Hertz, 1e-6);
    }

    [Fact]
    public void OccupiedBandwidth_OnePoint_IsUnavailable()
    {
        Assert.False(PowerFigures.OccupiedBandwidth(TestTraces.Power([21.4e6], [-20])).IsAvailable);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(1)]
    public void OccupiedBandwidth_ShareOutOfRange_Throws(double share)
    {
        var trace = TestTraces.Power([1000, 2000], [0, 0]);
        Assert.Throws<ArgumentOutOfRangeException>(() => PowerFigures.OccupiedBandwidth(trace, share));
    }

    private static readonly double[] IfBins = TestTraces.LinearHz(21.3e6, 1e3, 201);

    [Fact]
    public void ChannelPower_NEqualBins_IsPPlus10LogN()
    {
        // 25 whole 1 kHz bins at -50 dBm: -50 + 10·log10(25) = -36.0206 dBm (calc).
        var trace = TestTraces.Power(IfBins, IfBins.Select(_ => -50.0).ToArray());

        var p = PowerFigures.ChannelPower(trace, Frequency.FromMegahertz(21.4), Khz(25)).Value;

        Assert.Equal(-50 + 10 * Math.Log10(25), p.Dbm, 1e-9);
        Assert.Equal(-36.0206, p.Dbm, 1e-4);
    }

    [Fact]
    public void ChannelPower_EdgeThroughABin_CountsItInProportion()
    {
        // 24 kHz centred on a bin: 23 whole bins and two halves, 24 bins' worth (calc).
        var trace = TestTraces.Power(IfBins, IfBins.Select(_ => -50.0).ToArray());

        var p = PowerFigures.ChannelPower(trace, Frequency.FromMegahertz(21.4), Khz(24)).Value;

        Assert.Equal(-50 + 10 * Math.Log10(24), p.Dbm, 1e-9);
    }

    [Fact]
    public void ChannelPower_WithRbwAndNoiseBandwidth_ScalesBySpacingOverEnbw()
    {
        // Bins 1 kHz apart measured with a 3 kHz RBW each see three bins' worth of power:
        // P = Σ p·Δf/(RBW·k) = 25 · 1/(3 · 1.06) in units of one bin (calc).
        var trace = TestTraces.Power(IfBins, IfBins.Select(_ => -50.0).ToArray());

        var p = PowerFigures.ChannelPower(trace, Frequency.FromMegahertz(21.4), Khz(25), Khz(3), 1.06).Value;

        Assert.Equal(-50 + 10 * Math.Log10(25 / (3 * 1.06)), p.Dbm, 1e-9);
    }

    [Fact]
    public void ChannelPower_ThermalNoiseDensity_IntegratesToKtb()
    {
        // REFERENCES thermal noise: kT at 290 K = -173.975 dBm/Hz, so a 10 kHz RBW shows
        // -133.975 dBm and 1 MHz holds -113.975 dBm.
        var hz = TestTraces.LinearHz(136.5e6, 1e3, 2001);
        var trace = TestTraces.Power(hz, hz.Select(_ => -133.975).ToArray());

        var p = PowerFigures.ChannelPower(trace, Frequency.FromMegahertz(137.5), Frequency.FromMegahertz(1), Khz(10)).Value;

        Assert.Equal(-113.975, p.Dbm, 1e-6);
    }

    [Fact]
    public void ChannelPower_OutsideTheBinsOrEmpty_IsUnavailable()
    {
        var trace = TestTraces.Power(IfBins, IfBins.Select(_ => -50.0).ToArray());

        var outside = PowerFigures.ChannelPower(trace, Frequency.FromMegahertz(21.49), Khz(25));
        var empty = PowerFigures.ChannelPower(trace, Frequency.FromMegahertz(21.4), Frequency.Zero);

        Assert.False(outside.IsAvailable);
        Assert.Contains("outside", outside.Reason);
        Assert.False(empty.IsAvailable);
        Assert.Contains("empty", empty.Reason);
    }
}
