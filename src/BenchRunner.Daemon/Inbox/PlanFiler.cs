using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Daemon.Inbox;

/// <summary>
/// Moves a plan out of the inbox when it is finished with: to the done folder with a result
/// summary beside it (<c>name.yaml.result.txt</c>), or to the rejected folder with its problems
/// beside it (<c>name.yaml.errors.txt</c>, one <c>file:line:column: what was expected</c> per line).
/// A name already used there gets a number (<c>name-2.yaml</c>).
/// </summary>
internal static class PlanFiler
{
    /// <summary>The suffix of a result summary.</summary>
    public const string ResultSuffix = ".result.txt";

    /// <summary>The suffix of an error file.</summary>
    public const string ErrorsSuffix = ".errors.txt";

    /// <summary>Moves <paramref name="planPath"/> to <paramref name="doneFolder"/> and writes <paramref name="summary"/> beside it.</summary>
    /// <returns>The plan's new path.</returns>
    public static string FileAsDone(string planPath, string doneFolder, string summary)
    {
        var target = FreeName(doneFolder, Path.GetFileName(planPath));
        // Moved first: if the plan has vanished meanwhile, no summary is left without its plan.
        File.Move(planPath, target);
        WriteBeside(target + ResultSuffix, summary);
        return target;
    }

    /// <summary>
    /// Moves <paramref name="planPath"/> to <paramref name="rejectedFolder"/> and writes its problems beside it,
    /// naming the plan at its new place.
    /// </summary>
    /// <returns>The plan's new path.</returns>
    public static string FileAsRejected(string planPath, string rejectedFolder, IReadOnlyList<InputProblem> problems)
    {
        var target = FreeName(rejectedFolder, Path.GetFileName(planPath));
        var lines = problems.Select(p => p.Location.File == planPath ? p with { Location = p.Location with { File = target } } : p);
        File.Move(planPath, target);
        WriteBeside(target + ErrorsSuffix, string.Join('\n', lines) + "\n");
        return target;
    }

    private static string FreeName(string folder, string fileName)
    {
        var stem = Path.GetFileNameWithoutExtension(fileName);
        var extension = Path.GetExtension(fileName);
        var candidate = Path.Combine(folder, fileName);
        for (int n = 2; File.Exists(candidate) || File.Exists(candidate + ResultSuffix) || File.Exists(candidate + ErrorsSuffix); n++)
        {
            candidate = Path.Combine(folder, $"{stem}-{n}{extension}");
        }

        return candidate;
    }

    private static void WriteBeside(string path, string text)
    {
        // Written under a temporary name first, so a reader never sees half a summary.
        var temporary = path + ".tmp";
        File.WriteAllText(temporary, text);
        File.Move(temporary, path, overwrite: true);
    }
}
