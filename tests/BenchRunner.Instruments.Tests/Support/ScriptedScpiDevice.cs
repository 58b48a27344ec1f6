using System.Buffers.Binary;
using System.Globalization;
using System.Text;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Framing;
using BenchRunner.Instruments.Scpi;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Tests.Support;

/// <summary>
/// A small SCPI instrument for protocol tests, on the device end of an in-memory pair. It reads
/// one command per line, in order, like a real instrument: answers the common commands itself
/// (<c>*IDN?</c>, <c>*CLS</c>, <c>*OPC?</c>, <c>*RST</c>, <c>*ESR?</c>, <c>SYSTem:ERRor?</c>,
/// <c>FORMat:DATA</c>, <c>FORMat:BORDer</c>), answers other queries from a script, keeps an error
/// queue with overflow, reports -113 "Undefined header" for anything it was not told about, and can
/// be told to misbehave (stay silent, answer late, repeat an error for ever, send raw bytes).
/// </summary>
internal sealed class ScriptedScpiDevice : IAsyncDisposable
{
    private readonly InMemoryTransport _end;
    private readonly FramedConnection _framing;
    private readonly CancellationTokenSource _stop = new();
    private readonly object _lock = new();
    private readonly List<string> _received = [];
    private readonly List<byte[]> _sent = [];
    private readonly List<ScpiError> _errors = [];
    private readonly Dictionary<string, Func<string, Task<byte[]?>>> _script = new(StringComparer.OrdinalIgnoreCase);
    private readonly Dictionary<string, string> _settings = new(StringComparer.OrdinalIgnoreCase);
    private Task _loop = Task.CompletedTask;
    private int _eventStatus;

    private ScriptedScpiDevice(InMemoryTransport end)
    {
        _end = end;
        _framing = new FramedConnection(end);
    }

    /// <summary>The <c>*IDN?</c> reply.</summary>
    public string Identity { get; set; } = "Demo Bench Works,Virtual Analyser 2,0,1.0.3";

    /// <summary>The reply for an empty error queue.</summary>
    public string NoErrorReply { get; set; } = "+0,\"No error\"";

    /// <summary>How many entries the error queue holds before it overflows.</summary>
    public int ErrorQueueCapacity { get; set; } = 10;

    /// <summary>When set, <c>SYSTem:ERRor?</c> returns its oldest entry without removing it.</summary>
    public bool NeverEmptiesErrorQueue { get; set; }

    /// <summary>How long a sweep takes before <c>*OPC?</c> answers.</summary>
    public TimeSpan OpcDelay { get; set; }

    /// <summary>The data format last selected (SCPI's reset value is ASCii).</summary>
    public ScpiDataFormat Format { get; private set; } = ScpiDataFormat.Ascii;

    /// <summary>The byte order last selected (SCPI's reset value is NORMal).</summary>
    public ScpiByteOrder ByteOrder { get; private set; } = ScpiByteOrder.Normal;

    /// <summary>How many times <c>*RST</c> was received.</summary>
    public int Resets { get; private set; }

    /// <summary>Every command line received, in order.</summary>
    public IReadOnlyList<string> Received
    {
        get
        {
            lock (_lock)
            {
                return _received.ToList();
            }
        }
    }

    /// <summary>Every reply sent, as bytes, in order.</summary>
    public IReadOnlyList<byte[]> Sent
    {
        get
        {
            lock (_lock)
            {
                return _sent.ToList();
            }
        }
    }

    /// <summary>Starts a device on a new in-memory pair and returns it with the host end (not yet open).</summary>
    public static (ScriptedScpiDevice Device, InMemoryTransport Host) Start()
    {
        var (host, device) = InMemoryTransport.CreatePair("scripted scpi");
        device.OpenAsync(CancellationToken.None).AsTask().GetAwaiter().GetResult();
        var scripted = new ScriptedScpiDevice(device);
        scripted._loop = Task.Run(scripted.RunAsync);
        return (scripted, host);
    }

    /// <summary>The last argument received with a setting command accepted by <see cref="Accept"/>.</summary>
    public string? Setting(string header)
    {
        lock (_lock)
        {
            return _settings.GetValueOrDefault(header);
        }
    }

    /// <summary>Accepts these setting commands (by header), remembering each one's argument.</summary>
    public void Accept(params string[] headers)
    {
        foreach (var header in headers)
        {
            Script(header, argument =>
            {
                lock (_lock)
                {
                    _settings[header] = argument;
                }

                return Task.FromResult<byte[]?>(null);
            });
        }
    }

    /// <summary>Answers <paramref name="query"/> (a whole line, or a header) with a reply line.</summary>
    public void Answer(string query, string reply) => Script(query, _ => Task.FromResult<byte[]?>(Line(reply)));

    /// <summary>Answers <paramref name="query"/> with numbers, encoded in the data format and byte order selected at the time.</summary>
    public void AnswerNumbers(string query, Func<double[]> values) => Script(query, _ => Task.FromResult<byte[]?>(Encode(values())));

    /// <summary>Answers <paramref name="query"/> with exactly these bytes.</summary>
    public void AnswerRaw(string query, byte[] reply) => Script(query, _ => Task.FromResult<byte[]?>(reply));

    /// <summary>Takes <paramref name="query"/> without ever answering it.</summary>
    public void Silent(string query) => Script(query, _ => Task.FromResult<byte[]?>(null));

    /// <summary>
    /// Answers <paramref name="query"/> only when the returned source is completed; until then the
    /// device, like a real one busy with a command, handles nothing else.
    /// </summary>
    public TaskCompletionSource AnswerLate(string query, string reply)
    {
        var release = new TaskCompletionSource(TaskCreationOptions.RunContinuationsAsynchronously);
        Script(query, async _ =>
        {
            await release.Task.WaitAsync(_stop.Token).ConfigureAwait(false);
            return Line(reply);
        });
        return release;
    }

    /// <summary>Runs <paramref name="handler"/> on <paramref name="command"/>; it returns the reply bytes, or null for none.</summary>
    public void Script(string command, Func<string, Task<byte[]?>> handler)
    {
        lock (_lock)
        {
            _script[command] = handler;
        }
    }

    /// <summary>Puts an error on the queue; a full queue has its newest entry replaced by -350 (SCPI-1999).</summary>
    public void PushError(int code, string text)
    {
        lock (_lock)
        {
            if (_errors.Count < ErrorQueueCapacity)
            {
                _errors.Add(new ScpiError(code, text));
            }
            else
            {
                _errors[^1] = new ScpiError(ScpiError.QueueOverflowCode, "Queue overflow");
            }

            // Standard Event Status Register bits by error class: CME 32, EXE 16, DDE 8, QYE 4 (REFERENCES: IEEE 488.2).
            _eventStatus |= code switch
            {
                <= -100 and > -200 => 32,
                <= -200 and > -300 => 16,
                <= -300 and > -400 => 8,
                <= -400 and > -500 => 4,
                _ => 0,
            };
        }
    }

    public async ValueTask DisposeAsync()
    {
        await _stop.CancelAsync().ConfigureAwait(false);
        await _end.CloseAsync().ConfigureAwait(false);
        try
        {
            await _loop.WaitAsync(ScpiTestTimeouts.Limit).ConfigureAwait(false);
        }
        catch (OperationCanceledException)
        {
        }

        _stop.Dispose();
    }

    private static byte[] Line(string text) => Encoding.Latin1.GetBytes(text + "\n");

    private async Task RunAsync()
    {
        while (!_stop.IsCancellationRequested)
        {
            string line;
            try
            {
                line = await _framing.ReadLineAsync(TimeSpan.FromHours(1), _stop.Token).ConfigureAwait(false);
            }
            catch (Exception ex) when (ex is OperationCanceledException or InstrumentException or InvalidOperationException)
            {
                return;
            }

            lock (_lock)
            {
                _received.Add(line);
            }

            byte[]? reply;
            try
            {
                reply = await HandleAsync(line.Trim()).ConfigureAwait(false);
            }
            catch (OperationCanceledException)
            {
                return;
            }

            if (reply is null)
            {
                continue;
            }

            lock (_lock)
            {
                _sent.Add(reply);
            }

            try
            {
                await _end.WriteAsync(reply, _stop.Token).ConfigureAwait(false);
            }
            catch (Exception ex) when (ex is IOException or OperationCanceledException or InvalidOperationException)
            {
                return;
            }
        }
    }

    private async Task<byte[]?> HandleAsync(string line)
    {
        int space = line.IndexOf(' ');
        var header = space < 0 ? line : line[..space];
        var argument = space < 0 ? "" : line[(space + 1)..].Trim();

        Func<string, Task<byte[]?>>? scripted;
        lock (_lock)
        {
            if (!_script.TryGetValue(line, out scripted))
            {
                _script.TryGetValue(header, out scripted);
            }
        }

        if (scripted is not null)
        {
            return await scripted(argument).ConfigureAwait(false);
        }

        switch (header.ToUpperInvariant())
        {
            case "*IDN?":
                return Line(Identity);
            case "*CLS":
                lock (_lock)
                {
                    _errors.Clear();
                    _eventStatus = 0;
                }

                return null;
            case "*OPC?":
                if (OpcDelay > TimeSpan.Zero)
                {
                    await Task.Delay(OpcDelay, _stop.Token).ConfigureAwait(false);
                }

                return Line("1");
            case "*RST":
                Resets++;
                Format = ScpiDataFormat.Ascii;
                ByteOrder = ScpiByteOrder.Normal;
                return null;
            case "*ESR?":
                lock (_lock)
                {
                    var value = _eventStatus;
                    _eventStatus = 0;
                    return Line(value.ToString(CultureInfo.InvariantCulture));
                }

            case "SYSTEM:ERROR?" or "SYST:ERR?":
                return Line(NextError());
            case "FORMAT:DATA" or "FORM:DATA":
                SelectFormat(argument);
                return null;
            case "FORMAT:BORDER" or "FORM:BORD":
                SelectByteOrder(argument);
                return null;
            default:
                PushError(-113, "Undefined header");
                return null;
        }
    }

    private string NextError()
    {
        lock (_lock)
        {
            if (_errors.Count == 0)
            {
                return NoErrorReply;
            }

            var entry = _errors[0];
            if (!NeverEmptiesErrorQueue)
            {
                _errors.RemoveAt(0);
            }

            return entry.ToString();
        }
    }

    private void SelectFormat(string argument)
    {
        switch (argument.Replace(" ", "", StringComparison.Ordinal).ToUpperInvariant())
        {
            case "ASCII" or "ASC":
                Format = ScpiDataFormat.Ascii;
                break;
            case "REAL,32" or "REAL":
                Format = ScpiDataFormat.Real32;
                break;
            case "REAL,64":
                Format = ScpiDataFormat.Real64;
                break;
            default:
                // -224 "Illegal parameter value", SCPI-1999 Vol 2 §21.8 (from memory).
                PushError(-224, "Illegal parameter value");
                break;
        }
    }

    private void SelectByteOrder(string argument)
    {
        switch (argument.ToUpperInvariant())
        {
            case "NORMAL" or "NORM":
                ByteOrder = ScpiByteOrder.Normal;
                break;
            case "SWAPPED" or "SWAP":
                ByteOrder = ScpiByteOrder.Swapped;
                break;
            default:
                PushError(-224, "Illegal parameter value");
                break;
        }
    }

    private byte[] Encode(double[] values)
    {
        if (Format == ScpiDataFormat.Ascii)
        {
            return Line(string.Join(",", values.Select(v => v.ToString("R", CultureInfo.InvariantCulture))));
        }

        int size = Format == ScpiDataFormat.Real32 ? 4 : 8;
        var payload = new byte[values.Length * size];
        for (int i = 0; i < values.Length; i++)
        {
            var span = payload.AsSpan(i * size, size);
            switch (size, ByteOrder)
            {
                case (4, ScpiByteOrder.Normal): BinaryPrimitives.WriteSingleBigEndian(span, (float)values[i]); break;
                case (4, _): BinaryPrimitives.WriteSingleLittleEndian(span, (float)values[i]); break;
                case (_, ScpiByteOrder.Normal): BinaryPrimitives.WriteDoubleBigEndian(span, values[i]); break;
                default: BinaryPrimitives.WriteDoubleLittleEndian(span, values[i]); break;
            }
        }

        return [.. Ieee488Block.Encode(payload), (byte)'\n'];
    }
}
