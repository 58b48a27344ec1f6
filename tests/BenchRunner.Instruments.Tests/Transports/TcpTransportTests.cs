using System.Net;
using System.Net.Sockets;
using System.Text;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Framing;
using BenchRunner.Instruments.Tests.Support;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Tests.Transports;

public class TcpTransportTests
{
    [Fact]
    public async Task ReadLineAsync_LoopbackListener_ExchangesCommandAndReply()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        int port = ((IPEndPoint)listener.LocalEndpoint).Port;
        var server = Task.Run(async () =>
        {
            using var client = await listener.AcceptTcpClientAsync();
            var stream = client.GetStream();
            using var reader = new StreamReader(stream, Encoding.ASCII);
            var command = await reader.ReadLineAsync();
            var reply = command == "SENS:RBW?" ? "10000\n" : "-113,\"Undefined header\"\n";
            await stream.WriteAsync(Encoding.ASCII.GetBytes(reply));
            return command;
        });
        await using var tcp = new TcpTransport(new TcpSettings { Host = "127.0.0.1", Port = port });
        await tcp.OpenAsync(default).AsTask().WaitAsync(Guard.Await);
        var framed = new FramedConnection(tcp);

        await framed.SendAsync("SENS:RBW?", default).WaitAsync(Guard.Await);
        var reply = await framed.ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.Equal("10000", reply);
        Assert.Equal("SENS:RBW?", await server.WaitAsync(Guard.Await));
        Assert.Equal($"tcp 127.0.0.1:{port}", tcp.Description);
    }

    [Fact]
    public async Task ReadAsync_ServerClosesItsEnd_ReturnsZero()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        int port = ((IPEndPoint)listener.LocalEndpoint).Port;
        await using var tcp = new TcpTransport(new TcpSettings { Host = "127.0.0.1", Port = port });
        await tcp.OpenAsync(default).AsTask().WaitAsync(Guard.Await);
        using (var accepted = await listener.AcceptSocketAsync().WaitAsync(Guard.Await))
        {
            accepted.Shutdown(SocketShutdown.Both);
        }

        var n = await tcp.ReadAsync(new byte[8], default).AsTask().WaitAsync(Guard.Await);

        Assert.Equal(0, n);
    }

    [Fact]
    public async Task OpenAsync_NothingListening_ThrowsTransientErrorNamingHostAndPort()
    {
        int port = UnusedPort();
        await using var tcp = new TcpTransport(new TcpSettings { Host = "127.0.0.1", Port = port });

        var error = await Assert.ThrowsAsync<InstrumentException>(() => tcp.OpenAsync(default).AsTask().WaitAsync(Guard.Await));

        Assert.True(error.IsTransient);
        Assert.Contains($"127.0.0.1:{port}", error.Message);
        Assert.Contains("refused", error.Message);
        Assert.False(tcp.IsOpen);
    }

    [Fact]
    public async Task ReadAsync_ServerResetsTheConnection_ThrowsTransientErrorNamingHostAndPort()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        int port = ((IPEndPoint)listener.LocalEndpoint).Port;
        await using var tcp = new TcpTransport(new TcpSettings { Host = "127.0.0.1", Port = port });
        await tcp.OpenAsync(default).AsTask().WaitAsync(Guard.Await);
        var pending = tcp.ReadAsync(new byte[8], default).AsTask();
        using (var accepted = await listener.AcceptSocketAsync().WaitAsync(Guard.Await))
        {
            // A zero linger time makes close send RST instead of FIN.
            accepted.LingerState = new LingerOption(true, 0);
        }

        var error = await Assert.ThrowsAsync<InstrumentException>(() => pending.WaitAsync(Guard.Await));

        Assert.True(error.IsTransient);
        Assert.Contains($"127.0.0.1:{port}", error.Message);
        Assert.Contains("reset", error.Message);
        Assert.False(tcp.IsOpen);
    }

    [Fact]
    public async Task ReadAsync_Cancelled_ThrowsOperationCanceled()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        await using var tcp = new TcpTransport(new TcpSettings { Host = "127.0.0.1", Port = ((IPEndPoint)listener.LocalEndpoint).Port });
        await tcp.OpenAsync(default).AsTask().WaitAsync(Guard.Await);
        using var cts = new CancellationTokenSource(TimeSpan.FromMilliseconds(50));

        await Assert.ThrowsAnyAsync<OperationCanceledException>(() => tcp.ReadAsync(new byte[8], cts.Token).AsTask().WaitAsync(Guard.Await));
    }

    [Fact]
    public void Constructor_InvalidSettings_NamesEveryProblem()
    {
        var settings = new TcpSettings { Host = "", Port = 70000, ConnectTimeout = TimeSpan.Zero };

        var error = Assert.Throws<ArgumentException>(() => new TcpTransport(settings));

        Assert.Contains("host", error.Message);
        Assert.Contains("1 to 65535", error.Message);
        Assert.Contains("connect timeout", error.Message);
    }

    [Fact]
    public void Endpoint_IPv6Host_IsBracketed()
    {
        var settings = new TcpSettings { Host = "::1", Port = 5025 };

        Assert.Equal("[::1]:5025", settings.Endpoint);
    }

    private static int UnusedPort()
    {
        using var probe = new TcpListener(IPAddress.Loopback, 0);
        probe.Start();
        return ((IPEndPoint)probe.LocalEndpoint).Port;
    }
}
