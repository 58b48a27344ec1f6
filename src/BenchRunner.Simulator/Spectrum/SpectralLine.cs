using BenchRunner.Core.Quantities;

namespace BenchRunner.Simulator.Spectrum;

/// <summary>One discrete spectral component: the power an emission puts at one frequency.</summary>
/// <param name="Frequency">Where the line lies.</param>
/// <param name="Level">The line's power.</param>
public readonly record struct SpectralLine(Frequency Frequency, Level Level);
