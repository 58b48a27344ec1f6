namespace BenchRunner.Cli.Demo;

/// <summary>
/// The demo's plan, bench, mask and profiles, embedded in the executable and written to a
/// scratch folder for the run (with their relative layout, so the bench finds its profiles and
/// the plan its mask). Deleted on dispose.
/// </summary>
public sealed class DemoFiles : IDisposable
{
    private const string Prefix = "demo/";

    private DemoFiles(string folder) => Folder = folder;

    /// <summary>The scratch folder.</summary>
    public string Folder { get; }

    /// <summary>The demo plan.</summary>
    public string Plan => Path.Combine(Folder, "plans", "psf-137-check.yaml");

    /// <summary>The virtual bench.</summary>
    public string Bench => Path.Combine(Folder, "bench-virtual.yaml");

    /// <summary>Writes every embedded demo file under a new scratch folder.</summary>
    public static DemoFiles Extract()
    {
        var folder = Path.Combine(Path.GetTempPath(), "benchrunner-demo-" + Guid.NewGuid().ToString("N"));
        var assembly = typeof(DemoFiles).Assembly;
        foreach (var name in assembly.GetManifestResourceNames().Where(n => n.StartsWith(Prefix, StringComparison.Ordinal)))
        {
            var target = Path.Combine(folder, name[Prefix.Length..].Replace('/', Path.DirectorySeparatorChar));
            Directory.CreateDirectory(Path.GetDirectoryName(target)!);
            using var source = assembly.GetManifestResourceStream(name)!;
            using var file = File.Create(target);
            source.CopyTo(file);
        }

        return new DemoFiles(folder);
    }

    /// <inheritdoc/>
    public void Dispose()
    {
        try
        {
            Directory.Delete(Folder, recursive: true);
        }
        catch (IOException)
        {
            // A scratch folder left behind is harmless.
        }
    }
}
