using System.Net;
using System.Net.Sockets;
using System.Text;

namespace BenchRunner.Cli.Tests.Support;

/// <summary>
/// A minimal SCPI device on a loopback TCP port: answers <c>*IDN?</c>, <c>*OPC?</c> and the
/// error query, ignores other commands. Serves connections one after another until disposed.
/// </summary>
internal sealed class LoopbackScpiDevice : IAsyncDisposable
{
    public const string Identity = "BENCHRUNNER,TEST-DEVICE,0042,1.2";

    private readonly TcpListener _listener = new(IPAddress.Loopback, 0);
    private readonly CancellationTokenSource _stop = new();
    private readonly Task _loop;

    public LoopbackScpiDevice()
    {
        _listener.Start();
        _loop = Task.Run(ServeAsync);
    }

    public int Port => ((IPEndPoint)_listener.LocalEndpoint).Port;

    public string Connection => $"tcp:127.0.0.1:{Port}";

    public async ValueTask DisposeAsync()
    {
        await _stop.CancelAsync();
        _listener.Stop();
        try
        {
            await _loop.WaitAsync(TimeSpan.FromSeconds(5));
        }
        catch (Exception ex) when (ex is OperationCanceledException or SocketException or ObjectDisposedException)
        {
            // Stopping the listener ends the loop with one of these.
        }

        _stop.Dispose();
    }

    private async Task ServeAsync()
    {
        while (!_stop.IsCancellationRequested)
        {
            using var client = await _listener.AcceptTcpClientAsync(_stop.Token);
            using var stream = client.GetStream();
            using var reader = new StreamReader(stream, Encoding.Latin1);
            while (await reader.ReadLineAsync(_stop.Token) is { } line)
            {
                string? reply = line.Trim().ToUpperInvariant() switch
                {
                    "*IDN?" => Identity,
                    "*OPC?" => "1",
                    var l when l.Contains("ERR") && l.EndsWith('?') => "+0,\"No error\"",
                    _ => null,
                };
                if (reply is not null)
                {
                    await stream.WriteAsync(Encoding.Latin1.GetBytes(reply + "\n"), _stop.Token);
                }
            }
        }
    }
}
