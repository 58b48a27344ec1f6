namespace BenchRunner.Instruments.Capture;

/// <summary>
/// Something that happened on the recorded connection other than bytes passing: opened, closed,
/// closed by the peer, a read that was cancelled or failed. Written as a <c>!</c> line.
/// Replay does not act on events; they are there for the reader of the capture.
/// </summary>
public sealed class CaptureEvent
{
    /// <summary>Creates an event.</summary>
    /// <param name="offset">Time since the start of the recording; kept to whole microseconds.</param>
    /// <param name="text">What happened, e.g. <c>closed by peer</c>; not empty.</param>
    /// <param name="line">The line of the capture file it was read from, or 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A negative offset or line.</exception>
    /// <exception cref="ArgumentException"><paramref name="text"/> is empty.</exception>
    public CaptureEvent(TimeSpan offset, string text, int line = 0)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(offset, TimeSpan.Zero);
        ArgumentOutOfRangeException.ThrowIfNegative(line);
        ArgumentException.ThrowIfNullOrEmpty(text);
        Offset = CaptureFormat.FromMicroseconds(CaptureFormat.Microseconds(offset));
        Text = text;
        Line = line;
    }

    /// <summary>Time since the start of the recording, in whole microseconds.</summary>
    public TimeSpan Offset { get; }

    /// <summary>What happened.</summary>
    public string Text { get; }

    /// <summary>The line of the capture file the event was read from; 0 when it was not read from a file.</summary>
    public int Line { get; }

    /// <inheritdoc/>
    public override string ToString() => $"{CaptureFormat.FormatOffset(Offset)} ! {Text}";
}
