namespace BenchRunner.Execution.Plans;

/// <summary>A figure a plan may check: its key (as Core's FigureSummary names it), unit and the traces it applies to.</summary>
/// <param name="Key">The key, e.g. <c>center_hz</c>.</param>
/// <param name="Unit">"Hz", "dB", "dBm" or "" (a plain number).</param>
/// <param name="OfSpectrum">True for figures of a spectrum analyser's power trace, false for an S-parameter trace's.</param>
/// <param name="S21Only">True for figures computed only for S21 (unloaded Q).</param>
public sealed record FigureDefinition(string Key, string Unit, bool OfSpectrum, bool S21Only = false);
