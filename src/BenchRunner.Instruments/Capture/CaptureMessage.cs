namespace BenchRunner.Instruments.Capture;

/// <summary>
/// Consecutive chunks of one direction joined together: a command as the host wrote it, or a
/// reply as the device sent it, however the transport happened to cut it into reads.
/// </summary>
public sealed class CaptureMessage
{
    private readonly byte[] _data;

    internal CaptureMessage(IReadOnlyList<CaptureChunk> chunks, int firstChunk, int chunkCount)
    {
        var first = chunks[firstChunk];
        var last = chunks[firstChunk + chunkCount - 1];
        Direction = first.Direction;
        Offset = first.Offset;
        EndOffset = last.Offset;
        FirstChunk = firstChunk;
        ChunkCount = chunkCount;
        Line = first.Line;
        _data = new byte[Enumerable.Range(firstChunk, chunkCount).Sum(i => chunks[i].Length)];
        int at = 0;
        for (int i = firstChunk; i < firstChunk + chunkCount; i++)
        {
            chunks[i].Data.Span.CopyTo(_data.AsSpan(at));
            at += chunks[i].Length;
        }
    }

    /// <summary>Which way the bytes went.</summary>
    public CaptureDirection Direction { get; }

    /// <summary>The offset of the first chunk.</summary>
    public TimeSpan Offset { get; }

    /// <summary>The offset of the last chunk.</summary>
    public TimeSpan EndOffset { get; }

    /// <summary>The index of the first chunk in <see cref="CapturedSession.Chunks"/> (0-based).</summary>
    public int FirstChunk { get; }

    /// <summary>How many chunks were joined.</summary>
    public int ChunkCount { get; }

    /// <summary>The capture line of the first chunk, or 0 when not read from a file.</summary>
    public int Line { get; }

    /// <summary>The bytes of all the chunks, in order.</summary>
    public ReadOnlyMemory<byte> Data => _data;

    /// <summary>The bytes in the capture's escaped-text form (<c>*IDN?\n</c>), shortened to <paramref name="maxLength"/> characters with "...".</summary>
    public string ToText(int maxLength = int.MaxValue)
    {
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(maxLength);
        var text = CaptureEscaping.Escape(_data);
        return text.Length <= maxLength ? text : text[..maxLength] + "...";
    }

    /// <summary>For display: direction marker and text, e.g. <c>&gt; *IDN?\n</c>, at most about 120 characters.</summary>
    public override string ToString() => $"{CaptureFormat.Marker(Direction, base64: false)} {ToText(120)}";
}
