using BenchRunner.Core.Diagnostics;
using BenchRunner.Instruments.Kinds;

namespace BenchRunner.Execution.Bench;

/// <summary>
/// Reads bench files (docs/bench-format.md): the instruments by role, their connections,
/// adapters, profiles and declared limits, and the signal paths between them. Reading is strict
/// and reports every problem at once in one <see cref="InputFormatException"/>.
/// </summary>
public static class BenchFile
{
    /// <summary>Reads the bench file at <paramref name="path"/>; profile paths are taken from its folder.</summary>
    /// <param name="path">The bench file.</param>
    /// <param name="kinds">The kinds of instrument the bench and its profiles may name; <see cref="InstrumentKindRegistry.BuiltIn"/> when null.</param>
    /// <exception cref="InputFormatException">The file is missing, unreadable or not a valid bench.</exception>
    public static BenchDefinition Load(string path, InstrumentKindRegistry? kinds = null)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        var folder = Path.GetDirectoryName(Path.GetFullPath(path)) ?? ".";
        return Parse(InputFile.ReadAllText(path), path, folder, kinds);
    }

    /// <summary>Parses bench text.</summary>
    /// <param name="text">The file's content.</param>
    /// <param name="sourceName">The name used in messages, usually the file's path.</param>
    /// <param name="folder">The folder relative profile paths are taken from.</param>
    /// <param name="kinds">The kinds of instrument the bench and its profiles may name; <see cref="InstrumentKindRegistry.BuiltIn"/> when null.</param>
    /// <exception cref="InputFormatException">The text is not a valid bench.</exception>
    public static BenchDefinition Parse(string text, string sourceName, string folder, InstrumentKindRegistry? kinds = null)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(sourceName);
        ArgumentNullException.ThrowIfNull(folder);
        return BenchFileReader.Read(text, sourceName, folder, kinds ?? InstrumentKindRegistry.BuiltIn);
    }
}
