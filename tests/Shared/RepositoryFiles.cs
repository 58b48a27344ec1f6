namespace BenchRunner.Tests.Shared;

/// <summary>Finds files of the checkout (examples, docs) from a test's output folder.</summary>
internal static class RepositoryFiles
{
    private static readonly Lazy<string> RootPath = new(FindRoot);

    /// <summary>The repository root: the folder holding BenchRunner.sln.</summary>
    public static string Root => RootPath.Value;

    /// <summary>The absolute path of <paramref name="relativePath"/> under the repository root.</summary>
    public static string PathOf(string relativePath) => Path.Combine(Root, relativePath);

    /// <summary>A file in docs/examples.</summary>
    public static string Example(string name) => Path.Combine(Root, "docs", "examples", name);

    private static string FindRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "BenchRunner.sln")))
            {
                return dir.FullName;
            }
        }

        throw new InvalidOperationException("The repository root (holding BenchRunner.sln) was not found above " + AppContext.BaseDirectory);
    }
}
