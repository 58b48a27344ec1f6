using System.Diagnostics;
using System.Text;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Framing;
using BenchRunner.Instruments.Tests.Support;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Tests.Transports;

/// <summary>
/// Every scripted fault, seen through the framing layer over an in-memory pair with a scripted
/// instrument: each ends in a clear InstrumentException within the read's timeout, never a hang.
/// </summary>
public sealed class FaultInjectingTransportTests : IAsyncDisposable
{
    private static readonly TimeSpan ShortTimeout = TimeSpan.FromSeconds(1);
    private static readonly TimeSpan Slack = TimeSpan.FromSeconds(3);

    private readonly List<IAsyncDisposable> _cleanup = [];

    public async ValueTask DisposeAsync()
    {
        foreach (var item in _cleanup)
        {
            await item.DisposeAsync();
        }
    }

    [Fact]
    public async Task ReadLineAsync_StallForEver_TimesOutWithNothingReceived()
    {
        var (framed, faulty) = await ConnectAsync(new FaultScript().Stall(reply: 1));
        await framed.SendAsync("MEAS:CENT?", default);
        var clock = Stopwatch.StartNew();

        var error = await Assert.ThrowsAsync<InstrumentTimeoutException>(() => framed.ReadLineAsync(ShortTimeout, default).WaitAsync(Guard.Await));

        Assert.Contains("nothing came back", error.Message);
        Assert.InRange(clock.Elapsed, ShortTimeout - TimeSpan.FromMilliseconds(50), ShortTimeout + Slack);
        Assert.Equal(0, faulty.PendingFaults);
    }

    [Fact]
    public async Task ReadLineAsync_StallShorterThanTimeout_ReplyArrivesIntactAfterTheStall()
    {
        var (framed, _) = await ConnectAsync(new FaultScript().Stall(reply: 1, TimeSpan.FromMilliseconds(80)));
        await framed.SendAsync("MEAS:CENT?", default);
        var clock = Stopwatch.StartNew();

        var reply = await framed.ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.Equal("137.52e6", reply);
        Assert.True(clock.Elapsed >= TimeSpan.FromMilliseconds(70), $"the stall lasted only {clock.Elapsed}");
    }

    [Fact]
    public async Task ReadLineAsync_StallInMidReply_TimeoutCarriesTheBytesBeforeIt()
    {
        var (framed, _) = await ConnectAsync(new FaultScript().Stall(reply: 1, afterBytes: 5));
        await framed.SendAsync("MEAS:CENT?", default);

        var error = await Assert.ThrowsAsync<InstrumentTimeoutException>(() => framed.ReadLineAsync(ShortTimeout, default).WaitAsync(Guard.Await));

        Assert.Equal("137.5", error.Reply);
    }

    [Fact]
    public async Task ReadBlockAsync_GarbageInsideTheHeader_ThrowsFramingException()
    {
        var (framed, _) = await ConnectAsync(new FaultScript().Garbage(reply: 1, "\x15"u8, afterBytes: 1));
        await framed.SendAsync("TRACE?", default);

        var error = await Assert.ThrowsAsync<FramingException>(() => framed.ReadBlockAsync(ShortTimeout, default).WaitAsync(Guard.Await));

        Assert.Contains("expected a digit after '#'", error.Message);
        Assert.Contains("found \"#\\x15", error.Message);
    }

    [Fact]
    public async Task ReadLineAsync_GarbageBeforeTheReply_AppearsAtExactlyThatPlace()
    {
        var (framed, _) = await ConnectAsync(new FaultScript().Garbage(reply: 2, "~~"u8, afterBytes: 3));
        await framed.SendAsync("MEAS:CENT?", default);
        var first = await framed.ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await);
        await framed.SendAsync("MEAS:CENT?", default);

        var second = await framed.ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.Equal("137.52e6", first);
        Assert.Equal("137~~.52e6", second);
    }

    [Fact]
    public async Task ReadLineAsync_TruncatedReply_TimesOutWithThePartAndTheNextCommandWorks()
    {
        var (framed, _) = await ConnectAsync(new FaultScript().Truncate(reply: 1, afterBytes: 4));
        await framed.SendAsync("MEAS:CENT?", default);

        var error = await Assert.ThrowsAsync<InstrumentTimeoutException>(() => framed.ReadLineAsync(ShortTimeout, default).WaitAsync(Guard.Await));
        framed.DiscardBuffered();
        await framed.SendAsync("*OPC?", default);
        var next = await framed.ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.Equal("137.", error.Reply);
        Assert.Equal("1", next);
    }

    [Fact]
    public async Task ReadBlockAsync_TruncatedBlock_TimesOut()
    {
        var (framed, _) = await ConnectAsync(new FaultScript().Truncate(reply: 1, afterBytes: 400));
        await framed.SendAsync("TRACE?", default);

        var error = await Assert.ThrowsAsync<InstrumentTimeoutException>(() => framed.ReadBlockAsync(ShortTimeout, default).WaitAsync(Guard.Await));

        Assert.StartsWith("#3804", error.Reply);
    }

    [Fact]
    public async Task ReadLineAsync_DisconnectInMidReply_ThrowsFramingExceptionWithThePart()
    {
        var (framed, _) = await ConnectAsync(new FaultScript().Disconnect(reply: 1, afterBytes: 3));
        await framed.SendAsync("MEAS:CENT?", default);

        var error = await Assert.ThrowsAsync<FramingException>(() => framed.ReadLineAsync(ShortTimeout, default).WaitAsync(Guard.Await));

        Assert.Contains("closed in mid-reply", error.Message);
        Assert.Equal("137", error.Reply);
        Assert.True(error.IsTransient);
    }

    [Fact]
    public async Task ReadLineAsync_CablePulledInMidReply_ThrowsTransientInstrumentException()
    {
        var (framed, _) = await ConnectAsync(new FaultScript().Disconnect(reply: 1, afterBytes: 3, DisconnectStyle.IOError));
        await framed.SendAsync("MEAS:CENT?", default);

        var read = await Assert.ThrowsAsync<InstrumentException>(() => framed.ReadLineAsync(ShortTimeout, default).WaitAsync(Guard.Await));
        var write = await Assert.ThrowsAsync<InstrumentException>(() => framed.SendAsync("*OPC?", default).WaitAsync(Guard.Await));

        Assert.True(read.IsTransient);
        Assert.Contains("reading from memory (host end) (with injected faults) failed", read.Message);
        Assert.Equal("137", read.Reply);
        Assert.Contains("writing to", write.Message);
    }

    [Fact]
    public async Task ReadLineAsync_Babble_ThrowsFramingExceptionAtTheSizeLimit()
    {
        var (framed, _) = await ConnectAsync(new FaultScript().Babble(reply: 1, afterBytes: 2), new FramingOptions { MaxMessageBytes = 1024 });
        await framed.SendAsync("MEAS:CENT?", default);

        var error = await Assert.ThrowsAsync<FramingException>(() => framed.ReadLineAsync(ShortTimeout, default).WaitAsync(Guard.Await));

        Assert.Contains("grew past the limit of 1024 bytes", error.Message);
        Assert.StartsWith("13~babble~", error.Reply);
    }

    [Fact]
    public async Task ReadUntilPromptAsync_Babble_ThrowsFramingExceptionAtTheSizeLimit()
    {
        var options = new FramingOptions { MaxMessageBytes = 1024, Prompt = "rdy> " };
        var (framed, _) = await ConnectAsync(new FaultScript().Babble(reply: 1, pattern: "0\r"u8.ToArray()), options);
        await framed.SendAsync("MEAS:CENT?", default);

        var error = await Assert.ThrowsAsync<FramingException>(() => framed.ReadUntilPromptAsync(ShortTimeout, default).WaitAsync(Guard.Await));

        Assert.Contains("reply before the prompt grew past the limit", error.Message);
    }

    [Fact]
    public async Task ReadLineAsync_FaultScriptedForALaterReply_LeavesEarlierRepliesAlone()
    {
        var (framed, faulty) = await ConnectAsync(new FaultScript().Disconnect(reply: 3));
        await framed.SendAsync("MEAS:CENT?", default);
        var first = await framed.ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await);
        await framed.SendAsync("*OPC?", default);
        var second = await framed.ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await);

        Assert.Equal("137.52e6", first);
        Assert.Equal("1", second);
        Assert.Equal(1, faulty.PendingFaults);
    }

    [Fact]
    public async Task WriteAsync_FaultPositionNeverReached_IsSkippedAtTheNextWrite()
    {
        var (framed, faulty) = await ConnectAsync(new FaultScript().Truncate(reply: 1, afterBytes: 100));
        await framed.SendAsync("MEAS:CENT?", default);
        var reply = await framed.ReadLineAsync(Guard.Reply, default).WaitAsync(Guard.Await);
        await framed.SendAsync("*OPC?", default);

        Assert.Equal("137.52e6", reply);
        Assert.Equal(0, faulty.PendingFaults);
    }

    [Fact]
    public void Faults_AddedOutOfOrder_AreListedByPosition()
    {
        var script = new FaultScript().Babble(reply: 3).Stall(reply: 1, afterBytes: 9).Garbage(reply: 1, "x"u8, afterBytes: 2);

        Assert.Equal([FaultKind.Garbage, FaultKind.Stall, FaultKind.Babble], script.Faults.Select(f => f.Kind));
    }

    [Fact]
    public void FaultScript_InvalidPositions_AreRejected()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new FaultScript().Stall(reply: 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => new FaultScript().Truncate(reply: 1, afterBytes: -1));
        Assert.Throws<ArgumentOutOfRangeException>(() => new FaultScript().Stall(reply: 1, TimeSpan.FromSeconds(-1)));
        Assert.Throws<ArgumentException>(() => new FaultScript().Garbage(reply: 1, ReadOnlySpan<byte>.Empty));
    }

    private async Task<(FramedConnection Framed, FaultInjectingTransport Faulty)> ConnectAsync(FaultScript script, FramingOptions? options = null)
    {
        var (host, device) = InMemoryTransport.CreatePair();
        var faulty = new FaultInjectingTransport(host, script);
        await faulty.OpenAsync(default);
        await device.OpenAsync(default);
        var trace = new byte[804];
        new Random(24).NextBytes(trace);
        var block = Ieee488Block.Encode(trace).Concat("\n"u8.ToArray()).ToArray();
        var peer = new BytePeer(device, command => command switch
        {
            "MEAS:CENT?" => Encoding.ASCII.GetBytes("137.52e6\n"),
            "*OPC?" => "1\n"u8.ToArray(),
            "TRACE?" => block,
            _ => null,
        });
        _cleanup.Add(peer);
        _cleanup.Add(device);
        _cleanup.Add(faulty);
        return (new FramedConnection(faulty, options), faulty);
    }
}
