namespace BenchRunner.Simulator.Circuits;

/// <summary>
/// Any <see cref="ITwoPort"/> (an amplifier, a measured block) as a link of a network chain, by
/// converting its S-parameters to an ABCD matrix (Pozar, Table 4.2).
/// </summary>
public sealed class TwoPortElement : NetworkElement
{
    /// <summary>Wraps <paramref name="device"/>.</summary>
    /// <param name="device">The two-port; its S21 must not be zero.</param>
    /// <param name="referenceOhms">The Z0 at which its S-parameters are taken; 50 Ω by default.</param>
    /// <exception cref="ArgumentOutOfRangeException">Z0 is not finite and positive.</exception>
    public TwoPortElement(ITwoPort device, double referenceOhms = 50)
    {
        Device = device ?? throw new ArgumentNullException(nameof(device));
        ReferenceOhms = Require.Positive(referenceOhms, nameof(referenceOhms));
    }

    /// <summary>The wrapped two-port.</summary>
    public ITwoPort Device { get; }

    /// <summary>Z0 of the conversion, in ohms.</summary>
    public double ReferenceOhms { get; }

    /// <inheritdoc/>
    public override Abcd AbcdAt(double hertz) => Abcd.FromSParameters(Device.Evaluate(hertz, ReferenceOhms), ReferenceOhms);
}
