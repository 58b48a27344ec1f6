namespace BenchRunner.Instruments.Transports;

/// <summary>
/// Wraps a transport and spoils what is read from it according to a <see cref="FaultScript"/>:
/// stalls, garbage, truncated replies, disconnects and babble. For tests and for demonstrating
/// how the layers above recover. Writes pass through unchanged (each one starts a new reply)
/// until a scripted disconnect. Stalls are timed by the injected <see cref="TimeProvider"/>.
/// Like the transports it wraps, it serves one reader at a time.
/// </summary>
public sealed class FaultInjectingTransport : ITransport
{
    private readonly ITransport _inner;
    private readonly TimeProvider _time;
    private readonly Queue<ScriptedFault> _pending;
    private readonly Queue<byte> _injected = new();
    private int _reply;
    private int _replyBytes;
    private bool _dropping;
    private DisconnectStyle? _disconnected;
    private byte[]? _babble;
    private int _babbleOffset;

    /// <summary>Creates the wrapper.</summary>
    /// <param name="inner">The transport whose read stream is spoiled; opened and closed through this wrapper.</param>
    /// <param name="script">The faults, in the order they happen.</param>
    /// <param name="timeProvider">The clock for stalls; the system clock by default.</param>
    public FaultInjectingTransport(ITransport inner, FaultScript script, TimeProvider? timeProvider = null)
    {
        ArgumentNullException.ThrowIfNull(inner);
        ArgumentNullException.ThrowIfNull(script);
        _inner = inner;
        _time = timeProvider ?? TimeProvider.System;
        _pending = new Queue<ScriptedFault>(script.Faults);
        Description = $"{inner.Description} (with injected faults)";
    }

    /// <inheritdoc/>
    public string Description { get; }

    /// <inheritdoc/>
    public bool IsOpen => _inner.IsOpen;

    /// <summary>How many scripted faults have not happened (or been skipped) yet.</summary>
    public int PendingFaults => _pending.Count;

    /// <inheritdoc/>
    public ValueTask OpenAsync(CancellationToken cancellationToken) => _inner.OpenAsync(cancellationToken);

    /// <inheritdoc/>
    /// <exception cref="IOException">After a disconnect in the <see cref="DisconnectStyle.IOError"/> style.</exception>
    public ValueTask WriteAsync(ReadOnlyMemory<byte> data, CancellationToken cancellationToken)
    {
        if (_disconnected is not null)
        {
            throw new IOException($"{Description}: the connection was broken (injected fault).");
        }

        _reply++;
        _replyBytes = 0;
        _dropping = false;
        while (_pending.TryPeek(out var fault) && fault.Reply < _reply)
        {
            _pending.Dequeue();
        }

        return _inner.WriteAsync(data, cancellationToken);
    }

    /// <inheritdoc/>
    public async ValueTask<int> ReadAsync(Memory<byte> buffer, CancellationToken cancellationToken)
    {
        if (buffer.IsEmpty)
        {
            return 0;
        }

        while (true)
        {
            cancellationToken.ThrowIfCancellationRequested();
            if (_disconnected is { } style)
            {
                return style == DisconnectStyle.EndOfStream
                    ? 0
                    : throw new IOException($"{Description}: the connection was broken (injected fault).");
            }

            if (_injected.Count > 0)
            {
                int count = Math.Min(buffer.Length, _injected.Count);
                for (int i = 0; i < count; i++)
                {
                    buffer.Span[i] = _injected.Dequeue();
                }

                return count;
            }

            if (_babble is { } pattern)
            {
                var span = buffer.Span;
                for (int i = 0; i < span.Length; i++)
                {
                    span[i] = pattern[_babbleOffset];
                    _babbleOffset = (_babbleOffset + 1) % pattern.Length;
                }

                return span.Length;
            }

            if (_pending.TryPeek(out var fault) && fault.Reply == _reply && fault.AfterBytes <= _replyBytes)
            {
                _pending.Dequeue();
                await StartAsync(fault, cancellationToken).ConfigureAwait(false);
                continue;
            }

            // Stop short of the next fault's position so that it happens at exactly that byte.
            int room = buffer.Length;
            if (fault is not null && fault.Reply == _reply)
            {
                room = Math.Min(room, fault.AfterBytes - _replyBytes);
            }

            int read = await _inner.ReadAsync(buffer[..room], cancellationToken).ConfigureAwait(false);
            if (read == 0 || !_dropping)
            {
                _replyBytes += read;
                return read;
            }
        }
    }

    /// <inheritdoc/>
    public ValueTask CloseAsync() => _inner.CloseAsync();

    /// <inheritdoc/>
    public ValueTask DisposeAsync() => _inner.DisposeAsync();

    private async Task StartAsync(ScriptedFault fault, CancellationToken cancellationToken)
    {
        switch (fault.Kind)
        {
            case FaultKind.Stall:
                await Task.Delay(fault.Duration ?? Timeout.InfiniteTimeSpan, _time, cancellationToken).ConfigureAwait(false);
                break;
            case FaultKind.Garbage:
                foreach (var b in fault.Bytes)
                {
                    _injected.Enqueue(b);
                }

                break;
            case FaultKind.Truncate:
                _dropping = true;
                break;
            case FaultKind.Disconnect:
                _disconnected = fault.Style;
                break;
            case FaultKind.Babble:
                _babble = fault.Bytes;
                _babbleOffset = 0;
                break;
        }
    }
}
