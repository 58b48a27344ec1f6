using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Traces;

namespace BenchRunner.Execution.Plans;

/// <summary>A trace a sweep acquires, and the name later steps use for it.</summary>
/// <param name="Quantity">What is measured: an S-parameter, or power on a spectrum analyser.</param>
/// <param name="Name">The trace's name in the plan.</param>
/// <param name="Location">Where the name is given.</param>
public sealed record NamedTrace(TraceQuantity Quantity, string Name, SourceLocation Location);
