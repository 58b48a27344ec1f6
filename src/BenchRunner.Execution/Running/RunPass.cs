using BenchRunner.Core.Figures;
using BenchRunner.Core.Runs;
using BenchRunner.Core.Traces;

namespace BenchRunner.Execution.Running;

/// <summary>One pass of a repeated run (<see cref="PlanRunner.RunRepeatedlyAsync"/>): what it acquired and judged.</summary>
/// <param name="Number">The pass number, from 1.</param>
/// <param name="Traces">The traces acquired in this pass with their figures, by trace name.</param>
/// <param name="Checks">The checks judged in this pass, in order.</param>
public sealed record RunPass(int Number, IReadOnlyDictionary<string, (Trace Trace, IReadOnlyList<NamedFigure> Figures)> Traces, IReadOnlyList<CheckResult> Checks);
