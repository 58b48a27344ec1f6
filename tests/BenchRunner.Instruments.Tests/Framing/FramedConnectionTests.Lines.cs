using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Framing;
using BenchRunner.Instruments.Tests.Support;

namespace BenchRunner.Instruments.Tests.Framing;

public partial class FramedConnectionTests
{
    [Fact]
    public async Task ReadLineAsync_CrLfTerminatedReply_DropsBothCharacters()
    {
        var (host, device) = await Connected.PairAsync();
        await device.SendAsync("137500000\r\n21400000\n");

        var first = await host.ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await);
        var second = await host.ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.Equal("137500000", first);
        Assert.Equal("21400000", second);
    }

    [Fact]
    public async Task ReadLineAsync_CrLfAsReadTerminator_KeepsBareLineFeedInsideTheLine()
    {
        var (host, device) = await Connected.PairAsync(new FramingOptions { ReadTerminator = "\r\n" });
        await device.SendAsync("PSF-24-0001\nPSF-24-0002\r\n");

        var line = await host.ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.Equal("PSF-24-0001\nPSF-24-0002", line);
    }

    [Fact]
    public async Task ReadLineAsync_LongerThanLimit_ThrowsFramingException()
    {
        var (host, device) = await Connected.PairAsync(new FramingOptions { MaxMessageBytes = 1024 });
        await device.SendAsync(new string('9', 2000));

        var error = await Assert.ThrowsAsync<FramingException>(() => host.ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await));

        Assert.Contains("reply line grew past the limit of 1024 bytes", error.Message);
        Assert.Equal(0, host.BufferedCount);
    }

    [Fact]
    public async Task ReadLineAsync_NoTerminatorInTime_TimeoutCarriesWhatArrived()
    {
        var (host, device) = await Connected.PairAsync();
        await device.SendAsync("-20.3");

        var error = await Assert.ThrowsAsync<InstrumentTimeoutException>(
            () => host.ReadLineAsync(TimeSpan.FromMilliseconds(100), default).WaitAsync(Guard.Await));

        Assert.Equal("-20.3", error.Reply);
        Assert.Contains("received \"-20.3\"", error.Message);
        Assert.True(error.IsTransient);
    }

    [Fact]
    public async Task ReadLineAsync_NothingInTime_TimeoutSaysNothingCameBack()
    {
        var (host, _) = await Connected.PairAsync();

        var error = await Assert.ThrowsAsync<InstrumentTimeoutException>(
            () => host.ReadLineAsync(TimeSpan.FromMilliseconds(50), default).WaitAsync(Guard.Await));

        Assert.Contains("nothing came back", error.Message);
    }

    [Fact]
    public async Task ReadLineAsync_DeviceEchoesCommand_EchoIsDiscarded()
    {
        var (host, device) = await Connected.PairAsync(new FramingOptions { Echo = true });
        await host.SendAsync("FREQ?", default);
        await device.SendAsync("FREQ?\r\n137500000\r\n");

        var reply = await host.ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.Equal("137500000", reply);
    }

    [Fact]
    public async Task ReadLineAsync_EchoExpectedButAbsent_FirstLineIsKept()
    {
        var (host, device) = await Connected.PairAsync(new FramingOptions { Echo = true });
        await host.SendAsync("FREQ?", default);
        await device.SendAsync("137500000\n");

        var reply = await host.ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.Equal("137500000", reply);
    }

    [Fact]
    public async Task ReadBlockAsync_DeviceEchoesCommand_EchoIsDiscarded()
    {
        var (host, device) = await Connected.PairAsync(new FramingOptions { Echo = true });
        await host.SendAsync("TRACE?", default);
        await device.SendAsync("TRACE?\r\n#14WXYZ\r\n");

        var payload = await host.ReadBlockAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.Equal("WXYZ"u8.ToArray(), payload);
    }

    [Fact]
    public async Task ReadUntilPromptAsync_MultiLineReply_ReturnsLinesWithoutPromptOrEcho()
    {
        var (host, device) = await Connected.PairAsync(new FramingOptions { Prompt = "rdy> ", Echo = true, ReadTerminator = "\n" });
        await host.SendAsync("scan", default);
        await device.SendAsync("scan\r\n136.0 -42.1\r\n137.5 -1.2\r\nrdy> ");

        var reply = await host.ReadUntilPromptAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.Equal("136.0 -42.1\r\n137.5 -1.2", reply);
    }

    [Fact]
    public async Task ReadUntilPromptAsync_PromptTextInsideALine_IsNotTakenForThePrompt()
    {
        var (host, device) = await Connected.PairAsync(new FramingOptions { Prompt = "rdy> " });
        await device.SendAsync("state rdy> ok\nrdy> ");

        var reply = await host.ReadUntilPromptAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.Equal("state rdy> ok", reply);
    }

    [Fact]
    public async Task ReadUntilPromptAsync_PromptSplitAcrossReads_IsFound()
    {
        var (host, device) = await Connected.PairAsync(new FramingOptions { Prompt = "rdy> " });
        await device.SendAsync("done\nrd");
        var pending = host.ReadUntilPromptAsync(Guard.Reply, default);
        await device.SendAsync("y> ");

        var reply = await pending.WaitAsync(Guard.Await);

        Assert.Equal("done", reply);
    }

    [Fact]
    public async Task ReadUntilPromptAsync_NoPromptConfigured_ThrowsInvalidOperation()
    {
        var (host, _) = await Connected.PairAsync();

        await Assert.ThrowsAsync<InvalidOperationException>(() => host.ReadUntilPromptAsync(Guard.Reply, default).WaitAsync(Guard.Await));
    }

    [Fact]
    public async Task ReadLineAsync_PeerClosesInMidReply_ThrowsFramingExceptionWithPartialReply()
    {
        var (host, device) = await Connected.PairAsync();
        await device.SendAsync("137.4");
        await device.CloseAsync();

        var error = await Assert.ThrowsAsync<FramingException>(() => host.ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await));

        Assert.Contains("closed in mid-reply", error.Message);
        Assert.Equal("137.4", error.Reply);
    }
}
