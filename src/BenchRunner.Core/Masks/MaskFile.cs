using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Core.Masks;

/// <summary>
/// Reads and writes limit masks in the project's YAML mask format (see <c>docs/mask-format.md</c>).
/// Reading is strict: every problem is an <see cref="InputFormatException"/> naming the file,
/// line and column of the offending token and what was expected.
/// </summary>
public static class MaskFile
{
    /// <summary>Reads the mask file at <paramref name="path"/>; messages name the path as given.</summary>
    /// <exception cref="InputFormatException">The file is missing, unreadable or not a valid mask.</exception>
    public static LimitMask Load(string path)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        return Parse(InputFile.ReadAllText(path), path);
    }

    /// <summary>Parses mask text.</summary>
    /// <param name="text">The file's content.</param>
    /// <param name="sourceName">The name used in messages, usually the file's path.</param>
    /// <exception cref="InputFormatException">The text is not a valid mask.</exception>
    public static LimitMask Parse(string text, string sourceName)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(sourceName);
        return MaskFileReader.Read(text, sourceName);
    }

    /// <summary>
    /// Reads a mask from an already-read YAML node, for files that hold a mask inline (test
    /// plans). The node is read exactly as a mask file's root: same keys, same rules.
    /// </summary>
    /// <param name="node">The mask's mapping.</param>
    /// <param name="sourceName">The name of the file holding the node, used in messages.</param>
    /// <exception cref="InputFormatException">The node is not a valid mask.</exception>
    public static LimitMask Read(Yaml.YamlItem node, string sourceName)
    {
        ArgumentNullException.ThrowIfNull(node);
        ArgumentNullException.ThrowIfNull(sourceName);
        return MaskFileReader.ReadTree(node, sourceName);
    }

    /// <summary>
    /// Writes <paramref name="mask"/> in the mask format. Reading the output back with
    /// <see cref="Parse"/> gives an equal mask: same corners to the last bit, same settings.
    /// </summary>
    public static void Write(TextWriter writer, LimitMask mask)
    {
        ArgumentNullException.ThrowIfNull(writer);
        ArgumentNullException.ThrowIfNull(mask);
        MaskFileWriter.Write(writer, mask);
    }

    /// <summary>The mask in the mask format, as a string.</summary>
    public static string Format(LimitMask mask)
    {
        var writer = new StringWriter();
        Write(writer, mask);
        return writer.ToString();
    }
}
