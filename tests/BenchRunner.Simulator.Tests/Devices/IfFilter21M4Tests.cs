using BenchRunner.Core.Figures;
using BenchRunner.Core.Masks;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Simulator.Circuits;
using BenchRunner.Simulator.Devices;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Devices;

public class IfFilter21M4Tests
{
    private static readonly FrequencyAxis Axis = FrequencyAxis.Linear(Frequency.FromMegahertz(21.2), Frequency.FromMegahertz(21.6), 801);

    [Fact]
    public void Filter_IsCentredOn21Point4MegahertzAndAbout36KilohertzWide()
    {
        var s21 = IfFilter21M4.Create().Sweep(Axis, [TraceQuantity.S21])[0];

        var bw = TraceFigures.Bandwidth(s21).Value;
        Assert.Equal(21.4, bw.Centre.Megahertz, 0.002);
        Assert.InRange(bw.Width.Kilohertz, 33, 38);
        Assert.InRange(TraceFigures.InsertionLoss(s21).Value, 0.1, 1.5);
    }

    [Fact]
    public void Filter_PassesTheExampleShapeMask()
    {
        var mask = MaskFile.Load(RepositoryFiles.Example("if-21m4-relative.yaml"));

        var evaluation = mask.Evaluate(IfFilter21M4.Create().Sweep(Axis, [TraceQuantity.S21])[0]);

        Assert.True(evaluation.Passed, $"worst margin {evaluation.WorstMarginDb} dB at {evaluation.WorstMarginAt}");
    }

    [Fact]
    public void Filter_SkirtsFallLikeAFourPoleButterworth()
    {
        var s21 = IfFilter21M4.Create().Sweep(Axis, [TraceQuantity.S21])[0];

        // A 4-pole maximally flat band-pass is down 10·log10(1 + Ω⁸) at Ω = 2Δf/BW (Matthaei, Young
        // and Jones; from memory): at ±100 kHz with BW 36 kHz, Ω = 5.56 and about 59.6 dB.
        double expected = 10 * Math.Log10(1 + Math.Pow(200.0 / 36, 8));
        Assert.Equal(expected, TraceFigures.Rejection(s21, Frequency.FromMegahertz(21.5)).Value, 1.5);
        Assert.Equal(expected, TraceFigures.Rejection(s21, Frequency.FromMegahertz(21.3)).Value, 1.5);
    }

    [Fact]
    public void Filter_IsReciprocal()
    {
        var s = IfFilter21M4.Create().Evaluate(21.41e6, 50);

        ComplexAssert.Close(s.S21, s.S12, 1e-12);
    }
}
