using System.Collections.Concurrent;
using System.Text;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Tests.Support;

/// <summary>
/// A fake instrument on the device end of a connection: reads LF-terminated commands and writes
/// whatever <c>respond</c> returns for each (nothing when it returns null).
/// </summary>
internal sealed class BytePeer : IAsyncDisposable
{
    private readonly ITransport _device;
    private readonly Func<string, byte[]?> _respond;
    private readonly CancellationTokenSource _stop = new();
    private readonly Task _loop;

    public BytePeer(ITransport device, Func<string, byte[]?> respond)
    {
        _device = device;
        _respond = respond;
        _loop = Task.Run(RunAsync);
    }

    /// <summary>The commands received so far, without terminators.</summary>
    public ConcurrentQueue<string> Received { get; } = new();

    /// <summary>Answers each command from a table of text replies; unknown commands get no reply.</summary>
    public static BytePeer WithReplies(ITransport device, IReadOnlyDictionary<string, string> replies) =>
        new(device, command => replies.TryGetValue(command, out var reply) ? Encoding.Latin1.GetBytes(reply) : null);

    public async ValueTask DisposeAsync()
    {
        _stop.Cancel();
        try
        {
            await _loop.WaitAsync(Guard.Await);
        }
        catch (Exception ex) when (ex is OperationCanceledException or IOException or InvalidOperationException)
        {
            // The loop ends by cancellation or because the connection closed.
        }

        _stop.Dispose();
    }

    private async Task RunAsync()
    {
        var line = new List<byte>();
        var buffer = new byte[256];
        while (!_stop.IsCancellationRequested)
        {
            int n = await _device.ReadAsync(buffer, _stop.Token);
            if (n == 0)
            {
                return;
            }

            for (int i = 0; i < n; i++)
            {
                byte b = buffer[i];
                if (b != (byte)'\n')
                {
                    line.Add(b);
                    continue;
                }

                var command = Encoding.Latin1.GetString(line.ToArray()).TrimEnd('\r');
                line.Clear();
                Received.Enqueue(command);
                if (_respond(command) is { } reply)
                {
                    await _device.WriteAsync(reply, _stop.Token);
                }
            }
        }
    }
}
