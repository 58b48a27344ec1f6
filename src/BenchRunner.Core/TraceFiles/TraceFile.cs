using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.TraceFiles;

/// <summary>Reads a trace file of any supported kind, chosen by its extension.</summary>
public static class TraceFile
{
    /// <summary>The extensions <see cref="Read"/> understands.</summary>
    public static IReadOnlyList<string> Extensions { get; } = [".s1p", ".s2p", ".ts", ".csv"];

    /// <summary>
    /// Reads <paramref name="path"/>: <c>.s1p</c> and <c>.s2p</c> as Touchstone (version 1 or 2),
    /// <c>.ts</c> as Touchstone version 2.0 (1 or 2 ports), <c>.csv</c> as BenchRunner's CSV layout.
    /// The extension's letter case does not matter.
    /// </summary>
    /// <exception cref="InputFormatException">
    /// An unknown extension, a missing or unreadable file, malformed content, or Touchstone data that
    /// a trace set cannot hold (more than two ports, or ports with different references).
    /// </exception>
    public static TraceSet Read(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        var extension = Path.GetExtension(path).ToLowerInvariant();
        if (!Extensions.Contains(extension))
        {
            var shown = extension.Length == 0 ? "no extension" : $"\"{extension}\"";
            throw new InputFormatException(SourceLocation.OfFile(path),
                $"unknown trace file type ({shown}); expected {string.Join(", ", Extensions)}");
        }

        if (!File.Exists(path))
        {
            throw new InputFormatException(SourceLocation.OfFile(path), "file not found");
        }

        if (extension == ".csv")
        {
            return CsvTraceFile.Read(path);
        }

        var data = TouchstoneReader.Read(path);
        if (data.PortCount > 2)
        {
            throw new InputFormatException(SourceLocation.OfFile(path),
                $"the file has {data.PortCount} ports; a trace set holds 1- or 2-port data");
        }

        if (!data.HasUniformReference)
        {
            throw new InputFormatException(SourceLocation.OfFile(path),
                $"the ports have different reference impedances ({string.Join(", ", data.ReferenceOhms.Select(TraceFileText.Format))} ohms); a trace set needs one");
        }

        return data.ToTraceSet();
    }
}
