using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Execution.Plans;

/// <summary>The condition that ends a <c>repeat</c>: every figure limit on a named trace holds.</summary>
/// <param name="Trace">The name of the trace.</param>
/// <param name="Limits">The limits that must all hold.</param>
/// <param name="Location">Where the condition is written.</param>
public sealed record FigureCondition(string Trace, IReadOnlyList<FigureLimit> Limits, SourceLocation Location);
