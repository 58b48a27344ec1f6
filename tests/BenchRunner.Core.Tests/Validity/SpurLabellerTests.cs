using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Core.Validity;

namespace BenchRunner.Core.Tests.Validity;

public class SpurLabellerTests
{
    private static readonly Frequency Tolerance = Frequency.FromKilohertz(10);

    [Fact]
    public void Label_SyntheticTraceWithHarmonics_GivesDbcOfEachLine()
    {
        // Synthetic trace, 100 kHz bins, floor −100 dBm: carrier 137.5 MHz at −10 dBm, its 2nd
        // harmonic at −40 dBm and 3rd at −50 dBm, and a stray line at 300 MHz. dBc = line − carrier
        // (definition of dBc): −30 and −40 dBc.
        var axis = FrequencyAxis.Linear(Frequency.FromMegahertz(100), Frequency.FromMegahertz(450), 3501);
        var levels = Enumerable.Repeat(-100.0, axis.Count).ToArray();
        levels[375] = -10;   // 137.5 MHz
        levels[1750] = -40;  // 275 MHz
        levels[2000] = -70;  // 300 MHz
        levels[3125] = -50;  // 412.5 MHz
        var peaks = PowerFigures.Peaks(new PowerTrace(axis, levels), Level.FromDbm(-90));
        var carriers = new[] { new CarrierSignal(Frequency.FromMegahertz(137.5), Level.FromDbm(-10)) };

        var labels = SpurLabeller.Label(carriers, peaks, Tolerance);

        Assert.Equal(4, labels.Count);
        Assert.Equal((PeakOrigin.Carrier, 1, 0.0), (labels[0].Origin, labels[0].Order!.Value, labels[0].RelativeDbc!.Value));
        Assert.Equal((PeakOrigin.Harmonic, 2), (labels[1].Origin, labels[1].Order!.Value));
        Assert.Equal(-30, labels[1].RelativeDbc!.Value, 1e-9);
        Assert.Equal("H2 of carrier 1", labels[1].Label);
        Assert.Equal(PeakOrigin.Unidentified, labels[2].Origin);
        Assert.Null(labels[2].RelativeDbc);
        Assert.Equal((PeakOrigin.Harmonic, 3), (labels[3].Origin, labels[3].Order!.Value));
        Assert.Equal(-40, labels[3].RelativeDbc!.Value, 1e-9);
    }

    [Fact]
    public void Label_TwoTones_NamesEachProductAgainstTheStrongerCarrier()
    {
        // Two tones 137.5 and 137.6 MHz: 2f1−f2 = 137.4 MHz, 2f2−f1 = 137.7 MHz, f1+f2 = 275.1 MHz,
        // f2−f1 = 100 kHz (definitions of the intermodulation products). f2 is the stronger (−10 dBm).
        var carriers = new[]
        {
            new CarrierSignal(Frequency.FromMegahertz(137.5), Level.FromDbm(-13)),
            new CarrierSignal(Frequency.FromMegahertz(137.6), Level.FromDbm(-10)),
        };
        var peaks = new[]
        {
            Peak(0.1, -90), Peak(137.402, -80), Peak(137.5, -13), Peak(137.6, -10), Peak(137.7, -85), Peak(275.1, -70),
        };

        var labels = SpurLabeller.Label(carriers, peaks, Tolerance);

        Assert.Equal(["f2-f1", "2f1-f2", "carrier 1", "carrier 2", "2f2-f1", "f1+f2"], labels.Select(l => l.Label));
        Assert.All(labels.Where(l => l.Origin == PeakOrigin.TwoToneProduct), l => Assert.Equal(1, l.CarrierIndex));
        Assert.Equal(-70, labels[1].RelativeDbc!.Value, 1e-9);
        Assert.Equal(3, labels[4].Order);
        Assert.Equal(2, labels[5].Order);
    }

    [Fact]
    public void Label_LineJustOutsideTolerance_StaysUnidentified()
    {
        var carriers = new[] { new CarrierSignal(Frequency.FromMegahertz(137.5), Level.FromDbm(-10)) };

        var labels = SpurLabeller.Label(carriers, [Peak(275.011, -50)], Tolerance);

        Assert.Equal(PeakOrigin.Unidentified, labels.Single().Origin);
    }

    [Theory]
    [InlineData(300, 1000)]
    [InlineData(10_000, 10_000)]
    public void DefaultTolerance_IsRbwButAtLeastOneKilohertz(double rbwHertz, double expectedHertz)
    {
        Assert.Equal(expectedHertz, SpurLabeller.DefaultTolerance(Frequency.FromHertz(rbwHertz)).Hertz);
    }

    private static PeakPoint Peak(double megahertz, double dbm) => new(Frequency.FromMegahertz(megahertz), dbm, 0);
}
