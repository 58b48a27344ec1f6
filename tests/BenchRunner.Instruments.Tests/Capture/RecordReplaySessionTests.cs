using System.Text;
using BenchRunner.Instruments.Capture;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Framing;
using BenchRunner.Instruments.Transports;
using BenchRunner.Instruments.Tests.Support;

namespace BenchRunner.Instruments.Tests.Capture;

public sealed class RecordReplaySessionTests
{
    private const string Identity = "Workshop,PSF-Sim,PSF-24-0001,0.1";
    private static readonly TimeSpan Timeout = TimeSpan.FromSeconds(10);
    private static readonly byte[] AllByteValues = Enumerable.Range(0, 256).Select(b => (byte)b).ToArray();

    [Fact]
    public async Task RecordedSession_ReplayedThroughFramedConnection_GivesTheSameRepliesByteForByte()
    {
        var clock = new ManualTimeProvider();
        var captureStream = new MemoryStream();
        var (host, device) = InMemoryTransport.CreatePair("bench");
        var deviceTask = ScriptedDevice.RunAsync(device, Answer);
        var writer = new CaptureWriter(captureStream, new CaptureHeader(clock.GetUtcNow(), host.Description, "sa", "PSF-24-0001"), leaveOpen: true);
        var recording = new RecordingTransport(host, writer, clock);

        await recording.OpenAsync(CancellationToken.None).AsTask().WaitAsync(Timeout);
        var recorded = await RunHostAsync(new FramedConnection(recording), clock).WaitAsync(Timeout);
        await recording.DisposeAsync().AsTask().WaitAsync(Timeout);
        await deviceTask.WaitAsync(Timeout);

        var captureText = Encoding.ASCII.GetString(captureStream.ToArray());
        var session = CaptureText.Parse(captureText);

        // What the recording saw is what the device sent: the identity, the frequency in two pieces, the block.
        Assert.Equal(Identity, recorded.Identity);
        Assert.Equal("137500000", recorded.Centre);
        Assert.Equal(AllByteValues, recorded.Block);
        Assert.Equal(
            Encoding.Latin1.GetBytes(Identity + "\n137500000\n").Concat(Ieee488Block.Encode(AllByteValues)).Concat("\n"u8.ToArray()),
            session.BytesSent(CaptureDirection.DeviceToHost));
        Assert.Equal("*IDN?\nFREQ:CENT 137.5MHZ\nFREQ:CENT?\nTRAC:DATA?\n", CaptureText.Latin1(session.BytesSent(CaptureDirection.HostToDevice)));
        Assert.Contains(" <b ", captureText);
        Assert.Equal(["opened", "closed"], session.Events.Select(e => e.Text));
        Assert.Equal("sa", session.Header.Instrument);

        // Each chunk carries the manual clock's time when it passed. The two frequency commands were
        // written back to back, so they join into one host message.
        var exchanges = session.Exchanges();
        Assert.Equal(3, exchanges.Count);
        Assert.Equal(TimeSpan.Zero, exchanges[0].Command!.Offset);
        Assert.Equal("FREQ:CENT 137.5MHZ\nFREQ:CENT?\n", CaptureText.Latin1(exchanges[1].Command!.Data));
        Assert.Equal(TimeSpan.FromMilliseconds(10), exchanges[1].Command!.Offset);
        Assert.Equal(TimeSpan.FromMilliseconds(20), exchanges[1].Command!.EndOffset);
        Assert.Equal(TimeSpan.FromMilliseconds(30), exchanges[1].Reply!.Offset);
        Assert.Equal(TimeSpan.FromMilliseconds(10), exchanges[1].ReplyDelay);
        Assert.Equal("137500000\n", CaptureText.Latin1(exchanges[1].Reply!.Data));
        Assert.Equal(TimeSpan.FromMilliseconds(40), exchanges[2].Command!.Offset);

        // Replay: the same host code gets the same answers with no device at all.
        var replay = new ReplayTransport(session, new ReplayOptions { Mode = ReplayMode.Strict });
        await replay.OpenAsync(CancellationToken.None).AsTask().WaitAsync(Timeout);
        var framed = new FramedConnection(replay);
        var replayed = await RunHostAsync(framed, new ManualTimeProvider()).WaitAsync(Timeout);

        Assert.Equal(recorded.Identity, replayed.Identity);
        Assert.Equal(recorded.Centre, replayed.Centre);
        Assert.Equal(AllByteValues, replayed.Block);
        Assert.True(replay.Finished);

        // The device has nothing more to say: the connection reads as closed, and further commands are refused.
        var closed = await Assert.ThrowsAsync<FramingException>(() => framed.ReadLineAsync(Timeout, CancellationToken.None)).WaitAsync(Timeout);
        Assert.Contains("closed by the other end", closed.Message);
        var ended = await Assert.ThrowsAsync<ReplayMismatchException>(() => framed.SendAsync("*RST", CancellationToken.None)).WaitAsync(Timeout);
        Assert.Contains("the recording has ended", ended.Message);
        Assert.False(ended.IsTransient);
    }

    private static async Task<(string Identity, string Centre, byte[] Block)> RunHostAsync(FramedConnection framed, ManualTimeProvider clock)
    {
        await framed.SendAsync("*IDN?", CancellationToken.None);
        var identity = await framed.ReadLineAsync(Timeout, CancellationToken.None);
        clock.Advance(TimeSpan.FromMilliseconds(10));
        await framed.SendAsync("FREQ:CENT 137.5MHZ", CancellationToken.None);
        clock.Advance(TimeSpan.FromMilliseconds(10));
        await framed.SendAsync("FREQ:CENT?", CancellationToken.None);
        clock.Advance(TimeSpan.FromMilliseconds(10));
        var centre = await framed.ReadLineAsync(Timeout, CancellationToken.None);
        clock.Advance(TimeSpan.FromMilliseconds(10));
        await framed.SendAsync("TRAC:DATA?", CancellationToken.None);
        var block = await framed.ReadBlockAsync(Timeout, CancellationToken.None);
        return (identity, centre, block);
    }

    private static IReadOnlyList<byte[]> Answer(string command) => command switch
    {
        "*IDN?" => [Encoding.Latin1.GetBytes(Identity + "\n")],
        "FREQ:CENT?" => ["1375"u8.ToArray(), "00000\n"u8.ToArray()],
        "TRAC:DATA?" => [Ieee488Block.Encode(AllByteValues).Concat("\n"u8.ToArray()).ToArray()],
        _ => [],
    };
}
