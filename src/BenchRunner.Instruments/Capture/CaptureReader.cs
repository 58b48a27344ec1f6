using System.Globalization;
using System.Text;
using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Instruments.Capture;

/// <summary>
/// Reads capture files (docs/capture-format.md). A malformed file raises
/// <see cref="InputFormatException"/> naming the file, line and column and what was expected.
/// A last line without a line end is taken as cut off by an interrupted recording: it is left
/// out and reported in <see cref="CapturedSession.IncompleteLine"/>.
/// </summary>
public static class CaptureReader
{
    /// <summary>Reads the capture file at <paramref name="path"/>.</summary>
    /// <exception cref="InputFormatException">The file is not a well-formed capture.</exception>
    /// <exception cref="IOException">The file cannot be read.</exception>
    public static CapturedSession Read(string path)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        // Latin-1 maps every byte to one character, so a stray non-ASCII byte is reported at its own column.
        using var reader = InputFile.OpenText(path, Encoding.Latin1);
        return Parse(reader, path);
    }

    /// <summary>Reads a capture from <paramref name="reader"/>.</summary>
    /// <param name="reader">The text of the capture.</param>
    /// <param name="sourceName">The name used in error messages and kept as <see cref="CapturedSession.SourceName"/>.</param>
    /// <exception cref="InputFormatException">The text is not a well-formed capture.</exception>
    public static CapturedSession Parse(TextReader reader, string sourceName)
    {
        ArgumentNullException.ThrowIfNull(reader);
        ArgumentException.ThrowIfNullOrEmpty(sourceName);
        var lines = new CaptureLineSource(reader);
        var header = ReadHeader(lines, sourceName);

        var chunks = new List<CaptureChunk>();
        var events = new List<CaptureEvent>();
        var last = TimeSpan.Zero;
        int lastLine = 0;
        int? incomplete = null;
        while (lines.Next(out bool terminated) is { } line)
        {
            int number = lines.LineNumber;
            if (!terminated)
            {
                incomplete = number;
                break;
            }

            if (line.Length == 0 || line[0] == '#')
            {
                continue;
            }

            var offset = ParseOffset(line, sourceName, number);
            if (offset < last)
            {
                throw Error(sourceName, number, 1,
                    $"the time offset {CaptureFormat.DescribeOffset(offset)} is earlier than {CaptureFormat.DescribeOffset(last)} on line {lastLine}; offsets never decrease");
            }

            last = offset;
            lastLine = number;
            ParseEntry(line, offset, sourceName, number, chunks, events);
        }

        return new CapturedSession(header, chunks, events, sourceName, incomplete);
    }

    private static CaptureHeader ReadHeader(CaptureLineSource lines, string source)
    {
        var magic = lines.Next(out bool terminated);
        string prefix = CaptureFormat.Magic + " ";
        if (magic is null || !magic.StartsWith(prefix, StringComparison.Ordinal))
        {
            throw Error(source, 1, 1, $"expected \"{CaptureFormat.Magic} {CaptureFormat.Version}\" as the first line; this is not a capture file");
        }

        var versionText = magic[prefix.Length..];
        if (versionText.Length == 0 || versionText.Length > 9 || !versionText.All(char.IsAsciiDigit) || versionText[0] == '0')
        {
            throw Error(source, 1, prefix.Length + 1, $"expected a format version number after \"{CaptureFormat.Magic} \"");
        }

        int version = int.Parse(versionText, CultureInfo.InvariantCulture);
        if (version != CaptureFormat.Version)
        {
            throw Error(source, 1, prefix.Length + 1,
                $"capture format version {version} is not supported; this program reads version {CaptureFormat.Version}");
        }

        var values = new Dictionary<string, (string Value, int Line)>();
        var extra = new List<KeyValuePair<string, string>>();
        while (true)
        {
            if (!terminated || lines.Next(out terminated) is not { } line)
            {
                throw Error(source, lines.LineNumber, 0, "the file ends inside the header; expected a blank line after the header");
            }

            int number = lines.LineNumber;
            if (line.Length == 0)
            {
                break;
            }

            if (line[0] == '#')
            {
                continue;
            }

            int colon = line.IndexOf(':');
            var key = colon < 0 ? line : line[..colon];
            if (colon <= 0 || !CaptureFormat.IsValidKey(key))
            {
                throw Error(source, number, 1, "expected a header line \"key: value\" with a key of lower-case letters, digits and '-', or a blank line ending the header");
            }

            if (colon + 1 < line.Length && line[colon + 1] != ' ')
            {
                throw Error(source, number, colon + 2, "expected a space after the colon");
            }

            if (values.ContainsKey(key))
            {
                throw Error(source, number, 1, $"\"{key}\" is given twice in the header (first on line {values[key].Line})");
            }

            var value = DecodeText(line, Math.Min(colon + 2, line.Length), source, number);
            values[key] = (value, number);
            if (key is not (CaptureFormat.StartedKey or CaptureFormat.ConnectionKey or CaptureFormat.InstrumentKey or CaptureFormat.NoteKey))
            {
                extra.Add(new(key, value));
            }
        }

        int blankLine = lines.LineNumber;
        if (!values.TryGetValue(CaptureFormat.StartedKey, out var started))
        {
            throw Error(source, blankLine, 0, $"the header has no \"{CaptureFormat.StartedKey}:\" line (the UTC start, e.g. 2025-03-14T09:30:00.000000Z)");
        }

        if (!DateTimeOffset.TryParseExact(started.Value, CaptureFormat.StartedFormat, CultureInfo.InvariantCulture,
                DateTimeStyles.AssumeUniversal | DateTimeStyles.AdjustToUniversal, out var startedUtc))
        {
            throw Error(source, started.Line, CaptureFormat.StartedKey.Length + 3,
                "expected the UTC start as yyyy-mm-ddThh:mm:ss.ffffffZ, e.g. 2025-03-14T09:30:00.000000Z");
        }

        if (!values.TryGetValue(CaptureFormat.ConnectionKey, out var connection) || connection.Value.Length == 0)
        {
            throw Error(source, connection.Line == 0 ? blankLine : connection.Line, 0,
                $"the header needs a non-empty \"{CaptureFormat.ConnectionKey}:\" line describing the connection");
        }

        values.TryGetValue(CaptureFormat.InstrumentKey, out var instrument);
        if (instrument.Line != 0 && instrument.Value.Length == 0)
        {
            throw Error(source, instrument.Line, 0, "the instrument name is empty; leave the line out if there is none");
        }

        string? note = values.TryGetValue(CaptureFormat.NoteKey, out var n) ? n.Value : null;
        return new CaptureHeader(startedUtc, connection.Value, instrument.Line == 0 ? null : instrument.Value, note, extra);
    }

    private static TimeSpan ParseOffset(string line, string source, int number)
    {
        int i = 0;
        long seconds = 0;
        while (i < line.Length && char.IsAsciiDigit(line[i]) && i < CaptureFormat.OffsetMaxDigits)
        {
            seconds = seconds * 10 + (line[i] - '0');
            i++;
        }

        if (i == 0 || i >= line.Length || line[i] != '.')
        {
            throw Error(source, number, i + 1,
                "expected a time offset in seconds with six decimals, such as 00012.000345, then the direction");
        }

        i++;
        long micros = 0;
        for (int d = 0; d < CaptureFormat.OffsetFractionDigits; d++, i++)
        {
            if (i >= line.Length || !char.IsAsciiDigit(line[i]))
            {
                throw Error(source, number, i + 1, "expected six decimals in the time offset (microseconds), such as 00012.000345");
            }

            micros = micros * 10 + (line[i] - '0');
        }

        if (i >= line.Length || line[i] != ' ')
        {
            throw Error(source, number, i + 1, "expected a space after the time offset (which has exactly six decimals)");
        }

        return CaptureFormat.FromMicroseconds(seconds * 1_000_000 + micros);
    }

    private static void ParseEntry(string line, TimeSpan offset, string source, int number, List<CaptureChunk> chunks, List<CaptureEvent> events)
    {
        int markerStart = line.IndexOf(' ') + 1;
        int markerEnd = line.IndexOf(' ', markerStart);
        var marker = markerEnd < 0 ? line[markerStart..] : line[markerStart..markerEnd];
        if (!CaptureFormat.Markers.Contains(marker))
        {
            throw Error(source, number, markerStart + 1, "expected '>' (host to device), '<' (device to host), '>b' or '<b' (base64) or '!' (event) after the time offset");
        }

        int payload = markerEnd + 1;
        if (markerEnd < 0 || payload >= line.Length)
        {
            throw Error(source, number, line.Length + 1, $"expected a space and at least one byte after \"{marker}\"");
        }

        if (marker == "!")
        {
            events.Add(new CaptureEvent(offset, DecodeText(line, payload, source, number), number));
            return;
        }

        bool base64 = marker.Length == 2;
        var bytes = base64
            ? CaptureEscaping.TryDecodeBase64(line, payload, out int at, out string error)
            : CaptureEscaping.TryUnescape(line, payload, out at, out error);
        if (bytes is null)
        {
            throw Error(source, number, at + 1, error);
        }

        if (bytes.Length == 0)
        {
            throw Error(source, number, payload + 1, "expected at least one byte");
        }

        var direction = marker[0] == '>' ? CaptureDirection.HostToDevice : CaptureDirection.DeviceToHost;
        chunks.Add(new CaptureChunk(offset, direction, bytes, number));
    }

    private static string DecodeText(string line, int start, string source, int number)
    {
        var bytes = CaptureEscaping.TryUnescape(line, start, out int at, out string error)
            ?? throw Error(source, number, at + 1, error);
        return Encoding.UTF8.GetString(bytes);
    }

    private static InputFormatException Error(string source, int line, int column, string detail) =>
        new(new SourceLocation(source, line, column), detail);
}
