using System.Numerics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.TraceFiles;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Tests.TraceFiles;

public partial class CsvTraceFileTests
{
    private static readonly FrequencyAxis Axis =
        FrequencyAxis.Linear(Frequency.FromMegahertz(127.5), Frequency.FromMegahertz(147.5), 21);

    private static TraceSet Parse(string text, string name = "psf.csv") => CsvTraceFile.Parse(new StringReader(text), name);

    private static string Lines(params string[] lines) => string.Join("\n", lines) + "\n";

    private static ComplexTrace SParameter(TraceQuantity quantity, double seed) =>
        new(Axis, quantity, Enumerable.Range(0, Axis.Count).Select(p => Complex.FromPolarCoordinates(Math.Pow(10, -seed - 0.07 * p), seed + 0.3 * p)));

    private static string Write(TraceSet set)
    {
        var writer = new StringWriter();
        CsvTraceFile.Write(writer, set);
        return writer.ToString();
    }

    private static void AssertSameSet(TraceSet expected, TraceSet actual)
    {
        Assert.Equal<double>(expected.Axis.Hertz, actual.Axis.Hertz);
        Assert.Equal(expected.ReferenceOhms, actual.ReferenceOhms);
        Assert.Equal(expected.Traces.Select(t => t.Quantity), actual.Traces.Select(t => t.Quantity));
        foreach (var (e, a) in expected.Traces.Zip(actual.Traces))
        {
            if (e is ComplexTrace ce)
            {
                Assert.Equal<Complex>(ce.Samples, Assert.IsType<ComplexTrace>(a).Samples);
            }
            else
            {
                Assert.IsType<PowerTrace>(a);
                Assert.Equal<double>(e.LevelsDb, a.LevelsDb);
            }
        }
    }

    [Fact]
    public void Write_ThenParse_TwoPortSet_IsExactlyTheSame()
    {
        var set = new TraceSet(Axis,
            [SParameter(TraceQuantity.S11, 1.3), SParameter(TraceQuantity.S21, 0.1), SParameter(TraceQuantity.S12, 2.2), SParameter(TraceQuantity.S22, 1.1)],
            75);

        AssertSameSet(set, Parse(Write(set)));
    }

    [Fact]
    public void Write_ThenParse_MixedSParameterAndPower_IsExactlyTheSame()
    {
        var power = new PowerTrace(Axis, Enumerable.Range(0, Axis.Count).Select(p => -97.25 + 0.123456789 * p));
        var set = new TraceSet(Axis, [power, SParameter(TraceQuantity.S21, 0.4)]);

        AssertSameSet(set, Parse(Write(set)));
    }

    [Fact]
    public void Write_OnePort_GivesDocumentedLayout()
    {
        var axis = FrequencyAxis.FromHertz([137.5e6, 138e6]);
        var set = new TraceSet(axis, [new ComplexTrace(axis, TraceQuantity.S11, [new(0.1, -0.25), new(0.5, 0)])]);

        var text = Write(set);

        Assert.Equal(
            Lines(
                "# benchrunner-trace 1",
                "# reference_ohms = 50",
                "frequency_hz,s11_re,s11_im",
                "137500000,0.1,-0.25",
                "138000000,0.5,0"),
            text.ReplaceLineEndings("\n"));
    }

    [Fact]
    public void Parse_MinimalPowerFile_NeedsNoSignature()
    {
        var set = Parse(Lines("frequency_hz,power_dbm", "21400000,-20.5", "21500000,-61"));

        var trace = Assert.IsType<PowerTrace>(Assert.Single(set.Traces));
        Assert.Equal<double>([21.4e6, 21.5e6], set.Axis.Hertz);
        Assert.Equal<double>([-20.5, -61], trace.LevelsDb);
        Assert.Equal(50, set.ReferenceOhms);
    }

    [Fact]
    public void Parse_CommentsSpacesBlankLinesAndLetterCase_AreTolerated()
    {
        var set = Parse(
            "# BenchRunner-Trace 1\r\n"
            + "# PSF-24-0001, simulated demo data\r\n"
            + "# operator = bench 2\r\n"
            + "#reference_ohms=75\r\n"
            + "\r\n"
            + "Frequency_Hz, S21_RE , s21_im\r\n"
            + "1.375e8, 0.5 ,-0.25\r\n"
            + "# a comment between rows\r\n"
            + "\r\n"
            + "137600000,0.4,-0.3\r\n");

        Assert.Equal(75, set.ReferenceOhms);
        var s21 = Assert.IsType<ComplexTrace>(set.Find(TraceQuantity.S21));
        Assert.Equal<Complex>([new(0.5, -0.25), new(0.4, -0.3)], s21.Samples);
        Assert.Equal(137.5e6, set.Axis.Hertz[0]);
    }

    [Fact]
    public void Read_File_UsesPathInErrors()
    {
        using var dir = new TempDirectory();
        var path = dir.Write("bad.csv", Lines("frequency_hz,power_dbm", "1,x"));

        var ex = Assert.Throws<Core.Diagnostics.InputFormatException>(() => CsvTraceFile.Read(path));

        Assert.Equal($"{path}:2:3: expected a number, found \"x\"", ex.Message);
    }
}
