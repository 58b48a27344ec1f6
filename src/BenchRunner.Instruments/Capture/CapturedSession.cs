namespace BenchRunner.Instruments.Capture;

/// <summary>
/// A recorded conversation with an instrument, as read from a capture file: the header, every
/// chunk of bytes in order with its direction and time, and the events noted along the way.
/// </summary>
public sealed class CapturedSession
{
    /// <summary>Creates a session from its parts (the reader does this; tests and tools may too).</summary>
    /// <param name="header">The header.</param>
    /// <param name="chunks">The chunks, in order; offsets must not decrease.</param>
    /// <param name="events">The events, in order; offsets must not decrease. None by default.</param>
    /// <param name="sourceName">Where the session came from (a file name), for messages. Default "capture".</param>
    /// <param name="incompleteLine">The line number of a last line that had no line end and was left out, or null.</param>
    /// <exception cref="ArgumentException">Offsets decrease.</exception>
    public CapturedSession(
        CaptureHeader header,
        IEnumerable<CaptureChunk> chunks,
        IEnumerable<CaptureEvent>? events = null,
        string sourceName = "capture",
        int? incompleteLine = null)
    {
        ArgumentNullException.ThrowIfNull(header);
        ArgumentNullException.ThrowIfNull(chunks);
        ArgumentException.ThrowIfNullOrEmpty(sourceName);
        Header = header;
        Chunks = chunks.ToArray();
        Events = (events ?? []).ToArray();
        SourceName = sourceName;
        IncompleteLine = incompleteLine;
        EnsureOrdered(Chunks.Select(c => c.Offset), nameof(chunks));
        EnsureOrdered(Events.Select(e => e.Offset), nameof(events));
    }

    /// <summary>The header.</summary>
    public CaptureHeader Header { get; }

    /// <summary>Every chunk, in the order it crossed the connection.</summary>
    public IReadOnlyList<CaptureChunk> Chunks { get; }

    /// <summary>Events (opened, closed by peer, read failed...), in order.</summary>
    public IReadOnlyList<CaptureEvent> Events { get; }

    /// <summary>Where the session came from, for messages.</summary>
    public string SourceName { get; }

    /// <summary>
    /// The line number of a last line that had no line end, or null. Such a line is what an
    /// interrupted recording leaves behind; it is not part of <see cref="Chunks"/>.
    /// </summary>
    public int? IncompleteLine { get; }

    /// <summary>The offset of the last chunk or event (zero for an empty session).</summary>
    public TimeSpan Duration =>
        new[] { Chunks.Count > 0 ? Chunks[^1].Offset : TimeSpan.Zero, Events.Count > 0 ? Events[^1].Offset : TimeSpan.Zero }.Max();

    /// <summary>How many bytes went in <paramref name="direction"/>.</summary>
    public long ByteCount(CaptureDirection direction) => Chunks.Where(c => c.Direction == direction).Sum(c => (long)c.Length);

    /// <summary>All the bytes that went in <paramref name="direction"/>, joined in order.</summary>
    public byte[] BytesSent(CaptureDirection direction)
    {
        var bytes = new byte[ByteCount(direction)];
        int at = 0;
        foreach (var chunk in Chunks.Where(c => c.Direction == direction))
        {
            chunk.Data.Span.CopyTo(bytes.AsSpan(at));
            at += chunk.Length;
        }

        return bytes;
    }

    /// <summary>Runs of consecutive chunks of one direction, each joined into one message.</summary>
    public IReadOnlyList<CaptureMessage> Messages()
    {
        var messages = new List<CaptureMessage>();
        int start = 0;
        for (int i = 1; i <= Chunks.Count; i++)
        {
            if (i == Chunks.Count || Chunks[i].Direction != Chunks[start].Direction)
            {
                messages.Add(new CaptureMessage(Chunks, start, i - start));

                start = i;
            }
        }

        return messages;
    }

    /// <summary>Each command paired with the reply that followed it (see <see cref="CaptureExchange"/>).</summary>
    public IReadOnlyList<CaptureExchange> Exchanges()
    {
        var exchanges = new List<CaptureExchange>();
        CaptureMessage? command = null;
        foreach (var message in Messages())
        {
            if (message.Direction == CaptureDirection.HostToDevice)
            {
                if (command is not null)
                {
                    exchanges.Add(new CaptureExchange(command, null));
                }

                command = message;
            }
            else
            {
                exchanges.Add(new CaptureExchange(command, message));
                command = null;
            }
        }

        if (command is not null)
        {
            exchanges.Add(new CaptureExchange(command, null));
        }

        return exchanges;
    }

    private static void EnsureOrdered(IEnumerable<TimeSpan> offsets, string name)
    {
        var last = TimeSpan.Zero;
        foreach (var offset in offsets)
        {
            if (offset < last)
            {
                throw new ArgumentException("Offsets must not decrease.", name);
            }

            last = offset;
        }
    }
}
