using System.Numerics;
using BenchRunner.Simulator.Circuits;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Circuits;

public class AbcdTests
{
    private const double Z0 = 50;

    [Fact]
    public void ToSParameters_Shunt50Ohms_GivesTwoThirdsThrough()
    {
        var s = Abcd.Shunt(1.0 / 50).ToSParameters(Z0);

        // REFERENCES: Pozar, Microwave Engineering, Table 4.2 [calc]: S21 = 0.66667 (−3.5218 dB), S11 = −0.33333.
        ComplexAssert.Close(new Complex(0.66667, 0), s.S21, 5e-6);
        ComplexAssert.Close(new Complex(-0.33333, 0), s.S11, 5e-6);
        Assert.Equal(-3.5218, 20 * Math.Log10(s.S21.Magnitude), 4);
    }

    [Fact]
    public void ToSParameters_Shunt10PicofaradsAt100Megahertz_MatchesReference()
    {
        var s = new Network(Elements.ShuntCapacitor(10e-12)).Evaluate(100e6, Z0);

        // REFERENCES: Pozar, Table 4.2 [calc]: S21 = 0.975920 − j0.153297, S11 = −0.024080 − j0.153297.
        ComplexAssert.Close(new Complex(0.975920, -0.153297), s.S21, 5e-7);
        ComplexAssert.Close(new Complex(-0.024080, -0.153297), s.S11, 5e-7);
    }

    [Fact]
    public void ToSParameters_SeriesJ50Ohms_MatchesReference()
    {
        var s = Abcd.Series(new Complex(0, 50)).ToSParameters(Z0);

        // REFERENCES: Pozar, Table 4.2 [calc]: S21 = 0.8 − j0.4, S11 = 0.2 + j0.4.
        ComplexAssert.Close(new Complex(0.8, -0.4), s.S21, 1e-12);
        ComplexAssert.Close(new Complex(0.2, 0.4), s.S11, 1e-12);
    }

    [Fact]
    public void ToSParameters_Series100NanohenriesAt100Megahertz_MatchesReference()
    {
        var s = new Network(Elements.SeriesInductor(100e-9)).Evaluate(100e6, Z0);

        // REFERENCES: Pozar, Table 4.2 [calc]: S21 = 0.716957 − j0.450477 (−1.4451 dB, ∠−32.142°).
        ComplexAssert.Close(new Complex(0.716957, -0.450477), s.S21, 5e-7);
        Assert.Equal(-1.4451, 20 * Math.Log10(s.S21.Magnitude), 4);
        Assert.Equal(-32.142, s.S21.Phase * 180 / Math.PI, 3);
    }

    [Fact]
    public void ToSParameters_ReciprocalTwoPort_HasEqualTransmissions()
    {
        var s = Abcd.Series(new Complex(10, 30)).Cascade(Abcd.Shunt(new Complex(0.002, -0.01))).ToSParameters(Z0);

        // A reciprocal two-port has AD − BC = 1, hence S12 = S21 (Pozar, §4.3).
        ComplexAssert.RelativelyClose(s.S21, s.S12, 1e-12);
    }

    [Fact]
    public void Cascade_TwoSeriesImpedances_AddThem()
    {
        var z1 = new Complex(3, 4);
        var z2 = new Complex(-1, 7);

        var product = Abcd.Series(z1).Cascade(Abcd.Series(z2));

        // [[1, Z1], [0, 1]]·[[1, Z2], [0, 1]] = [[1, Z1 + Z2], [0, 1]] (Pozar, Table 4.1).
        Assert.Equal(Abcd.Series(z1 + z2), product);
    }

    [Fact]
    public void Cascade_IsTheMatrixProductInOrder()
    {
        var a = new Abcd(new Complex(1, 2), new Complex(3, -1), new Complex(0.5, 0.25), new Complex(-2, 1));
        var b = new Abcd(new Complex(0, 1), new Complex(2, 2), new Complex(1, -1), new Complex(4, 0));

        var ab = a.Cascade(b);

        ComplexAssert.Close(a.A * b.A + a.B * b.C, ab.A, 1e-12);
        ComplexAssert.Close(a.A * b.B + a.B * b.D, ab.B, 1e-12);
        ComplexAssert.Close(a.C * b.A + a.D * b.C, ab.C, 1e-12);
        ComplexAssert.Close(a.C * b.B + a.D * b.D, ab.D, 1e-12);
        Assert.NotEqual(ab, b.Cascade(a));
        Assert.Equal(a, a.Cascade(Abcd.Identity));
    }

    [Fact]
    public void FromSParameters_OfToSParameters_GivesTheMatrixBack()
    {
        var abcd = Abcd.Series(new Complex(12, -40)).Cascade(Abcd.Shunt(new Complex(0.004, 0.02))).Cascade(new Abcd(new Complex(2, 0), 0, 0, new Complex(0.5, 0)));

        var back = Abcd.FromSParameters(abcd.ToSParameters(Z0), Z0);

        ComplexAssert.Close(abcd.A, back.A, 1e-12);
        ComplexAssert.Close(abcd.B, back.B, 1e-10);
        ComplexAssert.Close(abcd.C, back.C, 1e-14);
        ComplexAssert.Close(abcd.D, back.D, 1e-12);
    }

    [Fact]
    public void FromSParameters_NoTransmission_IsRefused()
    {
        var open = new SParameters(Complex.One, Complex.Zero, Complex.Zero, Complex.One);

        Assert.Throws<ArgumentException>(() => Abcd.FromSParameters(open, Z0));
    }

    [Fact]
    public void ToSParameters_ZeroReference_IsRefused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Abcd.Identity.ToSParameters(0));
    }
}
