using System.Numerics;
using BenchRunner.Core.Tests.Support;
using BenchRunner.Core.TraceFiles;

namespace BenchRunner.Core.Tests.TraceFiles;

public class NetworkConversionsTests
{
    // A deliberately non-reciprocal, lossy two-port so that every term of the formulas matters.
    private static readonly Complex Z11 = new(30, 10), Z12 = new(5, -2), Z21 = new(80, -20), Z22 = new(40, 25);

    private static ComplexMatrix Matrix(Complex m11, Complex m12, Complex m21, Complex m22) =>
        ComplexMatrix.FromRows(2, [m11, m12, m21, m22]);

    [Fact]
    public void ImpedanceToScattering_EqualReferences_MatchesPozarTable42()
    {
        const double z0 = 50;
        var s = NetworkConversions.ImpedanceToScattering(Matrix(Z11, Z12, Z21, Z22), [z0, z0])!;

        // Pozar, Microwave Engineering, Table 4.2 (Z → S), from memory.
        var dz = (Z11 + z0) * (Z22 + z0) - Z12 * Z21;
        ComplexAssert.Close(((Z11 - z0) * (Z22 + z0) - Z12 * Z21) / dz, s[0, 0], 1e-14);
        ComplexAssert.Close(2 * Z12 * z0 / dz, s[0, 1], 1e-14);
        ComplexAssert.Close(2 * Z21 * z0 / dz, s[1, 0], 1e-14);
        ComplexAssert.Close(((Z11 + z0) * (Z22 - z0) - Z12 * Z21) / dz, s[1, 1], 1e-14);
    }

    [Fact]
    public void AdmittanceToScattering_EqualReferences_MatchesPozarTable42()
    {
        const double z0 = 50, y0 = 1 / z0;
        Complex y11 = new(0.02, 0.01), y12 = new(-0.004, 0.001), y21 = new(0.03, -0.02), y22 = new(0.01, -0.015);
        var s = NetworkConversions.AdmittanceToScattering(Matrix(y11, y12, y21, y22), [z0, z0])!;

        // Pozar, Microwave Engineering, Table 4.2 (Y → S), from memory.
        var dy = (y0 + y11) * (y0 + y22) - y12 * y21;
        ComplexAssert.Close(((y0 - y11) * (y0 + y22) + y12 * y21) / dy, s[0, 0], 1e-14);
        ComplexAssert.Close(-2 * y12 * y0 / dy, s[0, 1], 1e-14);
        ComplexAssert.Close(-2 * y21 * y0 / dy, s[1, 0], 1e-14);
        ComplexAssert.Close(((y0 + y11) * (y0 - y22) + y12 * y21) / dy, s[1, 1], 1e-14);
    }

    [Fact]
    public void ImpedanceAndAdmittance_OfTheSameNetwork_GiveTheSameS()
    {
        var z = Matrix(Z11, Z12, Z21, Z22);

        var fromZ = NetworkConversions.ImpedanceToScattering(z, [50, 75])!;
        var fromY = NetworkConversions.AdmittanceToScattering(z.Inverse()!, [50, 75])!;

        for (int r = 0; r < 2; r++)
        {
            for (int c = 0; c < 2; c++)
            {
                ComplexAssert.Close(fromZ[r, c], fromY[r, c], 1e-13);
            }
        }
    }

    [Fact]
    public void ImpedanceToScattering_UnequalReferencesOfIsolatedLoads_GivesEachPortsReflection()
    {
        Complex za = new(20, 30), zb = new(100, -40);
        var s = NetworkConversions.ImpedanceToScattering(Matrix(za, 0, 0, zb), [50, 75])!;

        // Γ = (Z − R)/(Z + R) per port (Pozar, ch. 2), nothing transmitted between unconnected ports.
        ComplexAssert.Close((za - 50) / (za + 50), s[0, 0], 1e-15);
        ComplexAssert.Close((zb - 75) / (zb + 75), s[1, 1], 1e-15);
        ComplexAssert.Close(Complex.Zero, s[0, 1], 1e-15);
        ComplexAssert.Close(Complex.Zero, s[1, 0], 1e-15);
    }

    [Fact]
    public void Renormalize_Matched50OhmLoadTo75Ohms_GivesMinus0Point2()
    {
        var s = NetworkConversions.Renormalize(ComplexMatrix.FromRows(1, [Complex.Zero]), [50], [75])!;

        // Γ = (50 − 75)/(50 + 75) = −0.2 (Pozar, ch. 2) [calc].
        ComplexAssert.Close(new Complex(-0.2, 0), s[0, 0], 1e-15);
    }

    [Fact]
    public void Renormalize_Shunt50OhmsTo75Ohms_MatchesShuntFormulaAt75Ohms()
    {
        var at50 = Matrix(-1.0 / 3, 2.0 / 3, 2.0 / 3, -1.0 / 3); // REFERENCES (Pozar, Table 4.2) [calc]: shunt 50 Ω at 50 Ω.

        var at75 = NetworkConversions.Renormalize(at50, [50, 50], [75, 75])!;

        // REFERENCES shunt-admittance formula (Pozar, Table 4.2) with Y·Z0 = 75/50: S21 = 2/3.5, S11 = −1.5/3.5 [calc].
        ComplexAssert.Close(new Complex(0.571429, 0), at75[1, 0], 5e-7);
        ComplexAssert.Close(new Complex(-0.428571, 0), at75[0, 0], 5e-7);
    }

    [Fact]
    public void Renormalize_AgreesWithConvertingFromZAtTheNewReferences()
    {
        var z = Matrix(Z11, Z12, Z21, Z22);
        var at50 = NetworkConversions.ImpedanceToScattering(z, [50, 50])!;

        var renormalised = NetworkConversions.Renormalize(at50, [50, 50], [25, 75])!;
        var direct = NetworkConversions.ImpedanceToScattering(z, [25, 75])!;

        for (int r = 0; r < 2; r++)
        {
            for (int c = 0; c < 2; c++)
            {
                ComplexAssert.Close(direct[r, c], renormalised[r, c], 1e-13);
            }
        }
    }

    [Fact]
    public void Inverse_ThreeByThree_TimesMatrixIsIdentity()
    {
        var m = ComplexMatrix.FromRows(3, [new(1, 2), 3, new(0, -1), 4, new(5, 1), 6, new(-2, 0.5), 0, 7]);

        var product = m * m.Inverse()!;

        for (int r = 0; r < 3; r++)
        {
            for (int c = 0; c < 3; c++)
            {
                ComplexAssert.Close(r == c ? Complex.One : Complex.Zero, product[r, c], 1e-14);
            }
        }
    }

    [Fact]
    public void Inverse_SingularMatrix_IsNull()
    {
        Assert.Null(Matrix(1, 2, 2, 4).Inverse());
        Assert.Null(ComplexMatrix.Zero(2).Inverse());
    }
}
