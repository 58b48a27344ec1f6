namespace BenchRunner.Core.TraceFiles;

/// <summary>
/// Conversions of network parameters to S-parameters for real, positive reference resistances
/// R_i per port, using pseudo-waves a = (V + R·I)/(2√R), b = (V − R·I)/(2√R).
/// With G = diag(√R_i) and R = diag(R_i):
/// <list type="bullet">
/// <item>from Z: S = G⁻¹ (Z − R)(Z + R)⁻¹ G;</item>
/// <item>from Y: S = G⁻¹ (U − R·Y)(U + R·Y)⁻¹ G;</item>
/// <item>new references R′: with ρ_i = (R′_i − R_i)/(R′_i + R_i) and
/// C = diag((R_i + R′_i)/(2√(R_i R′_i))), S′ = C (S − ρ)(U − ρS)⁻¹ C⁻¹.</item>
/// </list>
/// For one common reference Z0 the first two reduce to S = (z − U)(z + U)⁻¹ with z = Z/Z0 and
/// S = (U − y)(U + y)⁻¹ with y = Y·Z0, whose 2-port elements are the entries of Pozar,
/// <i>Microwave Engineering</i>, Table 4.2 (Z→S and Y→S). The renormalisation follows from the
/// wave definitions; for one port it is Γ′ = (Γ − ρ)/(1 − ρΓ).
/// Each returns null when the matrix to invert is singular.
/// </summary>
internal static class NetworkConversions
{
    /// <summary>S-parameters from an impedance matrix in ohms.</summary>
    public static ComplexMatrix? ImpedanceToScattering(ComplexMatrix z, IReadOnlyList<double> referenceOhms)
    {
        var r = ComplexMatrix.Diagonal(referenceOhms);
        var inverse = (z + r).Inverse();
        return inverse is null ? null : Sandwich(referenceOhms, (z - r) * inverse);
    }

    /// <summary>S-parameters from an admittance matrix in siemens.</summary>
    public static ComplexMatrix? AdmittanceToScattering(ComplexMatrix y, IReadOnlyList<double> referenceOhms)
    {
        var u = ComplexMatrix.Identity(y.Size);
        var ry = ComplexMatrix.Diagonal(referenceOhms) * y;
        var inverse = (u + ry).Inverse();
        return inverse is null ? null : Sandwich(referenceOhms, (u - ry) * inverse);
    }

    /// <summary>The same network's S-parameters referred to other reference resistances.</summary>
    public static ComplexMatrix? Renormalize(ComplexMatrix s, IReadOnlyList<double> fromOhms, IReadOnlyList<double> toOhms)
    {
        int n = s.Size;
        var rho = new double[n];
        var c = new double[n];
        var cInverse = new double[n];
        for (int i = 0; i < n; i++)
        {
            rho[i] = (toOhms[i] - fromOhms[i]) / (toOhms[i] + fromOhms[i]);
            c[i] = (fromOhms[i] + toOhms[i]) / (2 * Math.Sqrt(fromOhms[i] * toOhms[i]));
            cInverse[i] = 1 / c[i];
        }

        var rhoMatrix = ComplexMatrix.Diagonal(rho);
        var inverse = (ComplexMatrix.Identity(n) - rhoMatrix * s).Inverse();
        return inverse is null
            ? null
            : ComplexMatrix.Diagonal(c) * (s - rhoMatrix) * inverse * ComplexMatrix.Diagonal(cInverse);
    }

    private static ComplexMatrix Sandwich(IReadOnlyList<double> referenceOhms, ComplexMatrix m)
    {
        var g = referenceOhms.Select(Math.Sqrt).ToArray();
        var gInverse = g.Select(x => 1 / x).ToArray();
        return ComplexMatrix.Diagonal(gInverse) * m * ComplexMatrix.Diagonal(g);
    }
}
