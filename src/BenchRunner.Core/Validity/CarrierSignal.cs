using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Validity;

/// <summary>A carrier known to be present in a spectrum: its frequency and its level (dBm) as displayed.</summary>
/// <param name="Frequency">The carrier's frequency.</param>
/// <param name="Level">The carrier's displayed level.</param>
public readonly record struct CarrierSignal(Frequency Frequency, Level Level);
