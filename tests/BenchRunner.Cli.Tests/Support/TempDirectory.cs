namespace BenchRunner.Cli.Tests.Support;

/// <summary>A scratch folder deleted when disposed.</summary>
public sealed class TempDirectory : IDisposable
{
    /// <summary>Creates an empty folder under the system's temporary folder.</summary>
    public TempDirectory()
    {
        Path = System.IO.Path.Combine(System.IO.Path.GetTempPath(), "benchrunner-test-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(Path);
    }

    /// <summary>The folder.</summary>
    public string Path { get; }

    /// <summary>Writes <paramref name="text"/> to a file in the folder and returns its path.</summary>
    public string Write(string name, string text)
    {
        var file = System.IO.Path.Combine(Path, name);
        File.WriteAllText(file, text);
        return file;
    }

    /// <inheritdoc/>
    public void Dispose()
    {
        try
        {
            Directory.Delete(Path, recursive: true);
        }
        catch (IOException)
        {
            // Best effort: a leftover scratch folder is harmless.
        }
    }
}
