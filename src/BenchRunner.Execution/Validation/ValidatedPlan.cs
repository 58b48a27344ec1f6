using BenchRunner.Execution.Bench;
using BenchRunner.Execution.Plans;

namespace BenchRunner.Execution.Validation;

/// <summary>A plan that passed every check, with the bench it was checked against (or null when none was given).</summary>
/// <param name="Plan">The plan.</param>
/// <param name="Bench">The bench, or null.</param>
public sealed record ValidatedPlan(TestPlan Plan, BenchDefinition? Bench);
