namespace BenchRunner.Cli.Tests.Support;

/// <summary>Finds files of the checkout (the bundled examples) from the test's output folder.</summary>
public static class RepoPaths
{
    private static readonly Lazy<string> RootPath = new(FindRoot);

    /// <summary>The repository root: the folder holding BenchRunner.sln.</summary>
    public static string Root => RootPath.Value;

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

        throw new InvalidOperationException("BenchRunner.sln not found above the test output folder.");
    }
}
