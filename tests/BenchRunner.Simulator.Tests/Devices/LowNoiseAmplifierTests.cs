using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Simulator.Circuits;
using BenchRunner.Simulator.Devices;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Devices;

public class LowNoiseAmplifierTests
{
    private static readonly FrequencyAxis Band = FrequencyAxis.Linear(Frequency.FromMegahertz(130), Frequency.FromMegahertz(145), 151);

    [Fact]
    public void Gain_IsTwentyDecibelsAtCentreWithAGentleDownwardSlope()
    {
        var model = AmplifierModel.Lna137;

        Assert.Equal(20, model.GainAt(Frequency.FromMegahertz(137.5)).Decibels, 9);
        double low = model.GainAt(Frequency.FromMegahertz(130)).Decibels;
        double high = model.GainAt(Frequency.FromMegahertz(145)).Decibels;
        Assert.True(low > high, $"{low} dB at 130 MHz, {high} dB at 145 MHz");
        Assert.InRange(low - high, 0.05, 0.5);
        Assert.InRange(model.GainAt(Frequency.FromMegahertz(1000)).Decibels, 5, 15);
    }

    [Fact]
    public void Sweep_MatchAndIsolationLieInTheirRanges()
    {
        var set = new LowNoiseAmplifier().Sweep(Band);
        var start = Band.Start;
        var stop = Band.Stop;

        var input = TraceFigures.WorstReturnLoss(set.Find(TraceQuantity.S11)!, start, stop).Value;
        var output = TraceFigures.WorstReturnLoss(set.Find(TraceQuantity.S22)!, start, stop).Value;
        Assert.InRange(input.ReturnLossDb, 12, 15);
        Assert.InRange(output.ReturnLossDb, 12, 15);
        Assert.InRange(set.Find(TraceQuantity.S11)!.LevelsDb.Min(), -15, -12);
        Assert.Equal(-35, TraceFigures.ValueAt(set.Find(TraceQuantity.S12)!, Frequency.FromMegahertz(137.5)).Value, 9);
    }

    [Fact]
    public void Model_ReportsNoiseAndCompression()
    {
        var model = AmplifierModel.Lna137;

        Assert.Equal(1, model.NoiseFigure.Decibels);
        Assert.Equal(10, model.OutputP1dB.Dbm);
        Assert.Equal(20, model.OutputIp3.Dbm);
        // Input P1dB = output P1dB − (gain − 1 dB): +10 − 19 = −9 dBm.
        Assert.Equal(-9, model.InputP1dB.Dbm, 12);
    }

    [Fact]
    public void Evaluate_OtherReference_IsTheSameTwoPort()
    {
        var lna = new LowNoiseAmplifier();

        var at50 = Abcd.FromSParameters(lna.Evaluate(137.5e6, 50), 50);
        var at75 = Abcd.FromSParameters(lna.Evaluate(137.5e6, 75), 75);

        ComplexAssert.Close(at50.A, at75.A, 1e-12);
        ComplexAssert.Close(at50.B, at75.B, 1e-9);
        ComplexAssert.Close(at50.C, at75.C, 1e-14);
        ComplexAssert.Close(at50.D, at75.D, 1e-12);
    }

    [Fact]
    public void Chain_PreselectorThenAmplifier_HasAboutTheSumOfTheirGains()
    {
        var chain = new Network(
            Preselector137.BuildNetwork(Preselector137.NominalParts, Preselector137.TunedTrimmers),
            new TwoPortElement(new LowNoiseAmplifier()));

        double gain = 20 * Math.Log10(chain.Evaluate(137.5e6, 50).S21.Magnitude);

        Assert.InRange(gain, 20 - 2.5 - 0.5, 20 - 2.5 + 0.5);
    }
}
