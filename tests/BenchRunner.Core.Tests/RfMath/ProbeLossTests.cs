using BenchRunner.Core.Quantities;
using BenchRunner.Core.RfMath;

namespace BenchRunner.Core.Tests.RfMath;

public class ProbeLossTests
{
    [Theory]
    // REFERENCES: series-resistor probe into 50 Ω, loss 20·log10((R+50)/50) [calc]:
    // 4.7 kΩ → 39.554 dB (the trade's "40 dB probe": common practice, no source),
    // 450 Ω → 20.000 dB, 950 Ω → 26.021 dB.
    [InlineData(4700, 39.554)]
    [InlineData(450, 20.000)]
    [InlineData(950, 26.021)]
    public void LossOf_Into50Ohm_MatchesReferences(double ohms, double lossDb)
    {
        Assert.Equal(lossDb, ProbeLoss.LossOf(Resistance.FromOhms(ohms)).Decibels, 0.0005);
    }

    [Theory]
    // REFERENCES: the same rows read backwards; 450 Ω ↔ 20.000 dB and 950 Ω ↔ 26.021 dB [calc].
    // dR/dLoss is about 63 Ω/dB at 20 dB and 127 Ω/dB at 26 dB, hence the tolerances.
    [InlineData(20.000, 450, 0.04)]
    [InlineData(26.021, 950, 0.07)]
    public void ResistanceFor_Into50Ohm_MatchesReferences(double lossDb, double ohms, double tolerance)
    {
        Assert.Equal(ohms, ProbeLoss.ResistanceFor(Ratio.FromDecibels(lossDb)).Ohms, tolerance);
    }

    [Theory]
    [InlineData(4700, 50)]
    [InlineData(950, 75)]
    [InlineData(0, 50)]
    public void ResistanceFor_InvertsLossOf(double ohms, double systemOhms)
    {
        var z0 = Resistance.FromOhms(systemOhms);

        var loss = ProbeLoss.LossOf(Resistance.FromOhms(ohms), z0);

        Assert.Equal(ohms, ProbeLoss.ResistanceFor(loss, z0).Ohms, 1e-9);
    }

    [Fact]
    public void LossOf_Into75Ohm_UsesGivenImpedance()
    {
        // 20·log10((R+Z0)/Z0): 675 Ω into 75 Ω is a divide-by-10, 20 dB.
        Assert.Equal(20, ProbeLoss.LossOf(Resistance.FromOhms(675), Resistance.FromOhms(75)).Decibels, 1e-9);
    }

    [Fact]
    public void ProbeLoss_BadArguments_Throw()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => ProbeLoss.ResistanceFor(Ratio.FromDecibels(-1)));
        Assert.Throws<ArgumentOutOfRangeException>(() => ProbeLoss.ResistanceFor(Ratio.FromDecibels(1e5)));
        Assert.Throws<ArgumentOutOfRangeException>(() => ProbeLoss.LossOf(Resistance.FromOhms(450), Resistance.Zero));
    }
}
