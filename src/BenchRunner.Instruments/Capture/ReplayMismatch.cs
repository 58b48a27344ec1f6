using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Instruments.Capture;

/// <summary>
/// A host write that did not match the recording being replayed: where in the capture, at which
/// byte, and what was expected and written.
/// </summary>
public sealed class ReplayMismatch
{
    private const int Context = 24;
    private const int Shown = 64;

    internal ReplayMismatch(string sourceName, CaptureChunk? chunk, int chunkNumber, int chunkByte, ReadOnlyMemory<byte> written, int writtenByte)
    {
        SourceName = sourceName;
        ChunkNumber = chunk is null ? null : chunkNumber;
        Line = chunk?.Line ?? 0;
        ByteOffset = chunkByte;
        Expected = chunk?.Data ?? ReadOnlyMemory<byte>.Empty;
        Actual = written.ToArray();
        ActualOffset = writtenByte;
        Description = chunk is null ? DescribeEnd(chunkNumber) : DescribeDifference();
    }

    /// <summary>The name of the capture being replayed.</summary>
    public string SourceName { get; }

    /// <summary>The 1-based number of the recorded chunk compared with, or null when the recording had ended.</summary>
    public int? ChunkNumber { get; }

    /// <summary>The capture line of that chunk; 0 when unknown (past the end, or not read from a file).</summary>
    public int Line { get; }

    /// <summary>Whether the host wrote after the last recorded chunk.</summary>
    public bool RecordingEnded => ChunkNumber is null;

    /// <summary>The 0-based offset within the recorded chunk of the first differing byte.</summary>
    public int ByteOffset { get; }

    /// <summary>The recorded chunk's bytes (empty when the recording had ended).</summary>
    public ReadOnlyMemory<byte> Expected { get; }

    /// <summary>What the host wrote, the whole write.</summary>
    public ReadOnlyMemory<byte> Actual { get; }

    /// <summary>The 0-based offset within <see cref="Actual"/> of the first differing byte.</summary>
    public int ActualOffset { get; }

    /// <summary>The mismatch in words, with the bytes shown in the capture's escaped form.</summary>
    public string Description { get; }

    /// <inheritdoc/>
    public override string ToString() => Description;

    private string DescribeDifference()
    {
        var where = Line > 0 ? $"{SourceLocation.OfLine(SourceName, Line)}, chunk {ChunkNumber}" : $"{SourceName}, chunk {ChunkNumber}";
        var expected = Expected.Span;
        var actual = Actual.Span;
        var got = ActualOffset < actual.Length ? ByteText(actual[ActualOffset]) : "nothing";
        return $"the host wrote \"{Window(actual, ActualOffset)}\" where the recording ({where}) has \"{Window(expected, ByteOffset)}\"; "
            + $"first difference at byte {ByteOffset} of the chunk: expected {ByteText(expected[ByteOffset])}, got {got}";
    }

    private string DescribeEnd(int chunkCount) =>
        $"the recording has ended: the host wrote \"{Window(Actual.Span, ActualOffset)}\" after the last of the {chunkCount} recorded chunks of {SourceName}";

    /// <summary>The bytes around <paramref name="at"/>, escaped, with "..." where cut.</summary>
    private static string Window(ReadOnlySpan<byte> bytes, int at)
    {
        int start = Math.Max(0, at - Context);
        int end = Math.Min(bytes.Length, start + Shown);
        var text = CaptureEscaping.Escape(bytes[start..end]);
        return (start > 0 ? "..." : "") + text + (end < bytes.Length ? "..." : "");
    }

    private static string ByteText(byte b) => $"\"{CaptureEscaping.Escape([b])}\" (0x{b:X2})";
}
