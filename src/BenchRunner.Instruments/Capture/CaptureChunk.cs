namespace BenchRunner.Instruments.Capture;

/// <summary>
/// Bytes that crossed the recorded connection in one direction at one moment: what one write
/// sent, or what one read returned.
/// </summary>
public sealed class CaptureChunk
{
    private readonly byte[] _data;

    /// <summary>Creates a chunk; the bytes are copied.</summary>
    /// <param name="offset">Time since the start of the recording; kept to whole microseconds, the resolution of the file format.</param>
    /// <param name="direction">Which way the bytes went.</param>
    /// <param name="data">The bytes, at least one.</param>
    /// <param name="line">The line of the capture file it was read from, or 0 when it was not read from a file.</param>
    /// <exception cref="ArgumentOutOfRangeException">A negative offset or line, or an unknown direction.</exception>
    /// <exception cref="ArgumentException"><paramref name="data"/> is empty.</exception>
    public CaptureChunk(TimeSpan offset, CaptureDirection direction, ReadOnlySpan<byte> data, int line = 0)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(offset, TimeSpan.Zero);
        ArgumentOutOfRangeException.ThrowIfNegative(line);
        if (!Enum.IsDefined(direction))
        {
            throw new ArgumentOutOfRangeException(nameof(direction), direction, "Unknown direction.");
        }

        if (data.IsEmpty)
        {
            throw new ArgumentException("A chunk holds at least one byte.", nameof(data));
        }

        Offset = CaptureFormat.FromMicroseconds(CaptureFormat.Microseconds(offset));
        Direction = direction;
        _data = data.ToArray();
        Line = line;
    }

    /// <summary>Time since the start of the recording, in whole microseconds.</summary>
    public TimeSpan Offset { get; }

    /// <summary>Which way the bytes went.</summary>
    public CaptureDirection Direction { get; }

    /// <summary>The bytes (never empty).</summary>
    public ReadOnlyMemory<byte> Data => _data;

    /// <summary>How many bytes the chunk holds.</summary>
    public int Length => _data.Length;

    /// <summary>The line of the capture file the chunk was read from; 0 when it was not read from a file.</summary>
    public int Line { get; }

    /// <summary>The chunk as a capture line would show it, e.g. <c>00001.250000 &lt; 137500000\n</c> (always escaped text).</summary>
    public override string ToString() =>
        $"{CaptureFormat.FormatOffset(Offset)} {CaptureFormat.Marker(Direction, base64: false)} {CaptureEscaping.Escape(_data)}";
}
