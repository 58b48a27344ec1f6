using System.Threading.Channels;

namespace BenchRunner.Instruments.Transports;

/// <summary>One direction of an in-memory connection: chunks written, bytes read in order.</summary>
internal sealed class ByteChannel
{
    private readonly Channel<byte[]> _chunks = Channel.CreateUnbounded<byte[]>(new UnboundedChannelOptions { SingleReader = true });
    private readonly SemaphoreSlim _readLock = new(1, 1);
    private byte[]? _pending;
    private int _offset;

    public void Write(ReadOnlySpan<byte> data)
    {
        if (data.Length > 0 && !_chunks.Writer.TryWrite(data.ToArray()))
        {
            throw new IOException("The in-memory connection is closed.");
        }
    }

    public void Complete() => _chunks.Writer.TryComplete();

    public async ValueTask<int> ReadAsync(Memory<byte> buffer, CancellationToken cancellationToken)
    {
        if (buffer.Length == 0)
        {
            return 0;
        }

        await _readLock.WaitAsync(cancellationToken).ConfigureAwait(false);
        try
        {
            if (_pending is null)
            {
                if (!await _chunks.Reader.WaitToReadAsync(cancellationToken).ConfigureAwait(false))
                {
                    return 0;
                }

                _chunks.Reader.TryRead(out _pending);
                _offset = 0;
            }

            int count = Math.Min(buffer.Length, _pending!.Length - _offset);
            _pending.AsMemory(_offset, count).CopyTo(buffer);
            _offset += count;
            if (_offset == _pending.Length)
            {
                _pending = null;
            }

            return count;
        }
        finally
        {
            _readLock.Release();
        }
    }
}
