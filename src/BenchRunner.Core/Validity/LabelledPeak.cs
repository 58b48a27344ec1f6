using BenchRunner.Core.Figures;

namespace BenchRunner.Core.Validity;

/// <summary>A spectral line with what it was recognised as.</summary>
/// <param name="Peak">The line as <see cref="PowerFigures.Peaks"/> found it.</param>
/// <param name="Origin">What it was recognised as.</param>
/// <param name="Label">A short name: "carrier 1", "H3 of carrier 1", "2f1-f2", "f1+f2", or "unidentified".</param>
/// <param name="CarrierIndex">The index of the carrier it is referred to (for a product, the stronger of the two); null when unidentified.</param>
/// <param name="Order">The harmonic number (1 for a carrier) or the product's order (2 or 3); null when unidentified.</param>
/// <param name="RelativeDbc">Its level minus its carrier's level, in dBc; null when unidentified.</param>
public sealed record LabelledPeak(PeakPoint Peak, PeakOrigin Origin, string Label, int? CarrierIndex, int? Order, double? RelativeDbc);
