using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Figures;

/// <summary>A return loss and where it occurs.</summary>
/// <param name="Frequency">The frequency of the point.</param>
/// <param name="ReturnLossDb">−20·log10|S11| in dB (positive for a passive port).</param>
public readonly record struct ReturnLossPoint(Frequency Frequency, double ReturnLossDb);
