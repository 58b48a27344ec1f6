namespace BenchRunner.Tests.Shared;

/// <summary>A fresh folder under the system's temporary folder, deleted on dispose.</summary>
internal sealed class TempDirectory : IDisposable
{
    /// <summary>Creates the folder.</summary>
    public TempDirectory()
    {
        Path = System.IO.Path.Combine(System.IO.Path.GetTempPath(), "benchrunner-tests-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(Path);
    }

    /// <summary>The folder.</summary>
    public string Path { get; }

    /// <summary>Writes <paramref name="text"/> to a file named <paramref name="name"/> in the folder and returns its path.</summary>
    public string Write(string name, string text)
    {
        var path = System.IO.Path.Combine(Path, name);
        File.WriteAllText(path, text);
        return path;
    }

    /// <summary>The path of <paramref name="name"/> in the folder (the file need not exist).</summary>
    public string PathOf(string name) => System.IO.Path.Combine(Path, name);

    /// <inheritdoc/>
    public void Dispose()
    {
        try
        {
            Directory.Delete(Path, recursive: true);
        }
        catch (IOException)
        {
            // Leftovers in the temporary folder are harmless.
        }
    }
}
