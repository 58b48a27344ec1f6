using BenchRunner.Core.Masks;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using static BenchRunner.Core.Tests.Masks.MaskTestData;

namespace BenchRunner.Core.Tests.Masks;

public class MaskFileRoundTripTests
{
    [Fact]
    public void Write_ThenParse_GivesTheSameMaskToTheLastBit()
    {
        var upper = LimitLine.FromSections(
        [
            [Corner(1e-3, -0.1 - 0.2), Corner(137.123456789e6, 1.0 / 3), Corner(137.123456789e6, 12.5)],
            [Corner(2.4e9 + 0.1, -60), Corner(3e9, -60)],
        ]);
        var lower = Line((136.5, -4), (138.5, -4));
        var original = new LimitMask("odd: name #1", upper, lower, TraceUnit.Decibel, MaskReference.Absolute,
            MaskInterpolation.Logarithmic, TraceQuantity.S12, "two lines\nof description");

        var text = MaskFile.Format(original);
        var copy = MaskFile.Parse(text, "written.yaml");

        AssertSame(original, copy);
    }

    [Fact]
    public void Write_RelativePowerMask_WritesDbAndReadsBackRelative()
    {
        var original = new LimitMask("if", null, Line((21.385, -3), (21.415, -3)), unit: null,
            MaskReference.RelativeToPeak, parameter: TraceQuantity.Power);

        var text = MaskFile.Format(original);
        var copy = MaskFile.Parse(text, "written.yaml");

        Assert.Contains("21.385 MHz: -3 dB\n", text);
        Assert.DoesNotContain("dBm", text);
        AssertSame(original, copy);
    }

    [Theory]
    [InlineData("psf-137-passband.yaml")]
    [InlineData("if-21m4-relative.yaml")]
    public void Write_Examples_RoundTrip(string file)
    {
        var original = MaskFile.Load(RepositoryFiles.PathOf(Path.Combine("docs", "examples", file)));

        var copy = MaskFile.Parse(MaskFile.Format(original), "written.yaml");

        AssertSame(original, copy);
    }

    [Theory]
    [InlineData(137.5e6, "137.5 MHz")]
    [InlineData(455e3, "455 kHz")]
    [InlineData(2.4e9, "2.4 GHz")]
    [InlineData(999, "999 Hz")]
    [InlineData(0, "0 Hz")]
    public void FormatFrequency_PlainValues_UseTheLargestFittingPrefix(double hertz, string expected)
    {
        Assert.Equal(expected, MaskFileWriter.FormatFrequency(Frequency.FromHertz(hertz)));
    }

    private static MaskCorner Corner(double hertz, double level) => new(Frequency.FromHertz(hertz), level);

    private static void AssertSame(LimitMask expected, LimitMask actual)
    {
        Assert.Equal(expected.Name, actual.Name);
        Assert.Equal(expected.Description, actual.Description);
        Assert.Equal(expected.Parameter, actual.Parameter);
        Assert.Equal(expected.Unit, actual.Unit);
        Assert.Equal(expected.Interpolation, actual.Interpolation);
        Assert.Equal(expected.Reference, actual.Reference);
        AssertSameLine(expected.Upper, actual.Upper);
        AssertSameLine(expected.Lower, actual.Lower);
    }

    private static void AssertSameLine(LimitLine? expected, LimitLine? actual)
    {
        if (expected is null)
        {
            Assert.Null(actual);
            return;
        }

        Assert.NotNull(actual);
        Assert.Equal(expected.Sections.Length, actual.Sections.Length);
        for (int s = 0; s < expected.Sections.Length; s++)
        {
            // Record equality compares the doubles exactly.
            Assert.Equal(expected.Sections[s].ToArray(), actual.Sections[s].ToArray());
        }
    }
}
