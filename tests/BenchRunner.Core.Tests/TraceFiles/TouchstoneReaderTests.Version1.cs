using System.Numerics;
using BenchRunner.Core.Tests.Support;
using BenchRunner.Core.TraceFiles;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Tests.TraceFiles;

public partial class TouchstoneReaderTests
{
    [Fact]
    public void Parse_MegahertzMagnitudeAngleOnePort_MatchesReferenceVector()
    {
        var data = Parse(Lines("# MHz S MA R 50", "2.000 0.894 -12.136"), "test.s1p", 1);

        // REFERENCES [calc], Touchstone spec-style line "# MHz S MA R 50" / "2.000 0.894 -12.136".
        Assert.Equal(2.000e6, data.Axis.Hertz[0], 6);
        var s11 = data.Get(0, 0, 0);
        ComplexAssert.Close(new Complex(0.87402, -0.18795), s11, 5e-6);
        Assert.Equal(-0.97325, data.Trace(TraceQuantity.S11).LevelsDb[0], 4);
        var zin = 50 * (1 + s11) / (1 - s11);
        ComplexAssert.Close(new Complex(196.08, -367.12), zin, 0.01);
        Assert.Equal(1, data.Version);
        Assert.Equal(TouchstoneParameter.S, data.Parameter);
        Assert.Equal<double>([50.0], data.ReferenceOhms);
    }

    [Fact]
    public void Parse_GigahertzRealImaginaryTwoPort_MatchesReferenceVector()
    {
        var data = Parse(Lines(
            "# GHz S RI R 50.0",
            "1.0000 0.3926 -0.1211 -0.0003 -0.0021 -0.0003 -0.0021 0.3926 -0.1211"));

        // REFERENCES [calc], Touchstone spec-style line under "# GHz S RI R 50.0".
        Assert.Equal(1e9, data.Axis.Hertz[0]);
        ComplexAssert.Polar(0.41085, -17.143, data.Get(0, 0, 0), 5e-6, 5e-4);
        Assert.Equal(-7.7263, data.Trace(TraceQuantity.S11).LevelsDb[0], 4);
        ComplexAssert.Polar(0.0021213, -98.130, data.Get(0, 1, 0), 5e-8, 5e-4);
        ComplexAssert.Polar(0.0021213, -98.130, data.Get(0, 0, 1), 5e-8, 5e-4);
        Assert.Equal(-53.468, data.Trace(TraceQuantity.S21).LevelsDb[0], 3);
        ComplexAssert.Close(new Complex(0.3926, -0.1211), data.Get(0, 1, 1), 1e-15);
    }

    [Fact]
    public void Parse_BareHash_UsesDefaultsGigahertzSMagnitudeAngle50Ohms()
    {
        var data = Parse(Lines("#", "2 .95 -26 3.57 157 .04 76 .66 -14"));

        // REFERENCES [calc]: bare "#" means GHz, S, MA, R 50 (Touchstone spec defaults).
        Assert.Equal(2e9, data.Axis.Hertz[0]);
        Assert.Equal(TouchstoneParameter.S, data.Parameter);
        Assert.Equal<double>([50.0, 50.0], data.ReferenceOhms);
        ComplexAssert.Close(new Complex(0.85385, -0.41645), data.Get(0, 0, 0), 5e-6);
        ComplexAssert.Close(new Complex(-3.28620, 1.39491), data.Get(0, 1, 0), 5e-6);
        Assert.Equal(11.0534, data.Trace(TraceQuantity.S21).LevelsDb[0], 4);
        ComplexAssert.Close(new Complex(0.00968, 0.03881), data.Get(0, 0, 1), 5e-6);
        ComplexAssert.Close(new Complex(0.64040, -0.15967), data.Get(0, 1, 1), 5e-6);
    }

    [Theory]
    [InlineData(-3.0103, 45, 0.5, 0.5)]
    [InlineData(-20, -90, 0, -0.1)]
    [InlineData(-6, 180, -0.501187, 0)]
    public void Parse_DecibelAngle_ConvertsToRealImaginary(double db, double degrees, double re, double im)
    {
        var data = Parse(Lines("# Hz S DB R 50", $"1 {db} {degrees}"), "test.s1p", 1);

        // REFERENCES [calc]: DB→RI conversions (Touchstone spec: DB is 20·log10|x|, angle in degrees).
        ComplexAssert.Close(new Complex(re, im), data.Get(0, 0, 0), 5e-6);
    }

    [Theory]
    [InlineData("Hz", 1.0)]
    [InlineData("kHz", 1e3)]
    [InlineData("MHz", 1e6)]
    [InlineData("GHz", 1e9)]
    [InlineData("mhz", 1e6)]
    [InlineData("GHZ", 1e9)]
    public void Parse_FrequencyUnit_ScalesFrequencies(string unit, double scale)
    {
        var data = Parse(Lines($"# {unit} S RI R 50", "2.5 0.1 0", "3.5 0.1 0"), "test.s1p", 1);

        // Touchstone spec: units Hz, kHz, MHz, GHz, case-insensitive.
        Assert.Equal(2.5 * scale, data.Axis.Hertz[0]);
        Assert.Equal(3.5 * scale, data.Axis.Hertz[1]);
    }

    [Fact]
    public void Parse_OptionWordsInAnyCaseAndWithComment_AreRead()
    {
        var data = Parse(Lines("# mhz s ri r 75 ! lower-case words", "137.5 0.25 -0.5"), "test.s1p", 1);

        // Touchstone spec: option line case-insensitive; "!" starts a comment.
        Assert.Equal(137.5e6, data.Axis.Hertz[0]);
        Assert.Equal<double>([75.0], data.ReferenceOhms);
        Assert.Equal(new Complex(0.25, -0.5), data.Get(0, 0, 0));
    }

    [Fact]
    public void Parse_SecondOptionLine_IsIgnored()
    {
        var data = Parse(Lines("# MHz S RI R 50", "# Hz S DB R 75", "100 0.5 0", "# GHz", "200 0.25 0"), "test.s1p", 1);

        // Touchstone spec: the first option line counts; later option lines are ignored.
        Assert.Equal<double>([100e6, 200e6], data.Axis.Hertz);
        Assert.Equal<double>([50.0], data.ReferenceOhms);
        Assert.Equal(new Complex(0.25, 0), data.Get(1, 0, 0));
    }

    [Fact]
    public void Parse_Comments_AreSkippedAndThoseBeforeTheDataKept()
    {
        var data = Parse(Lines(
            "! PSF-24-0001 preselector",
            "!   simulated",
            "# MHz S RI R 50",
            "! between",
            "100 0.5 0 ! trailing comment",
            "",
            "200\t0.25\t0"), "test.s1p", 1);

        Assert.Equal<string>(["PSF-24-0001 preselector", "simulated", "between"], data.Comments);
        Assert.Equal(2, data.Axis.Count);
        Assert.Equal(new Complex(0.25, 0), data.Get(1, 0, 0));
    }

    [Fact]
    public void Parse_Version1TwoPort_ReadsOrderN11N21N12N22()
    {
        var data = Parse(Lines("# Hz S RI R 50", "1 11 0.1 21 0.2 12 0.3 22 0.4"));

        // Touchstone spec: version 1 two-port order on a line is f N11 N21 N12 N22.
        Assert.Equal(new Complex(11, 0.1), data.Get(0, 0, 0));
        Assert.Equal(new Complex(21, 0.2), data.Get(0, 1, 0));
        Assert.Equal(new Complex(12, 0.3), data.Get(0, 0, 1));
        Assert.Equal(new Complex(22, 0.4), data.Get(0, 1, 1));
        Assert.Equal(new Complex(21, 0.2), data.Trace(TraceQuantity.S21).Samples[0]);
        Assert.Equal(new Complex(12, 0.3), data.Trace(TraceQuantity.S12).Samples[0]);
    }

    [Fact]
    public void Parse_PointWrappedOverLines_ReadsLikeOneLine()
    {
        var oneLine = Parse(Lines("# Hz S RI R 50", "1 11 0.1 21 0.2 12 0.3 22 0.4", "2 1 0 2 0 3 0 4 0"));
        var wrapped = Parse(Lines("# Hz S RI R 50", "1 11 0.1 21 0.2", "  12 0.3", "  22 0.4", "2 1 0 2 0 3 0 4 0"));

        for (int p = 0; p < 2; p++)
        {
            for (int r = 0; r < 2; r++)
            {
                for (int c = 0; c < 2; c++)
                {
                    Assert.Equal(oneLine.Get(p, r, c), wrapped.Get(p, r, c));
                }
            }
        }
    }

    [Theory]
    [InlineData("1 0.5 0", 1)]
    [InlineData("1 0.5 0 0.1 0 0.1 0 0.5 0", 2)]
    public void Parse_NoPortsFromExtension_InfersPortsFromFirstLine(string line, int ports)
    {
        var data = Parse(Lines("# Hz S RI R 50", line), "test.txt", null);

        Assert.Equal(ports, data.PortCount);
    }

    [Fact]
    public void Parse_Version1TwoPortNoiseData_IsSkipped()
    {
        var data = Parse(Lines(
            "# GHz S MA R 50",
            "2 .95 -26 3.57 157 .04 76 .66 -14",
            "22 .60 -144 1.30 40 .14 40 .56 -85",
            "! noise parameters: f NFmin |Gopt| angle Rn",
            "4 .7 .64 69 .38",
            "18 2.7 .46 -33 .40"));

        // Touchstone spec (version 1): two-port noise data follow, starting at a frequency not above the last.
        Assert.Equal<double>([2e9, 22e9], data.Axis.Hertz);
    }

    [Fact]
    public void Parse_ThreePortRowsOnSeparateLines_ReadsRowByRow()
    {
        var data = Parse(Lines(
            "# Hz S RI R 50",
            "1 11 0 12 0 13 0",
            "  21 0 22 0 23 0",
            "  31 0 32 0 33 0"), "test.s3p", 3);

        // Touchstone spec: three or more ports, the matrix row by row, each row on a new line.
        Assert.Equal(3, data.PortCount);
        for (int r = 0; r < 3; r++)
        {
            for (int c = 0; c < 3; c++)
            {
                Assert.Equal(new Complex(10 * (r + 1) + c + 1, 0), data.Get(0, r, c));
            }
        }
    }

    [Fact]
    public void ToTraceSet_TwoPort_HoldsFourSParametersWithReference()
    {
        var data = Parse(Lines("# Hz S RI R 75", "1 11 0.1 21 0.2 12 0.3 22 0.4"));

        var set = data.ToTraceSet();

        Assert.Equal([TraceQuantity.S11, TraceQuantity.S21, TraceQuantity.S12, TraceQuantity.S22], set.Traces.Select(t => t.Quantity));
        Assert.Equal(75, set.ReferenceOhms);
        Assert.Equal(new Complex(21, 0.2), ((ComplexTrace)set.Find(TraceQuantity.S21)!).Samples[0]);
    }

    [Fact]
    public void Trace_OnePortAskedForS21_Throws()
    {
        var data = Parse(Lines("# Hz S RI R 50", "1 0.5 0"), "test.s1p", 1);

        Assert.Throws<ArgumentException>(() => data.Trace(TraceQuantity.S21));
        Assert.Throws<ArgumentException>(() => data.Trace(TraceQuantity.Power));
        Assert.Single(data.ToTraceSet().Traces);
    }
}
