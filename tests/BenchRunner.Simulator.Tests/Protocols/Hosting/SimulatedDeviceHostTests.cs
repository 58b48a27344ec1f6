using System.Text;
using BenchRunner.Instruments.Transports;
using BenchRunner.Simulator.Protocols.Hosting;
using BenchRunner.Simulator.Protocols.Scpi;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Protocols.Hosting;

public class SimulatedDeviceHostTests
{
    private readonly FakeSignalGenerator _generator = new();

    [Fact]
    public async Task ServeAsync_AnswersEachLine_EvenWhenItArrivesInPieces()
    {
        await using var served = ServedDevice.Start(SignalGeneratorScpiTree.CreateServer(_generator));

        await served.SendAsync("*ID");
        await served.SendAsync("N?\r");
        await served.SendAsync("\nSOUR:POW -20\n\nSOUR:POW?\n");

        Assert.Equal("benchrunner,sim-gen,SIM-GEN-0001,1.0\n", await served.ReadUntilAsync("1.0\n"));
        Assert.Equal("-20\n", await served.ReadUntilAsync("\n"));
    }

    [Fact]
    public async Task ServeAsync_PeerCloses_EndsAndClosesTheDeviceEnd()
    {
        var served = ServedDevice.Start(SignalGeneratorScpiTree.CreateServer(_generator));
        await served.SendAsync("OUTP ON\n");
        await served.Host.CloseAsync();

        Assert.Equal(DeviceSessionEnd.PeerClosed, await served.Serving.WaitAsync(TestLimits.Await));
        Assert.False(served.DeviceEnd.IsOpen);
        Assert.True(_generator.OutputOn);
        await served.DisposeAsync();
    }

    [Fact]
    public async Task ServeAsync_TokenFires_EndsAsStopped()
    {
        var (_, device) = InMemoryTransport.CreatePair();
        var host = new SimulatedDeviceHost(SignalGeneratorScpiTree.CreateServer(_generator));
        using var stop = new CancellationTokenSource();

        var serving = host.ServeAsync(device, stop.Token);
        await stop.CancelAsync();

        Assert.Equal(DeviceSessionEnd.Stopped, await serving.WaitAsync(TestLimits.Await));
        Assert.False(device.IsOpen);
    }

    [Fact]
    public async Task ServeAsync_OverlongLine_IsDiscardedAndReported_AndServingGoesOn()
    {
        var server = SignalGeneratorScpiTree.CreateServer(_generator);
        await using var served = ServedDevice.Start(server, new SimulatedDeviceHostOptions { MaxLineBytes = 64 });

        await served.SendAsync(new string('A', 10_000) + "\n");
        await served.SendAsync(":SOUR:POW -20;" + new string(' ', 64 - 15) + "\r\n");
        await served.SendAsync("SYST:ERR?;:SYST:ERR?;:SOUR:POW?\n");

        // The 64-byte line (with its CR dropped) is within the limit; the long one is -100 "Command error".
        var reply = await served.ReadUntilAsync("\n");
        Assert.Equal("-100,\"Command error;program message longer than 64 bytes\";0,\"No error\";-20\n", reply);
    }

    [Fact]
    public async Task ServeAsync_Garbage_NeverEndsTheSession()
    {
        await using var served = ServedDevice.Start(SignalGeneratorScpiTree.CreateServer(_generator));
        var random = new Random(137_500_000);
        var garbage = new byte[20_000];
        random.NextBytes(garbage);

        await served.Host.OpenAsync(CancellationToken.None);
        await served.Host.WriteAsync(garbage, CancellationToken.None);
        await served.SendAsync("\n*IDN?\n");

        // Whatever the garbage held, the device still answers; replies to queries hidden in it may come first.
        Assert.EndsWith("SIM-GEN-0001,1.0\n", await served.ReadUntilAsync("SIM-GEN-0001,1.0\n"));
        Assert.False(served.Serving.IsCompleted);
    }

    [Fact]
    public async Task ServeAsync_SeveralConnections_ShareOneInstrument()
    {
        var host = new SimulatedDeviceHost(SignalGeneratorScpiTree.CreateServer(_generator));
        using var stop = new CancellationTokenSource();
        var (hostA, deviceA) = InMemoryTransport.CreatePair("a");
        var (hostB, deviceB) = InMemoryTransport.CreatePair("b");
        var servingA = host.ServeAsync(deviceA, stop.Token);
        var servingB = host.ServeAsync(deviceB, stop.Token);
        await hostA.OpenAsync(CancellationToken.None);
        await hostB.OpenAsync(CancellationToken.None);

        await hostA.WriteAsync(Encoding.ASCII.GetBytes("SOUR:FREQ 137.5MHZ\n"), CancellationToken.None);
        await hostA.WriteAsync(Encoding.ASCII.GetBytes("*OPC?\n"), CancellationToken.None);
        var buffer = new byte[64];
        Assert.Equal("1\n", Encoding.ASCII.GetString(buffer, 0, await hostA.ReadAsync(buffer, CancellationToken.None).AsTask().WaitAsync(TestLimits.Await)));
        await hostB.WriteAsync(Encoding.ASCII.GetBytes("SOUR:FREQ?\n"), CancellationToken.None);

        Assert.Equal("137500000\n", Encoding.ASCII.GetString(buffer, 0, await hostB.ReadAsync(buffer, CancellationToken.None).AsTask().WaitAsync(TestLimits.Await)));
        await stop.CancelAsync();
        Assert.Equal([DeviceSessionEnd.Stopped, DeviceSessionEnd.Stopped], await Task.WhenAll(servingA, servingB).WaitAsync(TestLimits.Await));
    }

    [Fact]
    public async Task ServeAsync_ProtocolDefect_FaultsTheSessionAndClosesTheConnection()
    {
        var (host, device) = InMemoryTransport.CreatePair();
        var serving = new SimulatedDeviceHost(new BrokenProtocol()).ServeAsync(device, CancellationToken.None);
        await host.OpenAsync(CancellationToken.None);

        await host.WriteAsync(Encoding.ASCII.GetBytes("anything\n"), CancellationToken.None);

        await Assert.ThrowsAsync<NullReferenceException>(() => serving.WaitAsync(TestLimits.Await));
        Assert.False(device.IsOpen);
        Assert.Equal(0, await host.ReadAsync(new byte[8], CancellationToken.None).AsTask().WaitAsync(TestLimits.Await));
    }

    [Theory]
    [InlineData(63)]
    [InlineData(1024 * 1024 + 1)]
    public void Options_LineLimitOutsideItsRange_IsRefused(int limit)
    {
        var options = new SimulatedDeviceHostOptions { MaxLineBytes = limit };

        Assert.Throws<ArgumentException>(() => new SimulatedDeviceHost(SignalGeneratorScpiTree.CreateServer(_generator), options));
    }

    private sealed class BrokenProtocol : IDeviceProtocol
    {
        public CommandLineEnd LineEnd => CommandLineEnd.LineFeed;

        public byte[] Handle(string line) => throw new NullReferenceException("a defect in the model");

        public byte[] HandleOverlongLine(int limitBytes) => [];
    }
}
