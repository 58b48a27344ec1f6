using System.Numerics;
using BenchRunner.Core.Quantities;
using BenchRunner.Simulator.Circuits;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Circuits;

public class ElementTests
{
    private const double Z0 = 50;

    [Fact]
    public void IdealTransformer_TwoToOneIntoTwelveAndAHalfOhms_MatchesFiftyOhms()
    {
        // 16.667 Ω in parallel with the 50 Ω port is 12.5 Ω; a 2:1 transformer shows it as 4·12.5 = 50 Ω
        // (Pozar, Microwave Engineering, Table 4.1: Z1 = N²·Z2).
        var network = new Network(new IdealTransformer(2), Elements.ShuntResistor(50.0 / 3));

        var s = network.Evaluate(10e6, Z0);

        Assert.True(s.S11.Magnitude < 1e-12, $"S11 = {s.S11}");
    }

    [Fact]
    public void IdealTransformer_Matching_GivesTheSquareRootOfTheImpedanceRatio()
    {
        Assert.Equal(0.5, IdealTransformer.Matching(50, 200).TurnsRatio, 12);
    }

    [Fact]
    public void TransmissionLine_QuarterWaveMatched_DelaysByNinetyDegrees()
    {
        var line = TransmissionLine.FromElectricalLength(50, 90, Frequency.FromMegahertz(100));

        var s = new Network(line).Evaluate(100e6, Z0);

        // A matched lossless line: S21 = e^(−jβℓ) = −j at βℓ = 90°, S11 = 0 (Pozar, §2.3).
        ComplexAssert.Close(new Complex(0, -1), s.S21, 1e-12);
        Assert.True(s.S11.Magnitude < 1e-12);
    }

    [Fact]
    public void TransmissionLine_QuarterWaveTransformer_Matches100OhmsTo50()
    {
        // Zin = Z1²/ZL for a quarter-wave section (Pozar, §2.5): 70.711² / 100 = 50 Ω. The load is
        // a 50 Ω series resistor in front of the 50 Ω port.
        var network = new Network(
            TransmissionLine.FromElectricalLength(Math.Sqrt(5000), 90, Frequency.FromMegahertz(100)),
            Elements.SeriesResistor(50));

        Assert.True(network.Evaluate(100e6, Z0).S11.Magnitude < 1e-12);
        Assert.True(network.Evaluate(150e6, Z0).S11.Magnitude > 0.05);
    }

    [Fact]
    public void TransmissionLine_LossGrowsAsRootFrequency()
    {
        // 10 m of 0.1 dB/m (given at 100 MHz): 1 dB at 100 MHz, √4 = 2 times that at 400 MHz.
        var line = TransmissionLine.FromPhysicalLength(50, 10, 0.66, 0.1, Frequency.FromMegahertz(100));
        var network = new Network(line);

        Assert.Equal(-1.0, 20 * Math.Log10(network.Evaluate(100e6, Z0).S21.Magnitude), 9);
        Assert.Equal(-2.0, 20 * Math.Log10(network.Evaluate(400e6, Z0).S21.Magnitude), 9);
    }

    [Fact]
    public void TransmissionLine_PhysicalLength_HasElectricalLengthFromVelocityFactor()
    {
        var line = TransmissionLine.FromPhysicalLength(50, 1, 0.66);
        double expected = 360 * 100e6 * 1 / (0.66 * 299_792_458);

        Assert.Equal(expected, line.ElectricalLengthDegrees(100e6), 9);
        double phase = new Network(line).Evaluate(100e6, Z0).S21.Phase * 180 / Math.PI;
        Assert.Equal(-expected + 360, phase, 6);
    }

    [Fact]
    public void TransmissionLine_LossWithoutFrequency_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => TransmissionLine.FromPhysicalLength(50, 1, 0.66, 0.2));
        Assert.Throws<ArgumentOutOfRangeException>(() => TransmissionLine.FromPhysicalLength(50, 1, 1.2));
    }

    [Fact]
    public void SeriesElement_AndShuntElement_UseImpedanceAndAdmittance()
    {
        var part = FixedImpedance.FromOhms(new Complex(20, 10));

        Assert.Equal(Abcd.Series(new Complex(20, 10)), Elements.Series(part).AbcdAt(1e6));
        Assert.Equal(Abcd.Shunt(1 / new Complex(20, 10)), Elements.Shunt(part).AbcdAt(1e6));
    }

    [Fact]
    public void Network_Empty_IsAThrough()
    {
        var s = new Network().Evaluate(1e9, Z0);

        Assert.Equal(Complex.One, s.S21);
        Assert.Equal(Complex.Zero, s.S11);
    }

    [Fact]
    public void Network_Nested_EqualsTheFlatChain()
    {
        var a = Elements.SeriesInductor(100e-9);
        var b = Elements.ShuntCapacitor(20e-12);
        var c = Elements.SeriesResistor(5);

        var flat = new Network(a, b, c).AbcdAt(77e6);
        var nested = new Network(a, new Network(b, c)).AbcdAt(77e6);

        ComplexAssert.Close(flat.A, nested.A, 1e-12);
        ComplexAssert.Close(flat.B, nested.B, 1e-12);
        ComplexAssert.Close(flat.C, nested.C, 1e-12);
        ComplexAssert.Close(flat.D, nested.D, 1e-12);
    }

    [Fact]
    public void Network_ZeroHertz_IsRefused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new Network(Elements.SeriesCapacitor(1e-12)).Evaluate(0, Z0));
    }

    [Fact]
    public void TwoPortElement_ThroughTheChainMatrix_GivesTheDeviceBack()
    {
        var device = new Network(Elements.SeriesInductor(50e-9), Elements.ShuntResistor(200));

        var wrapped = new Network(new TwoPortElement(device)).Evaluate(140e6, Z0);
        var direct = device.Evaluate(140e6, Z0);

        ComplexAssert.Close(direct.S11, wrapped.S11, 1e-12);
        ComplexAssert.Close(direct.S21, wrapped.S21, 1e-12);
    }
}
