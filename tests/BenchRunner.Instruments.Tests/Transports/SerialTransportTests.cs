using System.Diagnostics;
using System.IO.Ports;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Framing;
using BenchRunner.Instruments.Tests.Support;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Tests.Transports;

/// <summary>The real serial-port library, opened on the slave of a pseudo-terminal.</summary>
public class SerialTransportTests
{
    [LinuxFact]
    public async Task ReadLineAsync_OverPseudoTerminal_ExchangesCommandAndReply()
    {
        await using var pty = PseudoTerminal.Open();
        await pty.DeviceEnd.OpenAsync(default);
        await using var peer = BytePeer.WithReplies(pty.DeviceEnd, new Dictionary<string, string>
        {
            ["*IDN?"] = "Workshop,PSF-Bench-Sim,PSF-24-0001,0.1\r\n",
            ["FREQ:CENT?"] = "137500000\r\n",
        });
        await using var serial = new SerialTransport(new SerialSettings { PortPath = pty.SlavePath });
        await serial.OpenAsync(default);
        var framed = new FramedConnection(serial);

        await framed.SendAsync("*IDN?", default).WaitAsync(Guard.Await);
        var identity = await framed.ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await);
        await framed.SendAsync("FREQ:CENT?", default).WaitAsync(Guard.Await);
        var centre = await framed.ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.Equal("Workshop,PSF-Bench-Sim,PSF-24-0001,0.1", identity);
        Assert.Equal("137500000", centre);
        Assert.Equal(["*IDN?", "FREQ:CENT?"], peer.Received.ToArray());
    }

    [LinuxFact]
    public async Task ReadBlockAsync_OverPseudoTerminal_PassesAll256ByteValues()
    {
        var everyByte = Enumerable.Range(0, 256).Select(i => (byte)i).ToArray();
        await using var pty = PseudoTerminal.Open();
        await pty.DeviceEnd.OpenAsync(default);
        await using var serial = new SerialTransport(new SerialSettings { PortPath = pty.SlavePath });
        await serial.OpenAsync(default);
        var framed = new FramedConnection(serial);

        // Device to host: a definite-length block holding every byte value, CR, LF and XON/XOFF included.
        await pty.DeviceEnd.WriteAsync(Ieee488Block.Encode(everyByte), default);
        await pty.DeviceEnd.WriteAsync("\n"u8.ToArray(), default);
        var payload = await framed.ReadBlockAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        // Host to device: the same bytes raw.
        await framed.SendRawAsync(everyByte, default).WaitAsync(Guard.Await);
        var received = await PseudoTerminalTests.ReadExactlyAsync(pty.DeviceEnd, 256);

        Assert.Equal(everyByte, payload);
        Assert.Equal(everyByte, received);
    }

    [LinuxFact]
    public async Task ReadAsync_PortVanishesUnderTheReader_ThrowsTransientErrorNamingThePort()
    {
        var pty = PseudoTerminal.Open();
        await using var serial = new SerialTransport(new SerialSettings { PortPath = pty.SlavePath });
        await serial.OpenAsync(default);
        var framed = new FramedConnection(serial);
        var pending = framed.ReadLineAsync(TimeSpan.FromSeconds(30), default);
        await Task.Delay(50);
        var clock = Stopwatch.StartNew();

        pty.HangUp();
        var error = await Assert.ThrowsAsync<InstrumentException>(() => pending.WaitAsync(Guard.Await));

        Assert.True(error.IsTransient);
        Assert.Contains(pty.SlavePath, error.Message);
        Assert.Contains("gone away", error.Message);
        Assert.True(clock.Elapsed < TimeSpan.FromSeconds(5), $"the loss took {clock.Elapsed} to be reported");
        Assert.False(serial.IsOpen);
    }

    [LinuxFact]
    public async Task WriteAsync_AfterThePortVanished_FailsAtOnceInsteadOfWaiting()
    {
        var pty = PseudoTerminal.Open();
        await using var serial = new SerialTransport(new SerialSettings { PortPath = pty.SlavePath });
        await serial.OpenAsync(default);
        pty.HangUp();
        var first = await Assert.ThrowsAsync<InstrumentException>(
            () => serial.WriteAsync("*OPC?\n"u8.ToArray(), default).AsTask().WaitAsync(Guard.Await));

        // The serial library stops serving requests after such a loss; these must not wait for ever.
        var second = await Assert.ThrowsAsync<InstrumentException>(
            () => serial.WriteAsync("*OPC?\n"u8.ToArray(), default).AsTask().WaitAsync(Guard.Await));
        var read = await Assert.ThrowsAsync<InstrumentException>(
            () => serial.ReadAsync(new byte[8], default).AsTask().WaitAsync(Guard.Await));
        await serial.CloseAsync().AsTask().WaitAsync(Guard.Await);

        Assert.All([first, second, read], e => Assert.Contains(pty.SlavePath, e.Message));
        Assert.All([first, second, read], e => Assert.True(e.IsTransient));
    }

    [LinuxFact]
    public async Task ReadAsync_PortClosedUnderTheReader_ThrowsClearErrorInsteadOfHanging()
    {
        await using var pty = PseudoTerminal.Open();
        var serial = new SerialTransport(new SerialSettings { PortPath = pty.SlavePath });
        await serial.OpenAsync(default);
        var pending = serial.ReadAsync(new byte[16], default).AsTask();
        await Task.Delay(50);

        await serial.CloseAsync();
        var error = await Assert.ThrowsAsync<InstrumentException>(() => pending.WaitAsync(Guard.Await));

        Assert.Contains("was closed during the operation", error.Message);
        Assert.Contains(pty.SlavePath, error.Message);
        Assert.False(error.IsTransient);
    }

    [LinuxFact]
    public async Task ReadAsync_Cancelled_ReturnsPromptlyAndThePortStillWorks()
    {
        await using var pty = PseudoTerminal.Open();
        await pty.DeviceEnd.OpenAsync(default);
        await using var serial = new SerialTransport(new SerialSettings { PortPath = pty.SlavePath });
        await serial.OpenAsync(default);
        using var cts = new CancellationTokenSource(TimeSpan.FromMilliseconds(100));
        var clock = Stopwatch.StartNew();

        await Assert.ThrowsAnyAsync<OperationCanceledException>(() => serial.ReadAsync(new byte[16], cts.Token).AsTask().WaitAsync(Guard.Await));
        var cancelledAfter = clock.Elapsed;
        await pty.DeviceEnd.WriteAsync("+1\n"u8.ToArray(), default);
        var line = await new FramedConnection(serial).ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.True(cancelledAfter < TimeSpan.FromSeconds(2), $"cancellation took {cancelledAfter}");
        Assert.Equal("+1", line);
    }

    [LinuxFact]
    public async Task OpenAsync_PortAlreadyOpenElsewhere_FailsBecauseOfTheLock()
    {
        await using var pty = PseudoTerminal.Open();
        await using var first = new SerialTransport(new SerialSettings { PortPath = pty.SlavePath });
        await using var second = new SerialTransport(new SerialSettings { PortPath = pty.SlavePath, BaudRate = 9600 });
        await first.OpenAsync(default);

        var error = await Assert.ThrowsAsync<InstrumentException>(() => second.OpenAsync(default).AsTask());
        await first.CloseAsync();
        await second.OpenAsync(default);

        Assert.Contains("already in use", error.Message);
        Assert.Contains(pty.SlavePath, error.Message);
        Assert.True(second.IsOpen);
    }

    [Fact]
    public async Task OpenAsync_MissingPort_ThrowsTransientErrorNamingThePort()
    {
        const string path = "/dev/ttyPSF-bench-missing-0";
        await using var serial = new SerialTransport(new SerialSettings { PortPath = path });

        var error = await Assert.ThrowsAsync<InstrumentException>(() => serial.OpenAsync(default).AsTask());

        Assert.Contains(path, error.Message);
        Assert.True(error.IsTransient);
        Assert.False(serial.IsOpen);
    }

    [LinuxFact]
    public async Task OpenAsync_AfterThePortCameBack_OpensAgain()
    {
        var pty = PseudoTerminal.Open();
        await using var serial = new SerialTransport(new SerialSettings { PortPath = pty.SlavePath });
        await serial.OpenAsync(default);
        pty.HangUp();
        await Assert.ThrowsAsync<InstrumentException>(() => serial.ReadAsync(new byte[4], default).AsTask().WaitAsync(Guard.Await));

        // The same path cannot come back here, so a new pair stands in for the replugged adapter.
        await using var replugged = PseudoTerminal.Open();
        var moved = new SerialTransport(new SerialSettings { PortPath = replugged.SlavePath });
        await moved.OpenAsync(default);
        await serial.CloseAsync();

        Assert.True(moved.IsOpen);
        Assert.False(serial.IsOpen);
        await moved.CloseAsync();
    }

    [Fact]
    public void Constructor_InvalidSettings_NamesEveryProblem()
    {
        var settings = new SerialSettings { PortPath = "/dev/ttyUSB0", BaudRate = 10, DataBits = 9, StopBits = StopBits.OnePointFive };

        var error = Assert.Throws<ArgumentException>(() => new SerialTransport(settings));

        Assert.Contains("baud rate", error.Message);
        Assert.Contains("data bits", error.Message);
        Assert.Contains("stop bits", error.Message);
    }

    [Fact]
    public void Description_DefaultSettings_ShowsEightNoneOne()
    {
        var serial = new SerialTransport(new SerialSettings { PortPath = "/dev/ttyUSB0" });

        // 8N1 at 115200 is the documented default.
        Assert.Equal("serial /dev/ttyUSB0 115200 8N1", serial.Description);
        Assert.True(serial.Settings.Dtr);
        Assert.True(serial.Settings.Rts);
        Assert.Equal(Handshake.None, serial.Settings.Handshake);
    }
}
