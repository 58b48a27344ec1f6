using BenchRunner.Core.Masks;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Tests.Masks;

public class MaskFileParseTests
{
    [Fact]
    public void Parse_FullMask_ReadsEveryKey()
    {
        var mask = MaskFile.Parse(Lines(
            "mask: psf-137-passband",
            "description: passband and stop bands",
            "applies-to: S21",
            "interpolation: log",
            "reference: absolute",
            "upper:",
            "  - 127.5 MHz: -25 dB",
            "  - 131 MHz: -25 dB",
            "  - gap",
            "  - 144 MHz: -25 dB",
            "  - 147.5 MHz: -25 dB",
            "lower:",
            "  - 136.5 MHz: -4 dB",
            "  - 138.5 MHz: -4.5 dB"), "m.yaml");

        Assert.Equal("psf-137-passband", mask.Name);
        Assert.Equal("passband and stop bands", mask.Description);
        Assert.Equal(TraceQuantity.S21, mask.Parameter);
        Assert.Equal(TraceUnit.Decibel, mask.Unit);
        Assert.Equal(MaskInterpolation.Logarithmic, mask.Interpolation);
        Assert.Equal(MaskReference.Absolute, mask.Reference);
        Assert.Equal(2, mask.Upper!.Sections.Length);
        Assert.Equal(new MaskCorner(Frequency.FromMegahertz(144), -25), mask.Upper.Sections[1][0]);
        Assert.Equal(
            [new MaskCorner(Frequency.FromMegahertz(136.5), -4), new MaskCorner(Frequency.FromMegahertz(138.5), -4.5)],
            mask.Lower!.Corners.ToArray());
    }

    [Fact]
    public void Parse_MinimalMask_UsesTheDefaults()
    {
        var mask = MaskFile.Parse(Lines("mask: spur", "upper:", "  - 100 MHz: -60 dBm", "  - 200 MHz: -60 dBm"), "m.yaml");

        Assert.Null(mask.Description);
        Assert.Null(mask.Parameter);
        Assert.Null(mask.Lower);
        Assert.Equal(MaskInterpolation.Linear, mask.Interpolation);
        Assert.Equal(MaskReference.Absolute, mask.Reference);
        Assert.Equal(TraceUnit.DecibelMilliwatt, mask.Unit);
    }

    [Fact]
    public void Parse_KeysInAnyOrder_ReferenceAfterTheCornersStillApplies()
    {
        var mask = MaskFile.Parse(Lines("lower:", "  - 21.385 MHz: -3 dB", "  - 21.415 MHz: -3 dB", "reference: peak", "mask: if"), "m.yaml");

        Assert.Equal(MaskReference.RelativeToPeak, mask.Reference);
        Assert.Null(mask.Unit);
    }

    [Fact]
    public void Parse_RelativePowerMask_TakesItsUnitFromAppliesTo()
    {
        var mask = MaskFile.Parse(Lines("mask: if", "applies-to: power", "reference: peak", "lower:", "  - 1 MHz: -3 dB", "  - 2 MHz: -3 dB"), "m.yaml");

        Assert.Equal(TraceUnit.DecibelMilliwatt, mask.Unit);
        Assert.Equal(-3, mask.Lower!.Corners[0].LevelDb);
    }

    [Theory]
    [InlineData("s21", TraceQuantity.S21)]
    [InlineData("Power", TraceQuantity.Power)]
    [InlineData("S11", TraceQuantity.S11)]
    public void Parse_AppliesTo_IgnoresLetterCase(string word, TraceQuantity expected)
    {
        var unit = expected == TraceQuantity.Power ? "dBm" : "dB";

        var mask = MaskFile.Parse(Lines("mask: a", $"applies-to: {word}", "upper:", $"  - 1 MHz: -1 {unit}", $"  - 2 MHz: -1 {unit}"), "m.yaml");

        Assert.Equal(expected, mask.Parameter);
    }

    [Fact]
    public void Parse_QuotedAndFlowStyleCorners_AreAccepted()
    {
        var mask = MaskFile.Parse(Lines("mask: \"a: b\"", "upper: [{\"455 kHz\": \"+3.5 dB\"}, {1.2GHz: -1e1 dB}]"), "m.yaml");

        Assert.Equal("a: b", mask.Name);
        Assert.Equal(new MaskCorner(Frequency.FromKilohertz(455), 3.5), mask.Upper!.Corners[0]);
        Assert.Equal(new MaskCorner(Frequency.FromGigahertz(1.2), -10), mask.Upper.Corners[1]);
    }

    [Fact]
    public void Parse_VerticalStep_KeepsBothCornersInOrder()
    {
        var mask = MaskFile.Parse(Lines("mask: a", "upper:", "  - 1 MHz: -30 dB", "  - 2 MHz: -30 dB", "  - 2 MHz: -10 dB", "  - 3 MHz: -10 dB"), "m.yaml");

        Assert.Equal([-30, -30, -10, -10], mask.Upper!.Corners.Select(c => c.LevelDb));
        Assert.False(mask.Upper.HasGaps);
    }

    private static string Lines(params string[] lines) => string.Join("\n", lines) + "\n";
}
