using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Capture;

/// <summary>
/// Wraps a transport and writes everything that passes through it to a capture: each chunk
/// written and each chunk read, timed by the injected <see cref="TimeProvider"/>, and events
/// (opened, closed, closed by peer, cancelled or failed reads and writes). Otherwise it behaves
/// exactly like the transport it wraps: same description, same results, same exceptions.
/// A failure to write the capture itself (a full disk) surfaces as the writer's
/// <see cref="IOException"/>: a recording that silently stopped would be worse.
/// </summary>
public sealed class RecordingTransport : ITransport
{
    private readonly ITransport _inner;
    private readonly CaptureWriter _writer;
    private readonly TimeProvider _time;
    private readonly Lock _lock = new();
    private readonly long _startTimestamp;
    private readonly TimeSpan _startOffset;
    private bool _peerClosedNoted;

    /// <summary>Starts recording <paramref name="inner"/> into <paramref name="writer"/>.</summary>
    /// <param name="inner">The transport to record.</param>
    /// <param name="writer">Where to record; disposed with this transport.</param>
    /// <param name="timeProvider">The clock for chunk times; the system clock by default.</param>
    /// <remarks>
    /// Offsets are measured on the monotonic clock from the moment of construction, plus the time
    /// between the header's start and that moment, so they agree with <see cref="CaptureHeader.StartedUtc"/>.
    /// </remarks>
    public RecordingTransport(ITransport inner, CaptureWriter writer, TimeProvider? timeProvider = null)
    {
        ArgumentNullException.ThrowIfNull(inner);
        ArgumentNullException.ThrowIfNull(writer);
        _inner = inner;
        _writer = writer;
        _time = timeProvider ?? TimeProvider.System;
        _startTimestamp = _time.GetTimestamp();
        var sinceHeader = _time.GetUtcNow() - writer.Header.StartedUtc;
        _startOffset = sinceHeader > writer.LastOffset ? sinceHeader : writer.LastOffset;
    }

    /// <summary>The wrapped transport's description.</summary>
    public string Description => _inner.Description;

    /// <inheritdoc/>
    public bool IsOpen => _inner.IsOpen;

    /// <summary>The writer the session is recorded to.</summary>
    public CaptureWriter Writer => _writer;

    /// <summary>
    /// Records <paramref name="inner"/> into a new capture file at <paramref name="path"/>, whose
    /// header starts now and names the inner transport's description as the connection.
    /// </summary>
    /// <exception cref="IOException">The file exists (unless <paramref name="overwrite"/>) or cannot be written.</exception>
    public static RecordingTransport ToFile(
        ITransport inner,
        string path,
        string? instrument = null,
        string? note = null,
        TimeProvider? timeProvider = null,
        bool overwrite = false)
    {
        ArgumentNullException.ThrowIfNull(inner);
        var time = timeProvider ?? TimeProvider.System;
        var header = new CaptureHeader(time.GetUtcNow(), inner.Description, instrument, note);
        return new RecordingTransport(inner, CaptureWriter.Create(path, header, overwrite), time);
    }

    /// <inheritdoc/>
    public async ValueTask OpenAsync(CancellationToken cancellationToken)
    {
        bool wasOpen = _inner.IsOpen;
        try
        {
            await _inner.OpenAsync(cancellationToken).ConfigureAwait(false);
        }
        catch (Exception ex)
        {
            NoteFailure(ex is OperationCanceledException ? "open cancelled" : $"open failed: {Describe(ex)}");
            throw;
        }

        if (!wasOpen)
        {
            lock (_lock)
            {
                _peerClosedNoted = false;
            }

            Note("opened");
        }
    }

    /// <inheritdoc/>
    public async ValueTask WriteAsync(ReadOnlyMemory<byte> data, CancellationToken cancellationToken)
    {
        try
        {
            await _inner.WriteAsync(data, cancellationToken).ConfigureAwait(false);
        }
        catch (Exception ex)
        {
            NoteFailure(ex is OperationCanceledException ? "write cancelled" : $"write failed: {Describe(ex)}");
            throw;
        }

        Record(CaptureDirection.HostToDevice, data.Span);
    }

    /// <inheritdoc/>
    public async ValueTask<int> ReadAsync(Memory<byte> buffer, CancellationToken cancellationToken)
    {
        int count;
        try
        {
            count = await _inner.ReadAsync(buffer, cancellationToken).ConfigureAwait(false);
        }
        catch (Exception ex)
        {
            NoteFailure(ex is OperationCanceledException ? "read cancelled" : $"read failed: {Describe(ex)}");
            throw;
        }

        if (count > 0)
        {
            Record(CaptureDirection.DeviceToHost, buffer.Span[..count]);
        }
        else if (buffer.Length > 0)
        {
            // A host that keeps reading after the peer has gone would otherwise fill the capture with the same line.
            bool first;
            lock (_lock)
            {
                first = !_peerClosedNoted;
                _peerClosedNoted = true;
            }

            if (first)
            {
                Note("closed by peer");
            }
        }

        return count;
    }

    /// <inheritdoc/>
    public async ValueTask CloseAsync()
    {
        bool wasOpen = _inner.IsOpen;
        await _inner.CloseAsync().ConfigureAwait(false);
        if (wasOpen)
        {
            Note("closed");
        }
    }

    /// <summary>Disposes the wrapped transport, then the writer.</summary>
    public async ValueTask DisposeAsync()
    {
        try
        {
            if (_inner.IsOpen)
            {
                Note("closed");
            }

            await _inner.DisposeAsync().ConfigureAwait(false);
        }
        finally
        {
            _writer.Dispose();
        }
    }

    private void Record(CaptureDirection direction, ReadOnlySpan<byte> data)
    {
        // The time is taken under the lock so that concurrent reads and writes reach the file in time order.
        lock (_lock)
        {
            _writer.WriteChunk(Now(), direction, data);
        }
    }

    private void Note(string text)
    {
        lock (_lock)
        {
            _writer.WriteEvent(Now(), text);
        }
    }

    private void NoteFailure(string text)
    {
        try
        {
            Note(text);
        }
        catch (Exception ex) when (ex is IOException or ObjectDisposedException)
        {
            // The transport's own error is the one the caller must see; the capture simply lacks this line.
        }
    }

    private TimeSpan Now() => _startOffset + _time.GetElapsedTime(_startTimestamp);

    private static string Describe(Exception ex) => $"{ex.GetType().Name}: {ex.Message}";
}
