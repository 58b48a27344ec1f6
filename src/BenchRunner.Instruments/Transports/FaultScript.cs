namespace BenchRunner.Instruments.Transports;

/// <summary>
/// The faults a <see cref="FaultInjectingTransport"/> injects, built fluently:
/// <code>new FaultScript().Stall(reply: 2, TimeSpan.FromSeconds(3)).Truncate(reply: 4, afterBytes: 10)</code>
/// Replies are counted by writes: reply n is everything read after the n-th write and before the
/// next. A fault's position counts only the device's genuine bytes, not injected ones. Faults at
/// the same position happen in the order they were added; a fault whose position is never
/// reached (a shorter reply) is skipped.
/// </summary>
public sealed class FaultScript
{
    private static readonly byte[] DefaultBabble = "~babble~"u8.ToArray();

    private readonly List<ScriptedFault> _faults = [];

    /// <summary>The faults in the order they will happen.</summary>
    public IReadOnlyList<ScriptedFault> Faults =>
        _faults.Select((f, i) => (f, i)).OrderBy(x => x.f.Reply).ThenBy(x => x.f.AfterBytes).ThenBy(x => x.i).Select(x => x.f).ToList();

    /// <summary>
    /// No bytes for <paramref name="duration"/> (null: until the waiting read is cancelled, e.g. by its
    /// timeout); bytes arriving meanwhile are held and delivered after.
    /// </summary>
    public FaultScript Stall(int reply, TimeSpan? duration = null, int afterBytes = 0)
    {
        if (duration is { } d && d < TimeSpan.Zero)
        {
            throw new ArgumentOutOfRangeException(nameof(duration), duration, "A stall cannot last a negative time.");
        }

        return Add(new(FaultKind.Stall, reply, afterBytes, duration, [], DisconnectStyle.EndOfStream));
    }

    /// <summary>Inserts <paramref name="bytes"/> into the read stream.</summary>
    public FaultScript Garbage(int reply, ReadOnlySpan<byte> bytes, int afterBytes = 0)
    {
        if (bytes.IsEmpty)
        {
            throw new ArgumentException("Garbage needs at least one byte.", nameof(bytes));
        }

        return Add(new(FaultKind.Garbage, reply, afterBytes, null, bytes.ToArray(), DisconnectStyle.EndOfStream));
    }

    /// <summary>Delivers <paramref name="afterBytes"/> bytes of the reply and drops the rest, up to the next write.</summary>
    public FaultScript Truncate(int reply, int afterBytes) =>
        Add(new(FaultKind.Truncate, reply, afterBytes, null, [], DisconnectStyle.EndOfStream));

    /// <summary>The connection goes away after <paramref name="afterBytes"/> bytes of the reply; it stays gone.</summary>
    public FaultScript Disconnect(int reply, int afterBytes = 0, DisconnectStyle style = DisconnectStyle.EndOfStream) =>
        Add(new(FaultKind.Disconnect, reply, afterBytes, null, [], style));

    /// <summary>From that point on, every read is filled with <paramref name="pattern"/> repeated (default <c>~babble~</c>, no line end).</summary>
    public FaultScript Babble(int reply, int afterBytes = 0, byte[]? pattern = null)
    {
        if (pattern is { Length: 0 })
        {
            throw new ArgumentException("A babble pattern needs at least one byte.", nameof(pattern));
        }

        return Add(new(FaultKind.Babble, reply, afterBytes, null, pattern ?? DefaultBabble, DisconnectStyle.EndOfStream));
    }

    private FaultScript Add(ScriptedFault fault)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(fault.Reply, 1, "reply");
        ArgumentOutOfRangeException.ThrowIfNegative(fault.AfterBytes, "afterBytes");
        _faults.Add(fault);
        return this;
    }
}
