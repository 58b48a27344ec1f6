using System.Threading.Channels;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Capture;

/// <summary>
/// Stands in for the device of a recorded session. What the host writes is compared, as a byte
/// stream, with the recorded host-to-device chunks (so a command may be written in different
/// pieces than when it was recorded); once a recorded host chunk has been written in full, the
/// device-to-host chunks that followed it become readable, at once or at the recorded pace
/// (<see cref="ReplayOptions"/>). Device chunks recorded before any host chunk become readable
/// on the first open. When every chunk has been served, reads return 0 (the peer has closed)
/// and, in strict mode, writes fail with "the recording has ended". Events in the capture
/// are not acted on. Closing and reopening carries on where the replay was.
/// </summary>
public sealed class ReplayTransport : ITransport
{
    private readonly CapturedSession _session;
    private readonly ReplayOptions _options;
    private readonly TimeProvider _time;
    private readonly Lock _lock = new();
    private readonly Channel<Pending> _readable = Channel.CreateUnbounded<Pending>(new UnboundedChannelOptions { SingleReader = true });
    private readonly SemaphoreSlim _readLock = new(1, 1);
    private int _next;
    private int _matched;
    private bool _started;
    private Pending? _current;
    private int _currentOffset;

    /// <summary>Creates a replay of <paramref name="session"/>.</summary>
    /// <param name="session">The recording to serve.</param>
    /// <param name="options">Mode and pace; strict and as fast as possible by default.</param>
    /// <param name="timeProvider">The clock for the recorded pace; the system clock by default.</param>
    /// <exception cref="ArgumentException">The options are invalid.</exception>
    public ReplayTransport(CapturedSession session, ReplayOptions? options = null, TimeProvider? timeProvider = null)
    {
        ArgumentNullException.ThrowIfNull(session);
        _session = session;
        _options = options ?? new ReplayOptions();
        _options.Validate();
        _time = timeProvider ?? TimeProvider.System;
    }

    /// <summary>E.g. <c>replay of session.cap (memory (host end))</c>.</summary>
    public string Description => $"replay of {_session.SourceName} ({_session.Header.Connection})";

    /// <inheritdoc/>
    public bool IsOpen { get; private set; }

    /// <summary>The recording being served.</summary>
    public CapturedSession Session => _session;

    /// <summary>Whether every recorded chunk has been matched or made readable.</summary>
    public bool Finished
    {
        get
        {
            lock (_lock)
            {
                return _next >= _session.Chunks.Count;
            }
        }
    }

    /// <inheritdoc/>
    public ValueTask OpenAsync(CancellationToken cancellationToken)
    {
        cancellationToken.ThrowIfCancellationRequested();
        lock (_lock)
        {
            IsOpen = true;
            if (!_started)
            {
                _started = true;
                ReleaseDeviceChunks(reference: null);
            }
        }

        return ValueTask.CompletedTask;
    }

    /// <summary>Compares <paramref name="data"/> with the recording and moves the replay on.</summary>
    /// <exception cref="ReplayMismatchException">Strict mode, and the bytes differ or the recording has ended; nothing is consumed.</exception>
    /// <exception cref="InvalidOperationException">The transport is not open.</exception>
    public ValueTask WriteAsync(ReadOnlyMemory<byte> data, CancellationToken cancellationToken)
    {
        EnsureOpen();
        cancellationToken.ThrowIfCancellationRequested();
        if (data.IsEmpty)
        {
            return ValueTask.CompletedTask;
        }

        ReplayMismatch? mismatch;
        lock (_lock)
        {
            if (_options.Mode == ReplayMode.Strict)
            {
                mismatch = Match(data, apply: false);
                if (mismatch is not null)
                {
                    throw new ReplayMismatchException(mismatch);
                }
            }

            mismatch = Match(data, apply: true);
        }

        if (mismatch is not null)
        {
            _options.OnMismatch?.Invoke(mismatch);
        }

        return ValueTask.CompletedTask;
    }

    /// <summary>
    /// Waits until recorded device bytes are readable (at the recorded pace, if chosen) and reads
    /// them. Returns 0 once the whole recording has been served.
    /// </summary>
    /// <exception cref="InvalidOperationException">The transport is not open.</exception>
    public async ValueTask<int> ReadAsync(Memory<byte> buffer, CancellationToken cancellationToken)
    {
        EnsureOpen();
        if (buffer.Length == 0)
        {
            return 0;
        }

        await _readLock.WaitAsync(cancellationToken).ConfigureAwait(false);
        try
        {
            if (_current is null)
            {
                if (!await _readable.Reader.WaitToReadAsync(cancellationToken).ConfigureAwait(false))
                {
                    return 0;
                }

                _readable.Reader.TryRead(out _current);
                _currentOffset = 0;
            }

            var pending = _current!;
            while (pending.Remaining(_time) is var wait && wait > TimeSpan.Zero)
            {
                await Task.Delay(wait, _time, cancellationToken).ConfigureAwait(false);
            }

            int count = Math.Min(buffer.Length, pending.Data.Length - _currentOffset);
            pending.Data.Slice(_currentOffset, count).CopyTo(buffer);
            _currentOffset += count;
            if (_currentOffset == pending.Data.Length)
            {
                _current = null;
            }

            return count;
        }
        finally
        {
            _readLock.Release();
        }
    }

    /// <inheritdoc/>
    public ValueTask CloseAsync()
    {
        IsOpen = false;
        return ValueTask.CompletedTask;
    }

    /// <inheritdoc/>
    public ValueTask DisposeAsync() => CloseAsync();

    /// <summary>
    /// Walks <paramref name="data"/> along the recorded host chunks from the current position.
    /// With <paramref name="apply"/> false nothing changes; with it true the position moves on,
    /// device chunks are released as their host chunk completes, and (lenient mode) a differing
    /// write stands in for the rest of the chunk it was compared with.
    /// </summary>
    private ReplayMismatch? Match(ReadOnlyMemory<byte> data, bool apply)
    {
        var chunks = _session.Chunks;
        int next = _next;
        int matched = _matched;
        int position = 0;
        var span = data.Span;
        while (position < span.Length)
        {
            if (next >= chunks.Count)
            {
                if (apply)
                {
                    _next = next;
                    _matched = 0;
                }

                return new ReplayMismatch(_session.SourceName, null, chunks.Count, 0, data, position);
            }

            // Device chunks past the position are released as soon as a host chunk completes, so only
            // a dry run can meet one here.
            var chunk = chunks[next];
            if (chunk.Direction == CaptureDirection.DeviceToHost)
            {
                next++;
                continue;
            }

            var expected = chunk.Data.Span[matched..];
            int length = Math.Min(expected.Length, span.Length - position);
            int differ = expected[..length].CommonPrefixLength(span.Slice(position, length));
            if (differ < length)
            {
                var mismatch = new ReplayMismatch(_session.SourceName, chunk, next + 1, matched + differ, data, position + differ);
                if (apply)
                {
                    _next = next;
                    CompleteHostChunk();
                }

                return mismatch;
            }

            position += length;
            matched += length;
            if (matched == chunk.Length)
            {
                if (apply)
                {
                    _next = next;
                    CompleteHostChunk();
                    next = _next;
                }
                else
                {
                    next++;
                }

                matched = 0;
            }
        }

        if (apply)
        {
            _next = next;
            _matched = matched;
        }

        return null;
    }

    /// <summary>Marks the host chunk at the position as written and releases the device chunks after it.</summary>
    private void CompleteHostChunk()
    {
        var hostChunk = _session.Chunks[_next];
        _next++;
        _matched = 0;
        ReleaseDeviceChunks(hostChunk);
    }

    /// <summary>
    /// Makes the device chunks at the position readable, each due at its recorded delay after
    /// <paramref name="reference"/> (after the start of the recording when null), counted from now.
    /// </summary>
    private void ReleaseDeviceChunks(CaptureChunk? reference)
    {
        var chunks = _session.Chunks;
        long now = _time.GetTimestamp();
        var since = reference?.Offset ?? TimeSpan.Zero;
        while (_next < chunks.Count && chunks[_next].Direction == CaptureDirection.DeviceToHost)
        {
            var chunk = chunks[_next];
            var delay = _options.Pace == ReplayPace.Recorded ? chunk.Offset - since : TimeSpan.Zero;
            _readable.Writer.TryWrite(new Pending(chunk.Data, now, delay));
            _next++;
        }

        if (_next >= chunks.Count)
        {
            _readable.Writer.TryComplete();
        }
    }

    private void EnsureOpen()
    {
        if (!IsOpen)
        {
            throw new InvalidOperationException($"{Description} is not open.");
        }
    }

    private sealed record Pending(ReadOnlyMemory<byte> Data, long ReleasedAt, TimeSpan Delay)
    {
        public TimeSpan Remaining(TimeProvider time) => Delay - time.GetElapsedTime(ReleasedAt);
    }
}
