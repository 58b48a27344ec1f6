using BenchRunner.Core.Diagnostics;
using BenchRunner.Instruments.Kinds;

namespace BenchRunner.Execution.Plans;

/// <summary>An instrument a plan needs: its role name and kind.</summary>
/// <param name="Role">The role name, e.g. <c>vna</c>; the bench must have an instrument of this name.</param>
/// <param name="Kind">What the instrument must be.</param>
/// <param name="Location">Where the role is declared in the plan.</param>
public sealed record RoleRequirement(string Role, InstrumentKind Kind, SourceLocation Location);
