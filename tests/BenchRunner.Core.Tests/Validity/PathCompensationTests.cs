using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Core.Validity;

namespace BenchRunner.Core.Tests.Validity;

public class PathCompensationTests
{
    private static CableLossTable Cable => CableLossTable.Create(
    [
        (Frequency.FromMegahertz(10), Ratio.FromDecibels(0.2)),
        (Frequency.FromMegahertz(100), Ratio.FromDecibels(0.8)),
        (Frequency.FromMegahertz(1000), Ratio.FromDecibels(2.6)),
    ]).Value;

    [Fact]
    public void LossAt_FortySevenHundredOhmProbe_Is39Point554Db()
    {
        // REFERENCES: series-resistor probe into 50 Ω, 20·log10((4700 + 50)/50) = 39.554 dB [calc]
        // (the trade's "40 dB probe": common practice, no source).
        var path = PathCompensation.None.WithProbe(Resistance.FromKiloohms(4.7));

        Assert.Equal(39.554, path.LossAt(Frequency.FromMegahertz(137.5)).Value.Decibels, 0.0005);
    }

    [Theory]
    // Hand calc, linear in dB between neighbours: 137.5 MHz lies (137.5 − 100)/(1000 − 100) =
    // 0.041667 of the way from 100 MHz to 1 GHz: 0.8 + 0.041667·1.8 = 0.875 dB.
    // 55 MHz is halfway from 10 to 100 MHz: (0.2 + 0.8)/2 = 0.5 dB. Table points are returned as given.
    [InlineData(137.5, 0.875)]
    [InlineData(55, 0.5)]
    [InlineData(10, 0.2)]
    [InlineData(1000, 2.6)]
    public void CableLossAt_BetweenPoints_InterpolatesLinearlyInDb(double megahertz, double expectedDb)
    {
        Assert.Equal(expectedDb, Cable.LossAt(Frequency.FromMegahertz(megahertz)).Value.Decibels, 1e-9);
    }

    [Fact]
    public void CableLossAt_OutsideTable_IsRefusedWithReason()
    {
        var loss = Cable.LossAt(Frequency.FromGigahertz(1.2));

        Assert.False(loss.IsAvailable);
        Assert.Contains("not extrapolated", loss.Reason);
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    public void Create_BadTable_Fails(int kind)
    {
        var result = kind == 1
            ? CableLossTable.Create([(Frequency.FromMegahertz(10), Ratio.FromDecibels(0.2))])
            : CableLossTable.Create([(Frequency.FromMegahertz(10), Ratio.FromDecibels(0.2)), (Frequency.FromMegahertz(10), Ratio.FromDecibels(0.3))]);

        Assert.False(result.Success);
    }

    [Fact]
    public void Apply_ProbeAttenuatorDcBlockAndCable_AddsEveryLossAndDescribesThem()
    {
        // 39.554 (probe, REFERENCES [calc]) + 10 (attenuator) + 0.3 (DC block) + cable (hand calc above):
        // at 100 MHz 0.8 dB → 50.654 dB; at 137.5 MHz 0.875 dB → 50.729 dB.
        var path = PathCompensation.None
            .WithProbe(Resistance.FromKiloohms(4.7))
            .WithAttenuator(Ratio.FromDecibels(10))
            .WithDcBlock(Ratio.FromDecibels(0.3))
            .WithCable(Cable);
        var trace = new PowerTrace(FrequencyAxis.FromList([Frequency.FromMegahertz(100), Frequency.FromMegahertz(137.5)]), [-60, -70]);

        var referred = path.Apply(trace).Value;

        Assert.Equal(-60 + 50.654, referred.LevelsDb[0], 0.0005);
        Assert.Equal(-70 + 50.729, referred.LevelsDb[1], 0.0005);
        Assert.Equal(
            "compensated: probe 4.7 kOhm into 50 Ohm (39.554 dB) + attenuator 10 dB + DC block 0.3 dB + cable table 10 MHz to 1 GHz (3 points)",
            path.Description);
    }

    [Fact]
    public void Apply_TraceReachingPastTable_IsUnavailable()
    {
        var trace = new PowerTrace(FrequencyAxis.FromList([Frequency.FromMegahertz(5), Frequency.FromMegahertz(50)]), [-60, -60]);

        Assert.False(PathCompensation.None.WithCable(Cable).Apply(trace).IsAvailable);
    }

    [Fact]
    public void Description_None_SaysNothingCompensated()
    {
        Assert.Equal("no path compensation", PathCompensation.None.Description);
        Assert.Equal(0, PathCompensation.None.LossAt(Frequency.FromMegahertz(1)).Value.Decibels);
    }
}
