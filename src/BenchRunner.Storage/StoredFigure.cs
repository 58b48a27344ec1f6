using BenchRunner.Core.Figures;

namespace BenchRunner.Storage;

/// <summary>A figure of a stored sweep.</summary>
/// <param name="SweepId">The sweep it was computed from.</param>
/// <param name="Sequence">That sweep's place in the run.</param>
/// <param name="StepName">That sweep's plan step.</param>
/// <param name="Figure">The figure: key, label, value or the reason it has none, unit.</param>
public sealed record StoredFigure(long SweepId, int Sequence, string StepName, NamedFigure Figure);
