using BenchRunner.Core.Masks;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using static BenchRunner.Core.Tests.Masks.MaskTestData;

namespace BenchRunner.Core.Tests.Masks;

// The shipped examples must load and behave as their comments say on plausible responses.
// Filter responses are third-order Butterworth band-passes (see MaskTestData: Pozar,
// Microwave Engineering, ch. 8, from memory); the expected margins are hand calculations
// from |S21|² = 1/(1 + x⁶), x = (f/f0 − f0/f)·f0/BW.
public class MaskExamplesTests
{
    private static readonly string Examples = Path.Combine("docs", "examples");

    [Fact]
    public void Load_PreselectorExample_HasStopBandsWithAGapAndAPassband()
    {
        var mask = MaskFile.Load(RepositoryFiles.PathOf(Path.Combine(Examples, "psf-137-passband.yaml")));

        Assert.Equal("psf-137-passband", mask.Name);
        Assert.Equal(TraceQuantity.S21, mask.Parameter);
        Assert.Equal(MaskReference.Absolute, mask.Reference);
        Assert.Equal(2, mask.Upper!.Sections.Length);
        Assert.Equal(Frequency.FromMegahertz(131), mask.Upper.Sections[0][^1].Frequency);
        Assert.Equal(Frequency.FromMegahertz(144), mask.Upper.Sections[1][0].Frequency);
        Assert.Equal(Frequency.FromMegahertz(136.5), mask.Lower!.Start);
        Assert.Equal(Frequency.FromMegahertz(138.5), mask.Lower.Stop);
        Assert.All(mask.Lower.Corners, c => Assert.Equal(-4, c.LevelDb));
    }

    [Fact]
    public void Evaluate_PreselectorExample_PassesATunedBoardAndFailsADetunedOne()
    {
        var mask = MaskFile.Load(RepositoryFiles.PathOf(Path.Combine(Examples, "psf-137-passband.yaml")));
        var axis = FrequencyAxis.Linear(Frequency.FromMegahertz(127.5), Frequency.FromMegahertz(147.5), 401);

        var tuned = mask.Evaluate(Butterworth(axis, f0: 137.5e6, bandwidth: 3e6));
        var detuned = mask.Evaluate(Butterworth(axis, f0: 135.5e6, bandwidth: 3e6));

        // Tuned: the worst point is the lower passband edge, 136.5 MHz: x = -0.6691, x⁶ = 0.0897,
        // loss 0.373 dB, margin 4 - 0.3732 = 3.6268 dB (138.5 MHz: x = 0.6643, margin 3.64 dB);
        // at 131 MHz x = -4.44 and S21 ≈ -38.8 dB, far below -25 dB.
        Assert.True(tuned.Passed, $"worst margin {tuned.WorstMarginDb} dB at {tuned.WorstMarginAt}");
        Assert.Equal(LimitSide.Lower, tuned.WorstSide);
        Assert.Equal(3.6268, tuned.WorstMarginDb!.Value, 3);
        Assert.Equal(Frequency.FromMegahertz(136.5), tuned.WorstMarginAt);

        // Detuned 2 MHz low: at 138.5 MHz x = 1.978, x⁶ = 60.0, loss 17.8499 dB, margin -13.8499 dB;
        // the failing run ends at the lower limit's last corner. The stop bands still pass
        // (131 MHz: x = -3.05, S21 ≈ -29.1 dB).
        Assert.False(detuned.Passed);
        var span = Assert.Single(detuned.FailingSpans);
        Assert.Equal(LimitSide.Lower, span.Side);
        Assert.Equal(Frequency.FromMegahertz(138.5), span.Stop);
        Assert.Equal(-13.8499, span.WorstMarginDb, 3);
    }

    [Fact]
    public void Evaluate_IfExample_ChecksTheShapeWhateverTheLoss()
    {
        var mask = MaskFile.Load(RepositoryFiles.PathOf(Path.Combine(Examples, "if-21m4-relative.yaml")));
        var axis = FrequencyAxis.Linear(Frequency.FromMegahertz(21.2), Frequency.FromMegahertz(21.6), 401);

        var good = mask.Evaluate(Butterworth(axis, f0: 21.4e6, bandwidth: 40e3, lossDb: 6));
        var wide = mask.Evaluate(Butterworth(axis, f0: 21.4e6, bandwidth: 120e3, lossDb: 6));

        Assert.Equal(MaskReference.RelativeToPeak, mask.Reference);
        Assert.Equal(-6, good.ReferenceDb, 6);
        Assert.True(good.Passed, $"worst margin {good.WorstMarginDb} dB at {good.WorstMarginAt}");

        // Three times too wide: at 21.35 MHz x ≈ 0.83, only ≈ 1.3 dB down instead of 20 dB.
        Assert.False(wide.Passed);
        Assert.All(wide.FailingSpans, s => Assert.Equal(LimitSide.Upper, s.Side));
    }

    [Fact]
    public void Parse_WholeMasksShownOnTheFormatPage_AreValid()
    {
        var page = File.ReadAllText(RepositoryFiles.PathOf(Path.Combine("docs", "mask-format.md")));
        var blocks = page.Split("```yaml\n").Skip(1)
            .Select(b => b[..b.IndexOf("```", StringComparison.Ordinal)])
            .Where(b => b.Contains("\nmask: ", StringComparison.Ordinal) || b.StartsWith("mask: ", StringComparison.Ordinal))
            .ToList();

        Assert.NotEmpty(blocks);
        Assert.All(blocks, b => Assert.Equal("psf-137-passband", MaskFile.Parse(b, "mask-format.md").Name));
    }

    private static ComplexTrace Butterworth(FrequencyAxis axis, double f0, double bandwidth, double lossDb = 0)
    {
        var levels = axis.Hertz.Select(f => ButterworthBandpassDb(f, f0, bandwidth, order: 3) - lossDb).ToArray();
        return SParameter(axis.Hertz.Select(f => f / 1e6).ToArray(), levels);
    }
}
