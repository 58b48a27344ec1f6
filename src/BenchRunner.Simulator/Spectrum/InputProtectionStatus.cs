using BenchRunner.Core.Quantities;

namespace BenchRunner.Simulator.Spectrum;

/// <summary>
/// The total power arriving at the analyser's input compared with its declared maximum and its
/// damage level. A protocol layer reports these flags; the runner refuses settings that would set them.
/// </summary>
/// <param name="TotalInput">The sum of all emissions at the input (all frequencies); null when nothing arrives.</param>
/// <param name="MaxInput">The declared maximum input level.</param>
/// <param name="DamageLevel">The level above which a real input would be damaged.</param>
public sealed record InputProtectionStatus(Level? TotalInput, Level MaxInput, Level DamageLevel)
{
    /// <summary>True when the total input power is above the declared maximum.</summary>
    public bool AboveMaximum => TotalInput is { } total && total > MaxInput;

    /// <summary>True when the total input power is above the damage level.</summary>
    public bool AboveDamageLevel => TotalInput is { } total && total > DamageLevel;
}
