using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Execution.Plans;

/// <summary>
/// Reads plan files (docs/plan-format.md). Reading is strict and checks the plan in itself:
/// every problem is reported at once, in one <see cref="InputFormatException"/>.
/// </summary>
public static class PlanFile
{
    /// <summary>Reads the plan file at <paramref name="path"/>; mask file paths are taken from its folder.</summary>
    /// <exception cref="InputFormatException">The file is missing, unreadable or not a valid plan.</exception>
    /// <param name="path">The file.</param>
    /// <param name="vocabulary">The kinds of instrument and step the plan may use; <see cref="PlanVocabulary.BuiltIn"/> when null.</param>
    public static TestPlan Load(string path, PlanVocabulary? vocabulary = null)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        var folder = Path.GetDirectoryName(Path.GetFullPath(path)) ?? ".";
        return Parse(InputFile.ReadAllText(path), path, folder, vocabulary);
    }

    /// <summary>Parses plan text.</summary>
    /// <param name="text">The file's content.</param>
    /// <param name="sourceName">The name used in messages, usually the file's path.</param>
    /// <param name="folder">The folder relative mask file paths are taken from.</param>
    /// <param name="vocabulary">The kinds of instrument and step the plan may use; <see cref="PlanVocabulary.BuiltIn"/> when null.</param>
    /// <exception cref="InputFormatException">The text is not a valid plan.</exception>
    public static TestPlan Parse(string text, string sourceName, string folder, PlanVocabulary? vocabulary = null)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(sourceName);
        ArgumentNullException.ThrowIfNull(folder);
        return PlanFileReader.Read(text, sourceName, folder, vocabulary ?? PlanVocabulary.BuiltIn);
    }
}
