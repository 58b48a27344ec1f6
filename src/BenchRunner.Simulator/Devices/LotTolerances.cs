namespace BenchRunner.Simulator.Devices;

/// <summary>
/// How the parts of a <see cref="BoardLot"/>'s boards spread around their nominal values, and how
/// closely the assembler aligns the trimmers. A part with tolerance ±t is drawn from a normal
/// distribution with σ = t/3, cut at ±t (a ±t part is taken to be a ±3σ part: common practice,
/// no source). Defaults in each property's description.
/// </summary>
public sealed record LotTolerances
{
    /// <summary>The tolerance of every fixed capacitor (22 pF, 0.47 pF, 3.9 pF), as a fraction; ±5 % by default.</summary>
    public double CapacitorFraction { get; init; } = 0.05;

    /// <summary>The tolerance of every coil's inductance, as a fraction; ±5 % by default.</summary>
    public double CoilFraction { get; init; } = 0.05;

    /// <summary>The standard deviation of a coil's Q, as a fraction of its nominal Q; 12 % by default.</summary>
    public double CoilQSigmaFraction { get; init; } = 0.12;

    /// <summary>The tolerance of a coil's self-capacitance, as a fraction; ±20 % by default.</summary>
    public double CoilSelfCapacitanceFraction { get; init; } = 0.20;

    /// <summary>
    /// The standard deviation of the assembler's trimmer setting around the board's ideal alignment,
    /// in pF; 0.05 pF by default (a fraction of a degree of rotor).
    /// </summary>
    public double TrimmerSettingSigmaPicofarads { get; init; } = 0.05;

    /// <summary>The tolerances of <see cref="BoardLot.Generate"/> when none are given.</summary>
    public static LotTolerances Default { get; } = new();
}
