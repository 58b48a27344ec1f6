using System.Runtime.InteropServices;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Transports.Unix;

namespace BenchRunner.Instruments.Transports;

/// <summary>
/// The master side of a <see cref="PseudoTerminal"/> as a transport. A dedicated thread polls the
/// descriptor and queues what arrives, so reads are ordinary awaitable channel reads that honour
/// cancellation at once; writes go straight to the non-blocking descriptor and wait in short
/// poll slices only when the line's buffer is full.
/// </summary>
internal sealed class PseudoTerminalDeviceEnd : ITransport
{
    // Upper bound on how long the pump takes to notice a hang-up, and a waiting write to notice cancellation.
    private const int PollSliceMilliseconds = 20;

    private readonly SafeFd _master;
    private readonly Action _hangUp;
    private readonly ByteChannel _incoming = new();
    private readonly Thread _pump;
    private volatile bool _stopping;
    private volatile bool _closed;

    public PseudoTerminalDeviceEnd(SafeFd master, string description, Action hangUp)
    {
        _master = master;
        _hangUp = hangUp;
        Description = description;
        _pump = new Thread(Pump) { IsBackground = true, Name = "pty pump" };
        _pump.Start();
    }

    public string Description { get; }

    public bool IsOpen { get; private set; }

    public ValueTask OpenAsync(CancellationToken cancellationToken)
    {
        if (_closed || _stopping)
        {
            throw new InstrumentException($"{Description} was hung up and cannot be reopened.", isTransient: false);
        }

        IsOpen = true;
        return ValueTask.CompletedTask;
    }

    public async ValueTask WriteAsync(ReadOnlyMemory<byte> data, CancellationToken cancellationToken)
    {
        EnsureOpen();
        var bytes = data.ToArray();
        int offset = 0;
        while (offset < bytes.Length)
        {
            cancellationToken.ThrowIfCancellationRequested();
            nint written = WriteOnce(bytes, offset);
            if (written > 0)
            {
                offset += (int)written;
                continue;
            }

            // The line's buffer is full: the host is not reading. Wait off the caller's thread.
            await Task.Run(() => WaitWritable(cancellationToken), cancellationToken).ConfigureAwait(false);
        }
    }

    public ValueTask<int> ReadAsync(Memory<byte> buffer, CancellationToken cancellationToken)
    {
        EnsureOpen();
        return _incoming.ReadAsync(buffer, cancellationToken);
    }

    public ValueTask CloseAsync()
    {
        IsOpen = false;
        _closed = true;
        _hangUp();
        return ValueTask.CompletedTask;
    }

    public ValueTask DisposeAsync() => CloseAsync();

    /// <summary>Stops the pump before the descriptors close; reads then return 0.</summary>
    internal void Stop()
    {
        _stopping = true;
        if (Thread.CurrentThread != _pump)
        {
            _pump.Join();
        }

        _incoming.Complete();
    }

    private nint WriteOnce(byte[] bytes, int offset)
    {
        nint result;
        try
        {
            result = Libc.write(_master, ref bytes[offset], bytes.Length - offset);
        }
        catch (ObjectDisposedException ex)
        {
            throw HungUp(ex);
        }

        if (result >= 0)
        {
            return result;
        }

        int errno = Marshal.GetLastPInvokeError();
        if (errno is Libc.EAGAIN or Libc.EINTR)
        {
            return 0;
        }

        throw new InstrumentException($"{Description}: write failed: {Libc.Describe(errno)}", isTransient: true);
    }

    private void WaitWritable(CancellationToken cancellationToken)
    {
        while (true)
        {
            cancellationToken.ThrowIfCancellationRequested();
            int ready;
            try
            {
                ready = Libc.PollOne(_master, Libc.POLLOUT, PollSliceMilliseconds, out _);
            }
            catch (ObjectDisposedException ex)
            {
                throw HungUp(ex);
            }

            if (ready != 0)
            {
                return;
            }
        }
    }

    private void Pump()
    {
        var buffer = new byte[4096];
        try
        {
            while (!_stopping)
            {
                int ready = Libc.PollOne(_master, Libc.POLLIN, PollSliceMilliseconds, out short revents);
                if (ready == 0 || (ready < 0 && Marshal.GetLastPInvokeError() == Libc.EINTR))
                {
                    continue;
                }

                if (ready < 0 || (revents & (Libc.POLLERR | Libc.POLLNVAL)) != 0)
                {
                    break;
                }

                nint count = Libc.read(_master, ref buffer[0], buffer.Length);
                if (count > 0)
                {
                    _incoming.Write(buffer.AsSpan(0, (int)count));
                }
                else if (count == 0 || Marshal.GetLastPInvokeError() is not (Libc.EAGAIN or Libc.EINTR))
                {
                    break;
                }
            }
        }
        catch (ObjectDisposedException)
        {
            // Hung up while polling.
        }

        _incoming.Complete();
    }

    private InstrumentException HungUp(Exception inner) =>
        new($"{Description} has been hung up.", isTransient: false, inner);

    private void EnsureOpen()
    {
        if (!IsOpen)
        {
            throw new InvalidOperationException($"{Description} is not open.");
        }
    }
}
