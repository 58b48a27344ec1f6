using System.Globalization;
using System.Numerics;
using BenchRunner.Core.Tests.Support;
using BenchRunner.Core.TraceFiles;

namespace BenchRunner.Core.Tests.TraceFiles;

public partial class TouchstoneReaderTests
{
    private static string R(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    private static string Version2(string option, int ports, string dataLine) => Lines(
        [
            "[Version] 2.0",
            option,
            $"[Number of Ports] {ports}",
            .. ports == 2 ? (string[])["[Two-Port Data Order] 12_21"] : [],
            "[Number of Frequencies] 1",
            "[Network Data]",
            dataLine,
            "[End]",
        ]);

    [Fact]
    public void Parse_Version2OnePortZ_ConvertsToReflection()
    {
        var data = Parse(Version2("# MHz Z RI R 50", 1, "2 196.08 -367.12"), "test.ts", null);

        // REFERENCES [calc]: Zin = 196.08 − j367.12 Ω at 50 Ω is S11 = 0.87402 − j0.18795.
        Assert.Equal(TouchstoneParameter.Z, data.Parameter);
        ComplexAssert.Close(new Complex(0.87402, -0.18795), data.Get(0, 0, 0), 2e-5);
    }

    [Fact]
    public void Parse_Version1OnePortZ_IsNormalisedToR()
    {
        // Version 1 Z data are divided by R (Touchstone spec, option line; the version 2.0 spec keeps ohms).
        var z = new Complex(196.08, -367.12) / 50;
        var data = Parse(Lines("# MHz Z RI R 50", $"2 {R(z.Real)} {R(z.Imaginary)}"), "test.s1p", 1);

        // REFERENCES [calc]: the same Zin as the version 2 case.
        ComplexAssert.Close(new Complex(0.87402, -0.18795), data.Get(0, 0, 0), 2e-5);
    }

    [Fact]
    public void Parse_TwoPortZOfShunt50Ohms_GivesPozarValues()
    {
        // A shunt 50 Ω between the ports has Z11 = Z12 = Z21 = Z22 = 50 Ω.
        var data = Parse(Version2("# MHz Z RI R 50", 2, "100 50 0 50 0 50 0 50 0"), "test.ts", null);

        // REFERENCES (Pozar, Microwave Engineering, Table 4.2) [calc]: shunt 50 Ω → S21 = 0.66667, S11 = −0.33333.
        ComplexAssert.Close(new Complex(0.66667, 0), data.Get(0, 1, 0), 5e-6);
        ComplexAssert.Close(new Complex(0.66667, 0), data.Get(0, 0, 1), 5e-6);
        ComplexAssert.Close(new Complex(-0.33333, 0), data.Get(0, 0, 0), 5e-6);
        ComplexAssert.Close(new Complex(-0.33333, 0), data.Get(0, 1, 1), 5e-6);
    }

    [Fact]
    public void Parse_TwoPortZOfShunt10PicofaradsAt100Megahertz_GivesPozarValues()
    {
        var zc = 1 / (new Complex(0, 2 * Math.PI * 100e6 * 10e-12));
        var pair = $"{R(zc.Real)} {R(zc.Imaginary)}";
        var data = Parse(Version2("# MHz Z RI R 50", 2, $"100 {pair} {pair} {pair} {pair}"), "test.ts", null);

        // REFERENCES (Pozar, Table 4.2) [calc]: shunt 10 pF at 100 MHz.
        ComplexAssert.Close(new Complex(0.975920, -0.153297), data.Get(0, 1, 0), 5e-7);
        ComplexAssert.Close(new Complex(-0.024080, -0.153297), data.Get(0, 0, 0), 5e-7);
    }

    [Fact]
    public void Parse_TwoPortYOfSeriesJ50Ohms_GivesPozarValues()
    {
        // A series impedance Z has Y11 = Y22 = 1/Z, Y12 = Y21 = −1/Z; for Z = j50 Ω, 1/Z = −j0.02 S.
        var data = Parse(Version2("# MHz Y RI R 50", 2, "100 0 -0.02 0 0.02 0 0.02 0 -0.02"), "test.ts", null);

        // REFERENCES (Pozar, Table 4.2) [calc]: series j50 Ω → S21 = 0.8 − j0.4, S11 = 0.2 + j0.4.
        ComplexAssert.Close(new Complex(0.8, -0.4), data.Get(0, 1, 0), 1e-12);
        ComplexAssert.Close(new Complex(0.2, 0.4), data.Get(0, 0, 0), 1e-12);
    }

    [Fact]
    public void Parse_Version1TwoPortYOfSeries100NanohenriesAt100Megahertz_GivesPozarValues()
    {
        // Version 1 Y data are multiplied by R: y = Y·50 (Touchstone spec, option line).
        var y = 50 / new Complex(0, 2 * Math.PI * 100e6 * 100e-9);
        string self = $"{R(y.Real)} {R(y.Imaginary)}", mutual = $"{R(-y.Real)} {R(-y.Imaginary)}";
        var data = Parse(Lines("# MHz Y RI R 50", $"100 {self} {mutual} {mutual} {self}"));

        // REFERENCES (Pozar, Table 4.2) [calc]: series 100 nH at 100 MHz → S21 = 0.716957 − j0.450477 (−1.4451 dB, ∠−32.142°).
        ComplexAssert.Close(new Complex(0.716957, -0.450477), data.Get(0, 1, 0), 5e-7);
        Assert.Equal(-1.4451, data.Trace(Core.Traces.TraceQuantity.S21).LevelsDb[0], 4);
        ComplexAssert.Polar(0.846733, -32.142, data.Get(0, 1, 0), 5e-6, 5e-4);
    }
}
