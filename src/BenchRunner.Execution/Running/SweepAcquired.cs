using BenchRunner.Core.Figures;
using BenchRunner.Core.Traces;

namespace BenchRunner.Execution.Running;

/// <summary>A trace was acquired, its figures computed and (with a store) committed.</summary>
/// <param name="At">When.</param>
/// <param name="Role">The instrument's role.</param>
/// <param name="TraceName">The name the plan gave the trace.</param>
/// <param name="Trace">The trace.</param>
/// <param name="Figures">Its figures.</param>
public sealed record SweepAcquired(DateTimeOffset At, string Role, string TraceName, Trace Trace, IReadOnlyList<NamedFigure> Figures) : RunEvent(At);
