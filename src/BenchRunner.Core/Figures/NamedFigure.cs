namespace BenchRunner.Core.Figures;

/// <summary>One figure of a summary, ready to print or store.</summary>
/// <param name="Key">A stable machine name such as <c>bandwidth_3db_hz</c>.</param>
/// <param name="Label">A short human label.</param>
/// <param name="Value">The value in <paramref name="Unit"/>, or null when it could not be computed.</param>
/// <param name="Unit"><c>Hz</c>, <c>dB</c>, <c>dBm</c>, or empty for a pure number such as Q.</param>
/// <param name="Reason">Why <paramref name="Value"/> is null; null when it has a value.</param>
public sealed record NamedFigure(string Key, string Label, double? Value, string Unit, string? Reason);
