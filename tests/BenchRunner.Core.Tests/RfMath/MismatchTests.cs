using System.Numerics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.RfMath;

namespace BenchRunner.Core.Tests.RfMath;

public class MismatchTests
{
    // Pozar, Microwave Engineering, ch. 2 (REFERENCES: VSWR table). Tolerances are half a
    // unit in the last digit given.
    [Theory]
    [InlineData(1.2, 0.090909)]
    [InlineData(1.5, 0.200000)]
    [InlineData(2.0, 0.333333)]
    [InlineData(3.0, 0.500000)]
    public void ReflectionMagnitudeFromVswr_MatchesPozarTable(double vswr, double gamma)
    {
        Assert.Equal(gamma, Mismatch.ReflectionMagnitudeFromVswr(vswr), 5e-7);
    }

    // Pozar, Microwave Engineering, ch. 2 (REFERENCES: VSWR table).
    [Theory]
    [InlineData(1.2, 20.828, 5e-4)]
    [InlineData(1.5, 13.979, 5e-4)]
    [InlineData(2.0, 9.5424, 5e-5)]
    [InlineData(3.0, 6.0206, 5e-5)]
    public void ReturnLossFromReflectionMagnitude_MatchesPozarTable(double vswr, double returnLossDb, double tolerance)
    {
        var returnLoss = Mismatch.ReturnLossFromReflectionMagnitude(Mismatch.ReflectionMagnitudeFromVswr(vswr));

        Assert.Equal(returnLossDb, returnLoss.Decibels, tolerance);
    }

    // Pozar, Microwave Engineering, ch. 2 (REFERENCES: VSWR table).
    [Theory]
    [InlineData(1.2, 0.03604, 5e-6)]
    [InlineData(1.5, 0.1773, 5e-5)]
    [InlineData(2.0, 0.5115, 5e-5)]
    [InlineData(3.0, 1.2494, 5e-5)]
    public void MismatchLossFromReflectionMagnitude_MatchesPozarTable(double vswr, double mismatchLossDb, double tolerance)
    {
        var mismatchLoss = Mismatch.MismatchLossFromReflectionMagnitude(Mismatch.ReflectionMagnitudeFromVswr(vswr));

        Assert.Equal(mismatchLossDb, mismatchLoss.Decibels, tolerance);
    }

    // Pozar, Microwave Engineering, ch. 2 (REFERENCES: VSWR table), read from |Γ| back to VSWR;
    // |Γ| has 6 decimals, so VSWR is good to about 1e-5.
    [Theory]
    [InlineData(0.090909, 1.2)]
    [InlineData(0.200000, 1.5)]
    [InlineData(0.333333, 2.0)]
    [InlineData(0.500000, 3.0)]
    public void VswrFromReflectionMagnitude_InvertsPozarTable(double gamma, double vswr)
    {
        Assert.Equal(vswr, Mismatch.VswrFromReflectionMagnitude(gamma), 2e-5);
    }

    [Theory]
    // REFERENCES: RF formulas, RL 20 dB → |Γ| 0.1, VSWR 1.2222; RL 10 dB → VSWR 1.9250 [calc].
    [InlineData(20, 1.2222)]
    [InlineData(10, 1.9250)]
    public void VswrFromReturnLoss_MatchesReferences(double returnLossDb, double vswr)
    {
        Assert.Equal(vswr, Mismatch.VswrFromReturnLoss(Ratio.FromDecibels(returnLossDb)), 5e-5);
    }

    [Fact]
    public void ReflectionMagnitudeFromReturnLoss_TwentyDecibels_IsOneTenth()
    {
        // REFERENCES: RF formulas, RL 20 dB → |Γ| 0.1 [calc].
        Assert.Equal(0.1, Mismatch.ReflectionMagnitudeFromReturnLoss(Ratio.FromDecibels(20)), 1e-12);
    }

    [Theory]
    [InlineData(0.999)]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    public void ReflectionMagnitudeFromVswr_BelowOneOrNotFinite_Throws(double vswr)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Mismatch.ReflectionMagnitudeFromVswr(vswr));
    }

    [Theory]
    [InlineData(1)]
    [InlineData(-0.1)]
    [InlineData(double.NaN)]
    public void VswrAndMismatchLoss_ReflectionNotBelowOne_Throws(double gamma)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Mismatch.VswrFromReflectionMagnitude(gamma));
        Assert.Throws<ArgumentOutOfRangeException>(() => Mismatch.MismatchLossFromReflectionMagnitude(gamma));
    }

    [Theory]
    [InlineData(0)]
    [InlineData(1.01)]
    [InlineData(double.NaN)]
    public void ReturnLossFromReflectionMagnitude_OutOfRange_Throws(double gamma)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Mismatch.ReturnLossFromReflectionMagnitude(gamma));
    }

    [Fact]
    public void ReturnLoss_NegativeOrZero_Throws()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Mismatch.ReflectionMagnitudeFromReturnLoss(Ratio.FromDecibels(-1)));
        Assert.Throws<ArgumentOutOfRangeException>(() => Mismatch.VswrFromReturnLoss(Ratio.Unity));
    }

    [Theory]
    // Pozar, Microwave Engineering, ch. 2: Γ = (ZL − Z0)/(ZL + Z0); matched, short, and a
    // 100 Ω load on 50 Ω (VSWR 2, |Γ| = 1/3 as in the table).
    [InlineData(50, 0, 0)]
    [InlineData(0, 0, -1)]
    [InlineData(100, 0, 1.0 / 3)]
    [InlineData(0, 50, 0)]
    public void ReflectionFromImpedance_SimpleLoads(double r, double x, double gammaReal)
    {
        var gamma = Mismatch.ReflectionFromImpedance(new Complex(r, x));

        Assert.Equal(gammaReal, gamma.Real, 1e-12);
        if (r == 0 && x == 50)
        {
            // A pure reactance reflects everything: |Γ| = 1, here Γ = j.
            Assert.Equal(1, gamma.Imaginary, 1e-12);
        }
        else
        {
            Assert.Equal(0, gamma.Imaginary, 1e-12);
        }
    }

    [Fact]
    public void ReflectionFromImpedance_OtherReference_IsZeroWhenMatched()
    {
        var gamma = Mismatch.ReflectionFromImpedance(new Complex(75, 0), Resistance.FromOhms(75));

        Assert.Equal(Complex.Zero, gamma);
    }

    [Fact]
    public void ImpedanceFromReflection_TouchstoneVectorFromPolar_MatchesReferences()
    {
        // REFERENCES: Touchstone test vector "# MHz S MA R 50" / "2.000 0.894 -12.136"
        // → Zin = 196.08 − j367.12 Ω [calc], here from the magnitude and angle as written.
        var s11 = Complex.FromPolarCoordinates(0.894, -12.136 * Math.PI / 180);

        var zin = Mismatch.ImpedanceFromReflection(s11);

        Assert.Equal(196.08, zin.Real, 0.005);
        Assert.Equal(-367.12, zin.Imaginary, 0.005);
    }

    [Fact]
    public void ImpedanceFromReflection_TouchstoneVectorRectangular_MatchesReferences()
    {
        // REFERENCES: Touchstone test vector, S11 = 0.87402 − j0.18795 → Zin = 196.08 − j367.12 Ω [calc].
        // 1 − Γ is small here, so rounding S11 to 5 decimals moves Zin by up to about 0.01 Ω.
        var zin = Mismatch.ImpedanceFromReflection(new Complex(0.87402, -0.18795));

        Assert.Equal(196.08, zin.Real, 0.01);
        Assert.Equal(-367.12, zin.Imaginary, 0.01);
    }

    [Fact]
    public void ImpedanceFromReflection_InvertsReflectionFromImpedance()
    {
        var load = new Complex(196.08, -367.12);

        var back = Mismatch.ImpedanceFromReflection(Mismatch.ReflectionFromImpedance(load));

        Assert.Equal(load.Real, back.Real, 1e-9);
        Assert.Equal(load.Imaginary, back.Imaginary, 1e-9);
    }

    [Fact]
    public void ImpedanceAndReflection_Singular_Throw()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Mismatch.ImpedanceFromReflection(Complex.One));
        Assert.Throws<ArgumentOutOfRangeException>(() => Mismatch.ReflectionFromImpedance(new Complex(-50, 0)));
        Assert.Throws<ArgumentOutOfRangeException>(() => Mismatch.ReflectionFromImpedance(new Complex(double.NaN, 0)));
        Assert.Throws<ArgumentOutOfRangeException>(() => Mismatch.ReflectionFromImpedance(new Complex(50, 0), Resistance.Zero));
    }
}
