namespace BenchRunner.Instruments.Tests.Support;

/// <summary>Finds files of the checkout (examples, docs) from the test's output folder.</summary>
internal static class RepositoryFiles
{
    /// <summary>The absolute path of <paramref name="relativePath"/> under the repository root.</summary>
    public static string PathOf(string relativePath)
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "BenchRunner.sln")))
        {
            dir = dir.Parent;
        }

        return dir is null
            ? throw new InvalidOperationException("The repository root (holding BenchRunner.sln) was not found above the test output.")
            : Path.Combine(dir.FullName, relativePath);
    }
}
