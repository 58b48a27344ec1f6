using System.Numerics;

namespace BenchRunner.Simulator.Circuits;

/// <summary>
/// The ABCD (chain, transmission) matrix of a two-port: V1 = A·V2 + B·I2, I1 = C·V2 + D·I2, with
/// I2 flowing out of port 2, so that cascading two-ports multiplies their matrices in order
/// (Pozar, <i>Microwave Engineering</i>, §4.4). A and D are unitless, B is in ohms, C in siemens.
/// </summary>
public readonly struct Abcd : IEquatable<Abcd>
{
    /// <summary>Creates the matrix [[A, B], [C, D]].</summary>
    public Abcd(Complex a, Complex b, Complex c, Complex d)
    {
        A = a;
        B = b;
        C = c;
        D = d;
    }

    /// <summary>Open-circuit voltage ratio V1/V2 (unitless).</summary>
    public Complex A { get; }

    /// <summary>Short-circuit transfer impedance V1/I2, in ohms.</summary>
    public Complex B { get; }

    /// <summary>Open-circuit transfer admittance I1/V2, in siemens.</summary>
    public Complex C { get; }

    /// <summary>Short-circuit current ratio I1/I2 (unitless).</summary>
    public Complex D { get; }

    /// <summary>The through connection: [[1, 0], [0, 1]].</summary>
    public static Abcd Identity => new(Complex.One, Complex.Zero, Complex.Zero, Complex.One);

    /// <summary>AD − BC: 1 for every reciprocal two-port.</summary>
    public Complex Determinant => A * D - B * C;

    /// <summary>A series impedance Z between the ports: [[1, Z], [0, 1]] (Pozar, Table 4.1).</summary>
    /// <param name="ohms">Z in ohms.</param>
    public static Abcd Series(Complex ohms) => new(Complex.One, ohms, Complex.Zero, Complex.One);

    /// <summary>A shunt admittance Y across the line: [[1, 0], [Y, 1]] (Pozar, Table 4.1).</summary>
    /// <param name="siemens">Y in siemens.</param>
    public static Abcd Shunt(Complex siemens) => new(Complex.One, Complex.Zero, siemens, Complex.One);

    /// <summary>
    /// This two-port followed by <paramref name="next"/> (port 2 of this one wired to port 1 of
    /// the next): the matrix product this·next.
    /// </summary>
    public Abcd Cascade(in Abcd next) => new(
        A * next.A + B * next.C,
        A * next.B + B * next.D,
        C * next.A + D * next.C,
        C * next.B + D * next.D);

    /// <summary>
    /// The S-parameters between real reference impedances Z0 at both ports (Pozar, Table 4.2):
    /// Δ = A + B/Z0 + C·Z0 + D, S11 = (A + B/Z0 − C·Z0 − D)/Δ, S12 = 2(AD − BC)/Δ,
    /// S21 = 2/Δ, S22 = (−A + B/Z0 − C·Z0 + D)/Δ.
    /// </summary>
    /// <param name="referenceOhms">Z0 in ohms, finite and above zero.</param>
    /// <exception cref="ArgumentOutOfRangeException">Z0 is not finite and positive.</exception>
    public SParameters ToSParameters(double referenceOhms) => ToSParameters(referenceOhms, Determinant);

    /// <summary>
    /// <see cref="ToSParameters(double)"/> with AD − BC given: a chain's determinant is the product
    /// of its links' determinants, which stays accurate deep in a stop band, where A·D and B·C are
    /// huge and nearly equal and their difference would lose every digit.
    /// </summary>
    internal SParameters ToSParameters(double referenceOhms, Complex determinant)
    {
        Require.Positive(referenceOhms, nameof(referenceOhms));
        var bOverZ0 = B / referenceOhms;
        var cZ0 = C * referenceOhms;
        var delta = A + bOverZ0 + cZ0 + D;
        return new SParameters(
            (A + bOverZ0 - cZ0 - D) / delta,
            2 / delta,
            2 * determinant / delta,
            (-A + bOverZ0 - cZ0 + D) / delta);
    }

    /// <summary>
    /// The ABCD matrix of a two-port given by its S-parameters between real Z0 (Pozar, Table 4.2):
    /// A = ((1 + S11)(1 − S22) + S12·S21)/(2·S21), B = Z0·((1 + S11)(1 + S22) − S12·S21)/(2·S21),
    /// C = ((1 − S11)(1 − S22) − S12·S21)/(2·S21·Z0), D = ((1 − S11)(1 + S22) + S12·S21)/(2·S21).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">Z0 is not finite and positive.</exception>
    /// <exception cref="ArgumentException">S21 is zero: a two-port that passes nothing forward has no chain matrix.</exception>
    public static Abcd FromSParameters(in SParameters s, double referenceOhms)
    {
        Require.Positive(referenceOhms, nameof(referenceOhms));
        if (s.S21 == Complex.Zero)
        {
            throw new ArgumentException("S21 is zero: the two-port has no ABCD matrix.", nameof(s));
        }

        var twoS21 = 2 * s.S21;
        var s12s21 = s.S12 * s.S21;
        return new Abcd(
            ((1 + s.S11) * (1 - s.S22) + s12s21) / twoS21,
            referenceOhms * ((1 + s.S11) * (1 + s.S22) - s12s21) / twoS21,
            ((1 - s.S11) * (1 - s.S22) - s12s21) / (twoS21 * referenceOhms),
            ((1 - s.S11) * (1 + s.S22) + s12s21) / twoS21);
    }

    /// <inheritdoc/>
    public bool Equals(Abcd other) => A.Equals(other.A) && B.Equals(other.B) && C.Equals(other.C) && D.Equals(other.D);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is Abcd other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(A, B, C, D);

    public static bool operator ==(Abcd left, Abcd right) => left.Equals(right);

    public static bool operator !=(Abcd left, Abcd right) => !left.Equals(right);

    /// <summary>Formats as <c>[[A, B], [C, D]]</c>.</summary>
    public override string ToString() => $"[[{A}, {B}], [{C}, {D}]]";
}
