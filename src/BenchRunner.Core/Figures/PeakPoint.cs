using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Figures;

/// <summary>The top of a trace's response or of one spectral line.</summary>
/// <param name="Frequency">Where the top lies, refined between samples when possible.</param>
/// <param name="LevelDb">The level at the top, in the trace's unit (dB or dBm), refined likewise.</param>
/// <param name="Index">The index of the highest sample (the middle one of a flat top).</param>
public readonly record struct PeakPoint(Frequency Frequency, double LevelDb, int Index);
