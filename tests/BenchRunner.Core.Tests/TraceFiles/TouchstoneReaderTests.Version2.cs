using System.Numerics;
using BenchRunner.Core.Tests.Support;
using BenchRunner.Core.TraceFiles;

namespace BenchRunner.Core.Tests.TraceFiles;

public partial class TouchstoneReaderTests
{
    private static string TwoPortVersion2(string order, string dataLine, params string[] extra) => Lines(
        [
            "[Version] 2.0",
            "# MHz S DB R 50",
            "[Number of Ports] 2",
            $"[Two-Port Data Order] {order}",
            "[Number of Frequencies] 1",
            .. extra,
            "[Network Data]",
            dataLine,
            "[End]",
        ]);

    [Fact]
    public void Parse_Version2Order12_21_MatchesReferenceVector()
    {
        var data = Parse(TwoPortVersion2("12_21", "100 -20 0 -0.5 -45 -0.5 -45 -20 0"), "test.ts", null);

        // REFERENCES [calc], version 2.0 two-port with [Two-Port Data Order] 12_21: columns S11 S12 S21 S22.
        Assert.Equal(2, data.Version);
        Assert.Equal(100e6, data.Axis.Hertz[0]);
        ComplexAssert.Close(new Complex(0.1, 0), data.Get(0, 0, 0), 1e-12);
        ComplexAssert.Polar(Math.Pow(10, -0.5 / 20), -45, data.Get(0, 0, 1), 1e-12, 1e-9);
        ComplexAssert.Polar(0.944061, -45, data.Get(0, 1, 0), 5e-7, 1e-9);
        ComplexAssert.Close(new Complex(0.1, 0), data.Get(0, 1, 1), 1e-12);
    }

    [Theory]
    [InlineData("12_21", 0, 1)]
    [InlineData("21_12", 1, 0)]
    public void Parse_Version2TwoPortDataOrder_PlacesSecondPair(string order, int row, int col)
    {
        // Distinct S12 and S21 so that the order shows: the second pair is -40 dB at 90°.
        var data = Parse(TwoPortVersion2(order, "100 -20 0 -40 90 -3 -45 -20 0"), "test.ts", null);

        // Touchstone spec (2.0): 12_21 is N11 N12 N21 N22; 21_12 is the version 1 order N11 N21 N12 N22.
        ComplexAssert.Polar(0.01, 90, data.Get(0, row, col), 1e-12, 1e-9);
        ComplexAssert.Polar(Math.Pow(10, -3.0 / 20), -45, data.Get(0, col, row), 1e-12, 1e-9);
    }

    [Fact]
    public void Parse_ReferenceWrappedOverLines_OverridesOptionLine()
    {
        var data = Parse(TwoPortVersion2("12_21", "100 -20 0 -40 90 -3 -45 -20 0", "[Reference] 50", "  75"), "test.ts", null);

        // Touchstone spec (2.0): [Reference] gives one value per port, may wrap lines and overrides R.
        Assert.Equal<double>([50.0, 75.0], data.ReferenceOhms);
        Assert.False(data.HasUniformReference);
        Assert.Throws<InvalidOperationException>(() => data.ToTraceSet());
    }

    [Fact]
    public void Parse_ReferenceValuesOnNextLine_AreRead()
    {
        var data = Parse(TwoPortVersion2("21_12", "100 -20 0 -40 90 -3 -45 -20 0", "[Reference]", "60 60"), "test.ts", null);

        Assert.Equal<double>([60.0, 60.0], data.ReferenceOhms);
        Assert.True(data.HasUniformReference);
        Assert.Equal(60, data.ToTraceSet().ReferenceOhms);
    }

    [Fact]
    public void Parse_NoiseDataInformationAndTextAfterEnd_AreSkipped()
    {
        var data = Parse(Lines(
            "! a version 2.0 file with everything skippable",
            "[Version] 2.0",
            "# GHz S MA R 50",
            "[number  of ports] 2",
            "[TWO-PORT DATA ORDER] 21_12",
            "[Number of Frequencies] 2",
            "[Number of Noise Frequencies] 2",
            "[Begin Information]",
            "anything at all 1 2 3",
            "[End Information]",
            "[Network Data]",
            "2 .95 -26 3.57 157 .04 76 .66 -14",
            "22 .60 -144 1.30 40 .14 40 .56 -85",
            "[Noise Data]",
            "4 .7 .64 69 19",
            "18 2.7 .46 -33 20",
            "[End]",
            "text after the end"), "test.ts", null);

        // Touchstone spec (2.0): keywords case-insensitive; [Noise Data] and information blocks are not network data.
        Assert.Equal<double>([2e9, 22e9], data.Axis.Hertz);
        ComplexAssert.Close(new Complex(-3.28620, 1.39491), data.Get(0, 1, 0), 5e-6); // REFERENCES [calc], same line as the bare "#" vector.
    }

    [Fact]
    public void Parse_Version2OnePort_NeedsNoDataOrder()
    {
        var data = Parse(Lines(
            "[Version] 2.0",
            "# MHz S RI R 50",
            "[Number of Ports] 1",
            "[Number of Frequencies] 2",
            "[Network Data]",
            "137.5 0.1 -0.2",
            "138.5 0.2 -0.1",
            "[End]"), "test.ts", null);

        Assert.Equal(1, data.PortCount);
        Assert.Equal(new Complex(0.2, -0.1), data.Get(1, 0, 0));
    }

    [Fact]
    public void Parse_LowerMatrixFormat_FillsSymmetricMatrix()
    {
        var data = Parse(Lines(
            "[Version] 2.0",
            "# Hz S RI R 50",
            "[Number of Ports] 2",
            "[Number of Frequencies] 1",
            "[Matrix Format] Lower",
            "[Network Data]",
            "1 11 0 21 0 22 0",
            "[End]"), "test.ts", null);

        // Touchstone spec (2.0): [Matrix Format] Lower gives the lower triangle row by row.
        Assert.Equal(new Complex(21, 0), data.Get(0, 1, 0));
        Assert.Equal(new Complex(21, 0), data.Get(0, 0, 1));
        Assert.Equal(new Complex(22, 0), data.Get(0, 1, 1));
    }

    [Fact]
    public void Parse_Version2WrappedPoint_ReadsLikeOneLine()
    {
        var data = Parse(TwoPortVersion2("12_21", "100 -20 0 -40 90\n -3 -45 -20 0"), "test.ts", null);

        ComplexAssert.Polar(Math.Pow(10, -3.0 / 20), -45, data.Get(0, 1, 0), 1e-12, 1e-9);
    }
}
