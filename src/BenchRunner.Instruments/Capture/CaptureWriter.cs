using System.Text;

namespace BenchRunner.Instruments.Capture;

/// <summary>
/// Writes a capture file (docs/capture-format.md): the header at once, then one line per chunk
/// or event, each flushed to the operating system as soon as it is written, so that a crash
/// loses at most the line being written. Append-only; offsets must not decrease.
/// Safe to call from a reading and a writing task at the same time.
/// </summary>
public sealed class CaptureWriter : IDisposable
{
    private readonly Stream _stream;
    private readonly bool _leaveOpen;
    private readonly Lock _lock = new();
    private TimeSpan _lastOffset;
    private bool _disposed;

    /// <summary>Starts a capture on <paramref name="stream"/> and writes the header to it.</summary>
    /// <param name="stream">A writable stream, positioned where the capture is to start.</param>
    /// <param name="header">The header to write.</param>
    /// <param name="leaveOpen">Whether disposing the writer leaves the stream open. Default false.</param>
    /// <exception cref="ArgumentException">The stream is not writable.</exception>
    /// <exception cref="IOException">The header cannot be written.</exception>
    public CaptureWriter(Stream stream, CaptureHeader header, bool leaveOpen = false)
    {
        ArgumentNullException.ThrowIfNull(stream);
        ArgumentNullException.ThrowIfNull(header);
        if (!stream.CanWrite)
        {
            throw new ArgumentException("The capture stream is not writable.", nameof(stream));
        }

        _stream = stream;
        _leaveOpen = leaveOpen;
        Header = header;
        WriteLines(HeaderLines(header));
    }

    /// <summary>The header written at the start.</summary>
    public CaptureHeader Header { get; }

    /// <summary>The offset of the last chunk or event written (zero before the first).</summary>
    public TimeSpan LastOffset
    {
        get
        {
            lock (_lock)
            {
                return _lastOffset;
            }
        }
    }

    /// <summary>How many chunks have been written.</summary>
    public int ChunkCount { get; private set; }

    /// <summary>Creates the file at <paramref name="path"/> and starts a capture in it.</summary>
    /// <param name="path">Where to write.</param>
    /// <param name="header">The header to write.</param>
    /// <param name="overwrite">Whether an existing file is replaced. Default false: an existing file is an error, so a recording cannot destroy another.</param>
    /// <exception cref="IOException">The file exists (and <paramref name="overwrite"/> is false) or cannot be written.</exception>
    public static CaptureWriter Create(string path, CaptureHeader header, bool overwrite = false)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        var stream = new FileStream(path, overwrite ? FileMode.Create : FileMode.CreateNew, FileAccess.Write, FileShare.Read);
        try
        {
            return new CaptureWriter(stream, header);
        }
        catch
        {
            stream.Dispose();
            throw;
        }
    }

    /// <summary>Appends one chunk. Empty data writes nothing.</summary>
    /// <param name="offset">Time since <see cref="CaptureHeader.StartedUtc"/>; kept to whole microseconds; not less than <see cref="LastOffset"/>.</param>
    /// <param name="direction">Which way the bytes went.</param>
    /// <param name="data">The bytes.</param>
    /// <exception cref="ArgumentOutOfRangeException">The offset is negative, earlier than the last one written, or 10^10 s or more.</exception>
    /// <exception cref="ObjectDisposedException">The writer is disposed.</exception>
    /// <exception cref="IOException">The line cannot be written.</exception>
    public void WriteChunk(TimeSpan offset, CaptureDirection direction, ReadOnlySpan<byte> data)
    {
        if (!Enum.IsDefined(direction))
        {
            throw new ArgumentOutOfRangeException(nameof(direction), direction, "Unknown direction.");
        }

        if (data.IsEmpty)
        {
            return;
        }

        bool base64 = CaptureEscaping.PreferBase64(data);
        var payload = base64 ? Convert.ToBase64String(data) : CaptureEscaping.Escape(data);
        lock (_lock)
        {
            Append(offset, CaptureFormat.Marker(direction, base64), payload);
            ChunkCount++;
        }
    }

    /// <summary>Appends an event line such as <c>! closed by peer</c>.</summary>
    /// <param name="offset">As for <see cref="WriteChunk"/>.</param>
    /// <param name="text">What happened; not empty. Written as escaped UTF-8.</param>
    /// <exception cref="ArgumentException">The text is empty.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The offset is negative, earlier than the last one written, or 10^10 s or more.</exception>
    /// <exception cref="ObjectDisposedException">The writer is disposed.</exception>
    /// <exception cref="IOException">The line cannot be written.</exception>
    public void WriteEvent(TimeSpan offset, string text)
    {
        ArgumentException.ThrowIfNullOrEmpty(text);
        lock (_lock)
        {
            Append(offset, "!", CaptureFormat.EscapeText(text));
        }
    }

    /// <summary>Closes the stream unless it was to be left open. Lines already written stay written.</summary>
    public void Dispose()
    {
        lock (_lock)
        {
            if (_disposed)
            {
                return;
            }

            _disposed = true;
            if (!_leaveOpen)
            {
                _stream.Dispose();
            }
        }
    }

    private void Append(TimeSpan offset, string marker, string payload)
    {
        ObjectDisposedException.ThrowIf(_disposed, this);
        ArgumentOutOfRangeException.ThrowIfLessThan(offset, TimeSpan.Zero);
        if (offset >= CaptureFormat.OffsetLimit)
        {
            throw new ArgumentOutOfRangeException(nameof(offset), offset, "A capture offset has at most ten digits of whole seconds.");
        }

        var rounded = CaptureFormat.FromMicroseconds(CaptureFormat.Microseconds(offset));
        if (rounded < _lastOffset)
        {
            throw new ArgumentOutOfRangeException(nameof(offset), offset,
                $"Capture offsets never decrease; the last one written was {CaptureFormat.DescribeOffset(_lastOffset)}.");
        }

        WriteLines([$"{CaptureFormat.FormatOffset(rounded)} {marker} {payload}"]);
        _lastOffset = rounded;
    }

    private void WriteLines(IEnumerable<string> lines)
    {
        var text = new StringBuilder();
        foreach (var line in lines)
        {
            text.Append(line).Append('\n');
        }

        _stream.Write(Encoding.ASCII.GetBytes(text.ToString()));
        _stream.Flush();
    }

    private static List<string> HeaderLines(CaptureHeader header)
    {
        var lines = new List<string>
        {
            $"{CaptureFormat.Magic} {CaptureFormat.Version}",
            HeaderLine(CaptureFormat.StartedKey, CaptureFormat.FormatStarted(header.StartedUtc)),
            HeaderLine(CaptureFormat.ConnectionKey, CaptureFormat.EscapeText(header.Connection)),
        };

        if (header.Instrument is not null)
        {
            lines.Add(HeaderLine(CaptureFormat.InstrumentKey, CaptureFormat.EscapeText(header.Instrument)));
        }

        if (header.Note is not null)
        {
            lines.Add(HeaderLine(CaptureFormat.NoteKey, CaptureFormat.EscapeText(header.Note)));
        }

        foreach (var (key, value) in header.Extra)
        {
            lines.Add(HeaderLine(key, CaptureFormat.EscapeText(value)));
        }

        lines.Add("");
        return lines;
    }

    private static string HeaderLine(string key, string escapedValue) =>
        escapedValue.Length == 0 ? $"{key}:" : $"{key}: {escapedValue}";
}
