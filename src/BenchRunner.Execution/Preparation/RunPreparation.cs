using BenchRunner.Core.Diagnostics;
using BenchRunner.Execution.Bench;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Validation;

namespace BenchRunner.Execution.Preparation;

/// <summary>
/// The one way to prepare a run, for every verb and the daemon: read plan and bench once, keep the
/// exact texts, validate each and the two together, and report every problem at once.
/// </summary>
public static class RunPreparation
{
    /// <summary>Reads and checks a bench file.</summary>
    /// <exception cref="InputFormatException">A problem in the file (every one, located).</exception>
    /// <param name="benchPath">The bench file.</param>
    /// <param name="vocabulary">The kinds of instrument it may name; <see cref="PlanVocabulary.BuiltIn"/>'s when null.</param>
    public static PreparedBench LoadBench(string benchPath, PlanVocabulary? vocabulary = null)
    {
        ArgumentException.ThrowIfNullOrEmpty(benchPath);
        var text = InputFile.ReadAllText(benchPath);
        return new PreparedBench(BenchFile.Parse(text, benchPath, FolderOf(benchPath), (vocabulary ?? PlanVocabulary.BuiltIn).Kinds), text);
    }

    /// <summary>
    /// Reads the plan (and the bench, when <paramref name="benchPath"/> is given) and checks them
    /// together; problems of both files are reported at once.
    /// </summary>
    /// <exception cref="InputFormatException">Any problem in either file or between them.</exception>
    /// <param name="planPath">The plan file.</param>
    /// <param name="benchPath">The bench file, or null to check the plan on its own.</param>
    /// <param name="vocabulary">The kinds of instrument and step both may use; <see cref="PlanVocabulary.BuiltIn"/> when null.</param>
    public static PreparedRun Load(string planPath, string? benchPath, PlanVocabulary? vocabulary = null)
    {
        ArgumentException.ThrowIfNullOrEmpty(planPath);
        var problems = new List<InputProblem>();
        var planText = Collect(() => InputFile.ReadAllText(planPath), problems);
        var plan = planText is null ? null : Collect(() => PlanFile.Parse(planText, planPath, FolderOf(planPath), vocabulary), problems);
        var bench = benchPath is null ? null : Collect(() => LoadBench(benchPath, vocabulary), problems);
        if (plan is not null && bench is not null)
        {
            problems.AddRange(PlanValidator.CheckAgainstBench(plan, bench.Definition));
        }

        if (problems.Count > 0)
        {
            throw new InputFormatException(problems);
        }

        return new PreparedRun(plan!, planText!, bench);
    }

    /// <summary>A plan given as text (an inbox file already read, a schedule's plan), checked against a bench read earlier.</summary>
    /// <param name="planText">The plan's text.</param>
    /// <param name="sourceName">Where it came from, for messages.</param>
    /// <param name="folder">Where the plan's relative paths (masks) are found.</param>
    /// <param name="bench">The bench.</param>
    /// <exception cref="InputFormatException">Any problem in the plan or between it and the bench.</exception>
    /// <param name="vocabulary">The kinds of instrument and step the plan may use; <see cref="PlanVocabulary.BuiltIn"/> when null.</param>
    public static PreparedRun FromText(string planText, string sourceName, string folder, PreparedBench bench, PlanVocabulary? vocabulary = null)
    {
        ArgumentNullException.ThrowIfNull(bench);
        var plan = PlanFile.Parse(planText, sourceName, folder, vocabulary);
        return Checked(plan, planText, bench);
    }

    /// <summary>
    /// A plan built in code (e.g. by <c>overload</c>), checked against <paramref name="bench"/>; the text
    /// kept with it is <see cref="PlanWriter"/>'s rendering, which reads back to the same plan.
    /// </summary>
    /// <exception cref="InputFormatException">A problem between the plan and the bench.</exception>
    public static PreparedRun FromPlan(TestPlan plan, PreparedBench bench, string? comment = null)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(bench);
        return Checked(plan, PlanWriter.Write(plan, comment), bench);
    }

    private static PreparedRun Checked(TestPlan plan, string text, PreparedBench bench)
    {
        if (PlanValidator.CheckAgainstBench(plan, bench.Definition) is { Count: > 0 } problems)
        {
            throw new InputFormatException(problems);
        }

        return new PreparedRun(plan, text, bench);
    }

    private static string FolderOf(string path) => Path.GetDirectoryName(Path.GetFullPath(path)) ?? ".";

    private static T? Collect<T>(Func<T> read, List<InputProblem> problems) where T : class
    {
        try
        {
            return read();
        }
        catch (InputFormatException e)
        {
            problems.AddRange(e.Problems);
            return null;
        }
    }
}
