namespace BenchRunner.Core.Tests.Support;

/// <summary>Finds files of the repository from the test's output folder.</summary>
internal static class RepositoryFiles
{
    /// <summary>The absolute path of <paramref name="relative"/> under the repository root (the folder holding BenchRunner.sln).</summary>
    public static string PathOf(string relative)
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "BenchRunner.sln")))
        {
            dir = dir.Parent;
        }

        if (dir is null)
        {
            throw new InvalidOperationException("The repository root (with BenchRunner.sln) was not found above " + AppContext.BaseDirectory);
        }

        return Path.Combine(dir.FullName, relative);
    }
}
