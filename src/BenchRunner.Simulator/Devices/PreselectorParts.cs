using BenchRunner.Core.Quantities;

namespace BenchRunner.Simulator.Devices;

/// <summary>
/// Every component value of one 137 MHz preselector board except the trimmer settings: three
/// shunt resonators (coil, fixed capacitor, trimmer), two top-coupling capacitors between them and
/// two end-coupling capacitors to the 50 Ω ports, with the capacitors' parasitics. Values in SI
/// units. <see cref="Preselector137.NominalParts"/> holds the design values; a
/// <see cref="BoardLot"/> draws each board's own.
/// </summary>
public sealed record PreselectorParts
{
    /// <summary>The resonator at port 1.</summary>
    public required ResonatorParts Input { get; init; }

    /// <summary>The middle resonator.</summary>
    public required ResonatorParts Middle { get; init; }

    /// <summary>The resonator at port 2.</summary>
    public required ResonatorParts Output { get; init; }

    /// <summary>The series capacitor from port 1 to the input resonator, in farads.</summary>
    public required double InputCouplingFarads { get; init; }

    /// <summary>The top capacitor between the input and middle resonators, in farads.</summary>
    public required double InputTopFarads { get; init; }

    /// <summary>The top capacitor between the middle and output resonators, in farads.</summary>
    public required double OutputTopFarads { get; init; }

    /// <summary>The series capacitor from the output resonator to port 2, in farads.</summary>
    public required double OutputCouplingFarads { get; init; }

    /// <summary>The frequency at which the coils' Q is given.</summary>
    public required Frequency CoilQFrequency { get; init; }

    /// <summary>Each trimmer's equivalent series resistance, in ohms.</summary>
    public required double TrimmerEsrOhms { get; init; }

    /// <summary>Each trimmer's equivalent series inductance (rotor, leads), in henries.</summary>
    public required double TrimmerEslHenries { get; init; }

    /// <summary>The fixed chip capacitors' equivalent series resistance, in ohms.</summary>
    public required double ChipEsrOhms { get; init; }

    /// <summary>The chip capacitors' equivalent series inductance (body and pads), in henries.</summary>
    public required double ChipEslHenries { get; init; }

    /// <summary>The resonator at position 0 (input), 1 (middle) or 2 (output).</summary>
    /// <exception cref="ArgumentOutOfRangeException">Another position.</exception>
    public ResonatorParts Resonator(int position) => position switch
    {
        0 => Input,
        1 => Middle,
        2 => Output,
        _ => throw new ArgumentOutOfRangeException(nameof(position), position, "A preselector has resonators 0, 1 and 2."),
    };
}
