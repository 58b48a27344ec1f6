using System.Collections.Concurrent;
using System.Text;
using BenchRunner.Instruments.Framing;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Tests.Support;

/// <summary>
/// The device end of an in-memory connection, answering each command line with what a handler
/// returns: optionally the echo of the command, the reply lines (each ended with CR LF), and the
/// prompt. A handler returning null stays silent (for timeouts).
/// </summary>
internal sealed class ScriptedPeer : IAsyncDisposable
{
    private readonly InMemoryTransport _device;
    private readonly Func<string, IReadOnlyList<string>?> _handler;
    private readonly string? _prompt;
    private readonly bool _echo;
    private readonly CancellationTokenSource _stop = new();
    private readonly Task _loop;

    public ScriptedPeer(InMemoryTransport device, string commandEnd, Func<string, IReadOnlyList<string>?> handler, string? prompt = null, bool echo = false)
    {
        _device = device;
        _handler = handler;
        _prompt = prompt;
        _echo = echo;
        _loop = RunAsync(commandEnd);
    }

    /// <summary>Every command line received, in order.</summary>
    public ConcurrentQueue<string> Received { get; } = new();

    public async ValueTask DisposeAsync()
    {
        _stop.Cancel();
        try
        {
            await _loop.WaitAsync(TimeSpan.FromSeconds(10));
        }
        catch (OperationCanceledException)
        {
        }

        await _device.CloseAsync();
    }

    private async Task RunAsync(string commandEnd)
    {
        await _device.OpenAsync(CancellationToken.None);
        var reader = new FramedConnection(_device, new FramingOptions { ReadTerminator = commandEnd, WriteTerminator = "" });
        try
        {
            while (!_stop.IsCancellationRequested)
            {
                var line = await reader.ReadLineAsync(Timeout.InfiniteTimeSpan, _stop.Token);
                Received.Enqueue(line);
                var reply = _handler(line);
                if (reply is null)
                {
                    continue;
                }

                var text = new StringBuilder();
                if (_echo)
                {
                    text.Append(line).Append("\r\n");
                }

                foreach (var replyLine in reply)
                {
                    text.Append(replyLine).Append("\r\n");
                }

                text.Append(_prompt);
                await _device.WriteAsync(Encoding.Latin1.GetBytes(text.ToString()), _stop.Token);
            }
        }
        catch (OperationCanceledException)
        {
        }
        catch (Errors.FramingException)
        {
            // The host closed its end.
        }
    }
}
