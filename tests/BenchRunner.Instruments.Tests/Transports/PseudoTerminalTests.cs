using System.Text;
using BenchRunner.Instruments.Tests.Support;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Tests.Transports;

public class PseudoTerminalTests
{
    [LinuxFact]
    public async Task Open_OnLinux_GivesAnExistingSlaveDevice()
    {
        await using var pty = PseudoTerminal.Open();

        Assert.StartsWith("/dev/pts/", pty.SlavePath);
        Assert.True(File.Exists(pty.SlavePath));
        Assert.False(pty.IsHungUp);
    }

    [LinuxFact]
    public async Task HangUp_PendingDeviceRead_ReturnsZero()
    {
        var pty = PseudoTerminal.Open();
        await pty.DeviceEnd.OpenAsync(default);
        var pending = pty.DeviceEnd.ReadAsync(new byte[16], default).AsTask();

        pty.HangUp();

        Assert.Equal(0, await pending.WaitAsync(Guard.Await));
        Assert.True(pty.IsHungUp);
    }

    [LinuxFact]
    public async Task DeviceEnd_ReadCancelled_ThrowsOperationCanceled()
    {
        await using var pty = PseudoTerminal.Open();
        await pty.DeviceEnd.OpenAsync(default);
        using var cts = new CancellationTokenSource(TimeSpan.FromMilliseconds(50));

        await Assert.ThrowsAnyAsync<OperationCanceledException>(
            () => pty.DeviceEnd.ReadAsync(new byte[16], cts.Token).AsTask().WaitAsync(Guard.Await));
    }

    [LinuxFact]
    public async Task DeviceEnd_WritesBeforeTheHostOpens_ArriveUnechoedAndUnchanged()
    {
        await using var pty = PseudoTerminal.Open();
        await pty.DeviceEnd.OpenAsync(default);
        await pty.DeviceEnd.WriteAsync("ready\r\n"u8.ToArray(), default);
        await using var serial = new SerialTransport(new SerialSettings { PortPath = pty.SlavePath });
        await serial.OpenAsync(default);
        await serial.WriteAsync("ping\n"u8.ToArray(), default);

        // In raw mode nothing is echoed back to the device and CR LF is not translated.
        var received = await ReadExactlyAsync(pty.DeviceEnd, 5);

        Assert.Equal("ping\n", Encoding.ASCII.GetString(received));
    }

    [Fact]
    public void Open_OnOtherSystems_ThrowsPlatformNotSupported()
    {
        if (OperatingSystem.IsLinux())
        {
            using var pty = PseudoTerminal.Open();
            Assert.NotNull(pty.SlavePath);
            return;
        }

        Assert.Throws<PlatformNotSupportedException>(() => PseudoTerminal.Open());
    }

    internal static async Task<byte[]> ReadExactlyAsync(ITransport transport, int count)
    {
        var buffer = new byte[count];
        int total = 0;
        using var cts = new CancellationTokenSource(Guard.Await);
        while (total < count)
        {
            int n = await transport.ReadAsync(buffer.AsMemory(total), cts.Token);
            Assert.NotEqual(0, n);
            total += n;
        }

        return buffer;
    }
}
