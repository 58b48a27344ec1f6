using System.Numerics;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Simulator.Circuits;

/// <summary>
/// A section of uniform transmission line with a real characteristic impedance Z0 and
/// propagation γ = α + jβ over its length ℓ: [[cosh γℓ, Z0·sinh γℓ], [sinh γℓ / Z0, cosh γℓ]]
/// (Pozar, <i>Microwave Engineering</i>, Table 4.1 and §2.7). β = 2πf/(v·c) with velocity factor v;
/// the loss α is given in dB per metre at one frequency and grows as √f (conductor loss).
/// </summary>
public sealed class TransmissionLine : NetworkElement
{
    /// <summary>The speed of light in vacuum, 299 792 458 m/s (exact, SI).</summary>
    public const double SpeedOfLightMetresPerSecond = 299_792_458;

    private static readonly double NepersPerDecibel = Math.Log(10) / 20;

    private readonly double _betaPerHertz;
    private readonly double _alphaPerRootHertz;

    private TransmissionLine(double characteristicOhms, double metres, double velocityFactor, double lossDbPerMetre, double lossReferenceHertz)
    {
        CharacteristicOhms = characteristicOhms;
        LengthMetres = metres;
        VelocityFactor = velocityFactor;
        LossDbPerMetre = lossDbPerMetre;
        _betaPerHertz = 2 * Math.PI / (velocityFactor * SpeedOfLightMetresPerSecond);
        _alphaPerRootHertz = lossDbPerMetre == 0 ? 0 : lossDbPerMetre * NepersPerDecibel / Math.Sqrt(lossReferenceHertz);
    }

    /// <summary>Z0 in ohms.</summary>
    public double CharacteristicOhms { get; }

    /// <summary>The physical length in metres.</summary>
    public double LengthMetres { get; }

    /// <summary>The velocity factor: the speed along the line as a fraction of c.</summary>
    public double VelocityFactor { get; }

    /// <summary>The loss in dB per metre at the frequency it was given for.</summary>
    public double LossDbPerMetre { get; }

    /// <summary>A line of a given physical length.</summary>
    /// <param name="characteristicOhms">Z0 in ohms, above zero.</param>
    /// <param name="metres">The length in metres, not negative.</param>
    /// <param name="velocityFactor">v, in (0, 1]; 1 (air) by default.</param>
    /// <param name="lossDbPerMetre">The loss in dB/m at <paramref name="lossAt"/>, not negative; 0 by default.</param>
    /// <param name="lossAt">The frequency at which the loss is given; required when the loss is above zero.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value out of its range.</exception>
    /// <exception cref="ArgumentException">A loss without the frequency it applies to.</exception>
    public static TransmissionLine FromPhysicalLength(
        double characteristicOhms, double metres, double velocityFactor = 1, double lossDbPerMetre = 0, Frequency? lossAt = null)
    {
        Require.Positive(characteristicOhms, nameof(characteristicOhms));
        Require.NotNegative(metres, nameof(metres));
        if (!(velocityFactor > 0 && velocityFactor <= 1))
        {
            throw new ArgumentOutOfRangeException(nameof(velocityFactor), velocityFactor, "A velocity factor lies in (0, 1].");
        }

        Require.NotNegative(lossDbPerMetre, nameof(lossDbPerMetre));
        double referenceHertz = 0;
        if (lossDbPerMetre > 0)
        {
            referenceHertz = lossAt is { } f
                ? Require.Positive(f.Hertz, nameof(lossAt))
                : throw new ArgumentException("A loss in dB per metre needs the frequency it is given at.", nameof(lossAt));
        }

        return new TransmissionLine(characteristicOhms, metres, velocityFactor, lossDbPerMetre, referenceHertz);
    }

    /// <summary>
    /// A line of a given electrical length at one frequency: ℓ = (θ/360°)·v·c/f.
    /// </summary>
    /// <param name="characteristicOhms">Z0 in ohms, above zero.</param>
    /// <param name="degrees">The electrical length θ in degrees at <paramref name="at"/>, not negative.</param>
    /// <param name="at">The frequency at which θ is given, above 0 Hz.</param>
    /// <param name="velocityFactor">v, in (0, 1]; 1 by default (it matters only for the loss per metre).</param>
    /// <param name="lossDbPerMetre">The loss in dB/m at <paramref name="lossAt"/>, not negative; 0 by default.</param>
    /// <param name="lossAt">The frequency at which the loss is given; required when the loss is above zero.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value out of its range.</exception>
    /// <exception cref="ArgumentException">A loss without the frequency it applies to.</exception>
    public static TransmissionLine FromElectricalLength(
        double characteristicOhms, double degrees, Frequency at, double velocityFactor = 1, double lossDbPerMetre = 0, Frequency? lossAt = null)
    {
        Require.NotNegative(degrees, nameof(degrees));
        double hz = Require.Positive(at.Hertz, nameof(at));
        if (!(velocityFactor > 0 && velocityFactor <= 1))
        {
            throw new ArgumentOutOfRangeException(nameof(velocityFactor), velocityFactor, "A velocity factor lies in (0, 1].");
        }

        double metres = degrees / 360 * velocityFactor * SpeedOfLightMetresPerSecond / hz;
        return FromPhysicalLength(characteristicOhms, metres, velocityFactor, lossDbPerMetre, lossAt);
    }

    /// <summary>The electrical length βℓ at <paramref name="hertz"/>, in degrees.</summary>
    public double ElectricalLengthDegrees(double hertz) => _betaPerHertz * hertz * LengthMetres * 180 / Math.PI;

    /// <inheritdoc/>
    public override Abcd AbcdAt(double hertz)
    {
        var gammaL = new Complex(_alphaPerRootHertz * Math.Sqrt(hertz) * LengthMetres, _betaPerHertz * hertz * LengthMetres);
        var cosh = Complex.Cosh(gammaL);
        var sinh = Complex.Sinh(gammaL);
        return new Abcd(cosh, CharacteristicOhms * sinh, sinh / CharacteristicOhms, cosh);
    }
}
