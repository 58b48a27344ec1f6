using System.Globalization;
using System.Text;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Framing;

/// <summary>
/// Cuts messages out of a transport's byte stream: reply lines ending at a terminator, replies
/// ending at a prompt, and IEEE 488.2 blocks; discards the device's echo of each command; and
/// refuses any message longer than <see cref="FramingOptions.MaxMessageBytes"/>, so that a
/// babbling device cannot exhaust memory. Text is Latin-1: one character per byte.
/// Every read has a timeout (measured by the injected <see cref="TimeProvider"/>); a read that
/// runs out of time raises <see cref="InstrumentTimeoutException"/> carrying what did arrive.
/// Not safe for concurrent use: one command and its reply at a time.
/// </summary>
public sealed class FramedConnection
{
    private static readonly Encoding Latin1 = Encoding.Latin1;

    private readonly ITransport _transport;
    private readonly FramingOptions _options;
    private readonly TimeProvider _time;
    private readonly byte[] _readTerminator;
    private readonly byte[] _writeTerminator;
    private readonly byte[]? _prompt;
    private byte[] _buffer = new byte[4096];
    private int _count;
    private string? _expectedEcho;
    private bool _skipTerminatorAfterBlock;

    /// <summary>Creates a framing layer over <paramref name="transport"/>.</summary>
    /// <exception cref="ArgumentException">The options are invalid.</exception>
    public FramedConnection(ITransport transport, FramingOptions? options = null, TimeProvider? timeProvider = null)
    {
        ArgumentNullException.ThrowIfNull(transport);
        _transport = transport;
        _options = options ?? new FramingOptions();
        _options.Validate();
        _time = timeProvider ?? TimeProvider.System;
        _readTerminator = Latin1.GetBytes(_options.ReadTerminator);
        _writeTerminator = Latin1.GetBytes(_options.WriteTerminator);
        _prompt = _options.Prompt is null ? null : Latin1.GetBytes(_options.Prompt);
    }

    /// <summary>The transport underneath.</summary>
    public ITransport Transport => _transport;

    /// <summary>The framing rules in force.</summary>
    public FramingOptions Options => _options;

    /// <summary>How many received bytes are buffered and not yet returned.</summary>
    public int BufferedCount => _count;

    /// <summary>Writes <paramref name="command"/> followed by the write terminator.</summary>
    public async Task SendAsync(string command, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(command);
        var bytes = new byte[Latin1.GetByteCount(command) + _writeTerminator.Length];
        int n = Latin1.GetBytes(command, bytes);
        _writeTerminator.CopyTo(bytes, n);
        await WriteAsync(bytes, cancellationToken).ConfigureAwait(false);
        _expectedEcho = _options.Echo ? command : null;
    }

    /// <summary>Writes raw bytes with no terminator (binary uploads).</summary>
    public async Task SendRawAsync(ReadOnlyMemory<byte> data, CancellationToken cancellationToken) =>
        await WriteAsync(data, cancellationToken).ConfigureAwait(false);

    /// <summary>Reads one reply line, without its terminator (and without a CR before it).</summary>
    /// <exception cref="InstrumentTimeoutException">No complete line within <paramref name="timeout"/>.</exception>
    /// <exception cref="FramingException">Too long, or the connection closed in mid-reply.</exception>
    public Task<string> ReadLineAsync(TimeSpan timeout, CancellationToken cancellationToken) =>
        WithTimeout(timeout, cancellationToken, async token =>
        {
            while (true)
            {
                SkipTerminatorAfterBlock();
                int end = IndexOf(_readTerminator, 0);
                if (end >= 0)
                {
                    var line = TrimCarriageReturn(Take(end, _readTerminator.Length));
                    if (IsExpectedEcho(line))
                    {
                        continue;
                    }

                    return line;
                }

                EnsureWithinLimit("a reply line");
                await FillAsync(token).ConfigureAwait(false);
            }
        });

    /// <summary>
    /// Reads everything up to the device's prompt (which must stand at the start of a line) and
    /// returns it without the prompt, the echo and the final terminator. Lines are separated by
    /// the read terminator as the device sent them.
    /// </summary>
    /// <exception cref="InvalidOperationException">No prompt is configured.</exception>
    public Task<string> ReadUntilPromptAsync(TimeSpan timeout, CancellationToken cancellationToken)
    {
        var prompt = _prompt ?? throw new InvalidOperationException("No prompt is configured for this connection.");
        return WithTimeout(timeout, cancellationToken, async token =>
        {
            while (true)
            {
                int at = FindPrompt(prompt);
                if (at >= 0)
                {
                    var text = Take(at, prompt.Length);
                    text = StripEcho(text);
                    if (text.EndsWith(_options.ReadTerminator, StringComparison.Ordinal))
                    {
                        text = TrimCarriageReturn(text[..^_options.ReadTerminator.Length]);
                    }

                    return text;
                }

                EnsureWithinLimit("a reply before the prompt");
                await FillAsync(token).ConfigureAwait(false);
            }
        });
    }

    /// <summary>
    /// Reads one IEEE 488.2 block (§8.7.9 definite or §8.7.10 indefinite length) and returns its
    /// payload. Spaces and line ends before the <c>#</c> are skipped; a terminator right after a
    /// definite-length block is consumed.
    /// </summary>
    /// <exception cref="FramingException">A malformed header, a block over the size limit, or a closed connection.</exception>
    public Task<byte[]> ReadBlockAsync(TimeSpan timeout, CancellationToken cancellationToken) =>
        WithTimeout(timeout, cancellationToken, async token =>
        {
            if (_expectedEcho is not null)
            {
                await SkipEchoLineAsync(token).ConfigureAwait(false);
            }

            while (true)
            {
                int start = 0;
                while (start < _count && _buffer[start] is (byte)' ' or (byte)'\t' or (byte)'\r' or (byte)'\n')
                {
                    start++;
                }

                if (start > 0)
                {
                    Consume(start);
                    _skipTerminatorAfterBlock = false;
                }

                if (_count >= 1 && _buffer[0] != (byte)'#')
                {
                    throw new FramingException($"expected an IEEE 488.2 block starting with '#', found \"{InstrumentException.Printable(Peek(16))}\"");
                }

                if (_count >= 2)
                {
                    byte digit = _buffer[1];
                    if (digit < (byte)'0' || digit > (byte)'9')
                    {
                        throw new FramingException($"expected a digit after '#' in a block header, found \"{InstrumentException.Printable(Peek(16))}\"");
                    }

                    if (digit == (byte)'0')
                    {
                        int end = IndexOf(_readTerminator, 2);
                        if (end >= 0)
                        {
                            Consume(2);
                            return TakeBytes(end - 2, _readTerminator.Length);
                        }

                        EnsureWithinLimit("an indefinite-length block");
                    }
                    else
                    {
                        int digits = digit - '0';
                        if (_count >= 2 + digits)
                        {
                            var countText = Latin1.GetString(_buffer, 2, digits);
                            if (!long.TryParse(countText, NumberStyles.None, CultureInfo.InvariantCulture, out long length))
                            {
                                throw new FramingException($"the block header \"#{digits}{InstrumentException.Printable(countText)}\" does not give a byte count");
                            }

                            if (length > _options.MaxMessageBytes)
                            {
                                throw new FramingException($"the device announced a block of {length} bytes, more than the limit of {_options.MaxMessageBytes} bytes");
                            }

                            int header = 2 + digits;
                            if (_count >= header + length)
                            {
                                Consume(header);
                                var payload = TakeBytes((int)length, 0);
                                _skipTerminatorAfterBlock = true;
                                SkipTerminatorAfterBlock();
                                return payload;
                            }

                            EnsureCapacity(header + (int)length);
                        }
                    }
                }

                await FillAsync(token).ConfigureAwait(false);
            }
        });

    /// <summary>Drops every buffered byte and any expected echo (after a timeout or framing error).</summary>
    public void DiscardBuffered()
    {
        _count = 0;
        _expectedEcho = null;
        _skipTerminatorAfterBlock = false;
    }

    private async Task<T> WithTimeout<T>(TimeSpan timeout, CancellationToken cancellationToken, Func<CancellationToken, Task<T>> read)
    {
        using var timer = new CancellationTokenSource(timeout, _time);
        using var linked = CancellationTokenSource.CreateLinkedTokenSource(cancellationToken, timer.Token);
        try
        {
            return await read(linked.Token).ConfigureAwait(false);
        }
        catch (OperationCanceledException ex) when (timer.IsCancellationRequested && !cancellationToken.IsCancellationRequested)
        {
            throw new InstrumentTimeoutException($"no complete reply within {timeout.TotalMilliseconds:0} ms", ex)
            {
                Reply = Latin1.GetString(_buffer, 0, Math.Min(_count, 512)),
            };
        }
    }

    private async Task WriteAsync(ReadOnlyMemory<byte> data, CancellationToken cancellationToken)
    {
        try
        {
            await _transport.WriteAsync(data, cancellationToken).ConfigureAwait(false);
        }
        catch (IOException ex)
        {
            // A transport should raise InstrumentException itself; this catches one that does not.
            throw new InstrumentException($"writing to {_transport.Description} failed: {ex.Message}", isTransient: true, ex);
        }
    }

    private async Task FillAsync(CancellationToken token)
    {
        EnsureCapacity(_count + 1);
        int n;
        try
        {
            n = await _transport.ReadAsync(_buffer.AsMemory(_count), token).ConfigureAwait(false);
        }
        catch (IOException ex)
        {
            throw new InstrumentException($"reading from {_transport.Description} failed: {ex.Message}", isTransient: true, ex)
            {
                Reply = Latin1.GetString(_buffer, 0, Math.Min(_count, 512)),
            };
        }

        if (n == 0)
        {
            throw new FramingException(_count == 0
                ? "the connection was closed by the other end"
                : "the connection closed in mid-reply")
            {
                Reply = Latin1.GetString(_buffer, 0, Math.Min(_count, 512)),
            };
        }

        _count += n;
    }

    private async Task SkipEchoLineAsync(CancellationToken token)
    {
        while (IndexOf(_readTerminator, 0) < 0)
        {
            EnsureWithinLimit("an echoed command");
            await FillAsync(token).ConfigureAwait(false);
        }

        int end = IndexOf(_readTerminator, 0);
        var line = TrimCarriageReturn(Latin1.GetString(_buffer, 0, end));
        if (line == _expectedEcho)
        {
            Consume(end + _readTerminator.Length);
        }

        _expectedEcho = null;
    }

    private bool IsExpectedEcho(string line)
    {
        if (_expectedEcho is null)
        {
            return false;
        }

        bool echo = line == _expectedEcho;
        _expectedEcho = null;
        return echo;
    }

    private string StripEcho(string text)
    {
        if (_expectedEcho is null)
        {
            return text;
        }

        var echoLine = _expectedEcho;
        _expectedEcho = null;
        foreach (var candidate in new[] { echoLine + "\r" + _options.ReadTerminator, echoLine + _options.ReadTerminator })
        {
            if (text.StartsWith(candidate, StringComparison.Ordinal))
            {
                return text[candidate.Length..];
            }
        }

        return text == echoLine ? "" : text;
    }

    private void SkipTerminatorAfterBlock()
    {
        if (!_skipTerminatorAfterBlock || _count == 0)
        {
            return;
        }

        _skipTerminatorAfterBlock = false;
        if (_buffer[0] == (byte)'\r')
        {
            Consume(1);
        }

        if (_count >= _readTerminator.Length && _buffer.AsSpan(0, _readTerminator.Length).SequenceEqual(_readTerminator))
        {
            Consume(_readTerminator.Length);
        }
    }

    private int FindPrompt(byte[] prompt)
    {
        int from = 0;
        while (true)
        {
            int at = IndexOf(prompt, from);
            if (at < 0)
            {
                return -1;
            }

            if (at == 0 || _buffer[at - 1] == _readTerminator[^1])
            {
                return at;
            }

            from = at + 1;
        }
    }

    private int IndexOf(byte[] pattern, int from) =>
        from > _count ? -1 : _buffer.AsSpan(from, _count - from).IndexOf(pattern) is var i and >= 0 ? i + from : -1;

    private void EnsureWithinLimit(string what)
    {
        if (_count > _options.MaxMessageBytes)
        {
            var head = Latin1.GetString(_buffer, 0, 64);
            DiscardBuffered();
            throw new FramingException($"{what} grew past the limit of {_options.MaxMessageBytes} bytes without ending")
            {
                Reply = head,
            };
        }
    }

    private void EnsureCapacity(int needed)
    {
        if (needed <= _buffer.Length)
        {
            return;
        }

        int size = _buffer.Length;
        while (size < needed)
        {
            size *= 2;
        }

        // Never more than the limit plus room for a header and a terminator.
        size = Math.Min(size, _options.MaxMessageBytes + 64);
        size = Math.Max(size, needed);
        Array.Resize(ref _buffer, size);
    }

    private string Take(int length, int skipAfter) => Latin1.GetString(TakeBytes(length, skipAfter));

    private byte[] TakeBytes(int length, int skipAfter)
    {
        var bytes = _buffer.AsSpan(0, length).ToArray();
        Consume(length + skipAfter);
        return bytes;
    }

    private string Peek(int length) => Latin1.GetString(_buffer, 0, Math.Min(length, _count));

    private void Consume(int length)
    {
        Buffer.BlockCopy(_buffer, length, _buffer, 0, _count - length);
        _count -= length;
    }

    private static string TrimCarriageReturn(string line) =>
        line.EndsWith('\r') ? line[..^1] : line;
}
