using System.Numerics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Tests.Support;
using BenchRunner.Core.TraceFiles;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Tests.TraceFiles;

public class TouchstoneWriterTests
{
    public static TheoryData<int, int, TouchstoneFormat, TouchstoneFrequencyUnit> RoundTripCases()
    {
        var cases = new TheoryData<int, int, TouchstoneFormat, TouchstoneFrequencyUnit>();
        foreach (var version in new[] { 1, 2 })
        {
            foreach (var ports in new[] { 1, 2, 3 })
            {
                foreach (var format in Enum.GetValues<TouchstoneFormat>())
                {
                    foreach (var unit in Enum.GetValues<TouchstoneFrequencyUnit>())
                    {
                        cases.Add(version, ports, format, unit);
                    }
                }
            }
        }

        return cases;
    }

    /// <summary>Values spread over magnitudes from about 1e-5 to 3 and all four quadrants.</summary>
    private static TouchstoneData Sample(int ports, double[]? references = null, int version = 1)
    {
        var axis = FrequencyAxis.Linear(Frequency.FromMegahertz(127.5), Frequency.FromMegahertz(147.5), 41);
        var values = new List<Complex>();
        for (int p = 0; p < axis.Count; p++)
        {
            for (int r = 0; r < ports; r++)
            {
                for (int c = 0; c < ports; c++)
                {
                    double magnitude = Math.Pow(10, -0.11 * p - 0.7 * (r + c) + 0.45);
                    double radians = 0.37 * p + 1.9 * r - 0.83 * c + 0.1;
                    values.Add(Complex.FromPolarCoordinates(magnitude, radians));
                }
            }
        }

        return new TouchstoneData(axis, ports, values, references ?? [50], version);
    }

    private static TouchstoneData WriteAndRead(TouchstoneData data, TouchstoneWriteOptions options, out string text)
    {
        var writer = new StringWriter();
        TouchstoneWriter.Write(writer, data, options);
        text = writer.ToString();
        var name = options.Version == 2 ? "round-trip.ts" : $"round-trip.s{data.PortCount}p";
        return TouchstoneReader.Parse(new StringReader(text), name, options.Version == 2 ? null : data.PortCount);
    }

    [Theory]
    [MemberData(nameof(RoundTripCases))]
    public void Write_ThenRead_GivesTheSameData(int version, int ports, TouchstoneFormat format, TouchstoneFrequencyUnit unit)
    {
        var data = Sample(ports);
        var options = new TouchstoneWriteOptions { Version = version, Format = format, FrequencyUnit = unit };

        var back = WriteAndRead(data, options, out _);

        Assert.Equal(version, back.Version);
        Assert.Equal(ports, back.PortCount);
        Assert.Equal<double>(data.ReferenceOhms, back.ReferenceOhms);
        Assert.Equal<double>(data.Axis.Hertz, back.Axis.Hertz);
        for (int p = 0; p < data.Axis.Count; p++)
        {
            for (int r = 0; r < ports; r++)
            {
                for (int c = 0; c < ports; c++)
                {
                    ComplexAssert.RelativelyClose(data.Get(p, r, c), back.Get(p, r, c), 1e-12);
                }
            }
        }
    }

    [Fact]
    public void Write_Version2UnequalReferences_WritesReferenceAndReadsItBack()
    {
        var data = Sample(2, [50, 75]);

        var back = WriteAndRead(data, new TouchstoneWriteOptions { Version = 2 }, out var text);

        Assert.Contains("[Reference] 50 75\n", text);
        Assert.Equal<double>([50.0, 75.0], back.ReferenceOhms);
        ComplexAssert.RelativelyClose(data.Get(3, 1, 0), back.Get(3, 1, 0), 1e-15);
    }

    [Fact]
    public void Write_Version1TwoPort_WritesOptionLineAndOrderN11N21N12N22()
    {
        var axis = FrequencyAxis.FromHertz([137.5e6]);
        var data = new TouchstoneData(axis, 2, [new(0.11, 0), new(0.12, 0), new(0.21, 0), new(0.22, 0)], [50]);

        var writer = new StringWriter();
        TouchstoneWriter.Write(writer, data, new TouchstoneWriteOptions { Format = TouchstoneFormat.RealImaginary });
        var lines = writer.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries);

        // Touchstone spec: option line "# MHz S RI R 50"; version 1 two-port order N11 N21 N12 N22.
        Assert.Equal("# MHz S RI R 50", lines[0]);
        Assert.Equal("137.5 0.11 0 0.21 0 0.12 0 0.22 0", lines[^1]);
        Assert.DoesNotContain(lines, l => l.StartsWith('['));
    }

    [Fact]
    public void Write_Version2TwoPort_WritesKeywordsAndOrder12_21()
    {
        var axis = FrequencyAxis.FromHertz([137.5e6, 138.5e6]);
        var values = new Complex[] { 0.11, 0.12, 0.21, 0.22, 0.11, 0.12, 0.21, 0.22 };
        var data = new TouchstoneData(axis, 2, values, [50]);

        var writer = new StringWriter();
        TouchstoneWriter.Write(writer, data, new TouchstoneWriteOptions { Version = 2, Comments = ["PSF-24-0001"] });
        var lines = writer.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries);

        // Touchstone spec (2.0): keyword order and [Two-Port Data Order] 12_21 = N11 N12 N21 N22.
        Assert.Equal(
            [
                "! PSF-24-0001",
                "[Version] 2.0",
                "# MHz S RI R 50",
                "[Number of Ports] 2",
                "[Two-Port Data Order] 12_21",
                "[Number of Frequencies] 2",
            ],
            lines[..6]);
        Assert.Equal("[Network Data]", lines[^4]);
        Assert.Equal("137.5 0.11 0 0.12 0 0.21 0 0.22 0", lines[^3]);
        Assert.Equal("[End]", lines[^1]);
    }

    [Theory]
    [InlineData(127.55e6, TouchstoneFrequencyUnit.Megahertz, "127.55")]
    [InlineData(137.5e6, TouchstoneFrequencyUnit.Gigahertz, "0.1375")]
    [InlineData(21.4e6, TouchstoneFrequencyUnit.Kilohertz, "21400")]
    [InlineData(455e3, TouchstoneFrequencyUnit.Hertz, "455000")]
    public void Write_Frequency_UsesShortestExactText(double hertz, TouchstoneFrequencyUnit unit, string expected)
    {
        var data = new TouchstoneData(FrequencyAxis.FromHertz([hertz]), 1, [new Complex(0.5, 0)], [50]);

        var writer = new StringWriter();
        TouchstoneWriter.Write(writer, data, new TouchstoneWriteOptions { FrequencyUnit = unit });

        Assert.StartsWith(expected + " ", writer.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries)[^1]);
    }

    [Fact]
    public void Write_ReferenceOhmsOption_RenormalisesTheData()
    {
        // REFERENCES (Pozar, Table 4.2) [calc]: a shunt 50 Ω at 50 Ω has S11 = −1/3, S21 = 2/3.
        var data = new TouchstoneData(FrequencyAxis.FromHertz([100e6]), 2, [-1.0 / 3, 2.0 / 3, 2.0 / 3, -1.0 / 3], [50]);

        var back = WriteAndRead(data, new TouchstoneWriteOptions { ReferenceOhms = 75 }, out var text);

        // The same shunt at Z0 = 75 Ω: S21 = 2/(2 + 1.5), S11 = −1.5/(2 + 1.5) (Pozar, Table 4.2) [calc].
        Assert.Contains("# MHz S RI R 75\n", text);
        ComplexAssert.Close(new Complex(0.571429, 0), back.Get(0, 1, 0), 5e-7);
        ComplexAssert.Close(new Complex(-0.428571, 0), back.Get(0, 0, 0), 5e-7);
    }

    [Fact]
    public void Write_ZeroMagnitudeInDecibels_WritesTheFloor()
    {
        var data = new TouchstoneData(FrequencyAxis.FromHertz([1e6]), 1, [Complex.Zero], [50]);

        var back = WriteAndRead(data, new TouchstoneWriteOptions { Format = TouchstoneFormat.DecibelAngle }, out var text);

        Assert.Contains("1 -400 0\n", text);
        Assert.Equal(ComplexTrace.FloorDb, back.Trace(TraceQuantity.S11).LevelsDb[0]);
    }

    [Fact]
    public void Write_TraceSet_ReadsBackAsTheSameSet()
    {
        var data = Sample(2);
        var writer = new StringWriter();

        TouchstoneWriter.Write(writer, data.ToTraceSet(), new TouchstoneWriteOptions { Format = TouchstoneFormat.MagnitudeAngle });
        var back = TouchstoneReader.Parse(new StringReader(writer.ToString()), "set.s2p", 2).ToTraceSet();

        var s21 = (ComplexTrace)back.Find(TraceQuantity.S21)!;
        ComplexAssert.RelativelyClose(data.Get(7, 1, 0), s21.Samples[7], 1e-12);
    }

    [Fact]
    public void Write_TraceSetWithoutS12AndS22_Throws()
    {
        var full = Sample(2).ToTraceSet();
        var partial = new TraceSet(full.Axis, full.Traces.Where(t => t.Quantity is TraceQuantity.S11 or TraceQuantity.S21));

        var ex = Assert.Throws<ArgumentException>(() => TouchstoneWriter.Write(new StringWriter(), partial));

        Assert.Contains("lacks S12, S22", ex.Message);
    }

    [Fact]
    public void Write_TraceSetWithPower_Throws()
    {
        var axis = FrequencyAxis.FromHertz([1e6]);
        var set = new TraceSet(axis, [new PowerTrace(axis, [-20.0])]);

        Assert.Throws<ArgumentException>(() => TouchstoneWriter.Write(new StringWriter(), set));
    }

    [Fact]
    public void Write_Version1WithUnequalReferences_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() =>
            TouchstoneWriter.Write(new StringWriter(), Sample(2, [50, 75]), new TouchstoneWriteOptions { Version = 1 }));

        Assert.Contains("one reference resistance", ex.Message);
    }

    [Fact]
    public void Validate_SeveralBadOptions_ReportsThemAll()
    {
        var options = new TouchstoneWriteOptions { Version = 3, ReferenceOhms = -1, Comments = ["two\nlines"] };

        var ex = Assert.Throws<ArgumentException>(options.Validate);

        Assert.Contains("Version must be 1 or 2", ex.Message);
        Assert.Contains("ReferenceOhms must be finite and positive", ex.Message);
        Assert.Contains("one line", ex.Message);
    }

    [Fact]
    public void Write_Comments_ReadBackAsComments()
    {
        var options = new TouchstoneWriteOptions { Comments = ["PSF-24-0001", "simulated demo data"] };

        var back = WriteAndRead(Sample(1), options, out _);

        Assert.Equal("PSF-24-0001", back.Comments[0]);
        Assert.Equal("simulated demo data", back.Comments[1]);
    }
}
