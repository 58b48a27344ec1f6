using System.Globalization;
using System.Reflection;

namespace BenchRunner.Storage.Schema;

/// <summary>
/// The migrations shipped with this build: the embedded files <c>Schema/Sql/NNNN-name.sql</c>,
/// in version order. A new schema version is a new file; shipped files never change.
/// </summary>
internal static class SchemaMigrations
{
    private const string Prefix = "schema/";

    private static readonly Lazy<IReadOnlyList<Migration>> Loaded = new(Load);

    /// <summary>Every migration, version 1 first.</summary>
    public static IReadOnlyList<Migration> All => Loaded.Value;

    private static IReadOnlyList<Migration> Load()
    {
        var assembly = typeof(SchemaMigrations).Assembly;
        var migrations = assembly.GetManifestResourceNames()
            .Where(n => n.StartsWith(Prefix, StringComparison.Ordinal) && n.EndsWith(".sql", StringComparison.Ordinal))
            .Select(n => Read(assembly, n))
            .OrderBy(m => m.Version)
            .ToList();
        for (int i = 0; i < migrations.Count; i++)
        {
            if (migrations[i].Version != i + 1)
            {
                throw new InvalidOperationException($"Schema migrations must be numbered 1, 2, 3... without gaps; found version {migrations[i].Version} in place {i + 1}.");
            }
        }

        return migrations;
    }

    private static Migration Read(Assembly assembly, string resourceName)
    {
        var fileName = resourceName[Prefix.Length..^".sql".Length];
        var dash = fileName.IndexOf('-', StringComparison.Ordinal);
        var version = int.Parse(dash < 0 ? fileName : fileName[..dash], NumberStyles.None, CultureInfo.InvariantCulture);
        using var stream = assembly.GetManifestResourceStream(resourceName)!;
        using var reader = new StreamReader(stream);
        return new Migration(version, dash < 0 ? fileName : fileName[(dash + 1)..], reader.ReadToEnd());
    }
}
