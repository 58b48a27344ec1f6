namespace BenchRunner.Execution.Plans;

/// <summary>A test plan as read from its plan file, checked in itself (not yet against a bench).</summary>
/// <param name="Name">The plan's name.</param>
/// <param name="Description">What the plan tests, or null.</param>
/// <param name="Roles">The instruments it needs.</param>
/// <param name="Steps">The steps, in order.</param>
/// <param name="Source">The plan file's name as used in messages.</param>
public sealed record TestPlan(string Name, string? Description, IReadOnlyList<RoleRequirement> Roles,
    IReadOnlyList<PlanStep> Steps, string Source)
{
    /// <summary>Every step, those inside repeat blocks included, in file order.</summary>
    public IEnumerable<PlanStep> AllSteps() => Flatten(Steps);

    private static IEnumerable<PlanStep> Flatten(IEnumerable<PlanStep> steps)
    {
        foreach (var step in steps)
        {
            yield return step;
            if (step is RepeatStep repeat)
            {
                foreach (var inner in Flatten(repeat.Steps))
                {
                    yield return inner;
                }
            }
        }
    }
}
