using System.Text;
using BenchRunner.Instruments.Capture;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Tests.Support;

namespace BenchRunner.Instruments.Tests.Capture;

public sealed class ReplayTransportTests
{
    private static readonly TimeSpan Timeout = TimeSpan.FromSeconds(10);

    // Lines 5 to 8 of the capture.
    private static readonly string[] Session =
    [
        "00001.000000 > *IDN?\\n",
        "00001.250000 < Workshop,PSF-Sim,PSF-24-0001,0.1\\n",
        "00002.000000 > FREQ:CENT 137.5MHZ\\n",
        "00002.000000 > FREQ:CENT?\\n",
        "00002.100000 < 137500000\\n",
    ];

    [Fact]
    public async Task WriteAsync_DifferentCommandInStrictMode_NamesLineChunkByteAndBothTexts()
    {
        var replay = await OpenAsync(CaptureText.Body(Session));

        var error = await Assert.ThrowsAsync<ReplayMismatchException>(() => Write(replay, "*IDM?\n")).WaitAsync(Timeout);

        Assert.Equal(
            "replay mismatch: the host wrote \"*IDM?\\n\" where the recording (session.cap:5, chunk 1) has \"*IDN?\\n\"; "
            + "first difference at byte 3 of the chunk: expected \"N\" (0x4E), got \"M\" (0x4D)",
            error.Message);
        Assert.False(error.IsTransient);
        Assert.IsAssignableFrom<InstrumentException>(error);
        Assert.Equal(5, error.Mismatch.Line);
        Assert.Equal(1, error.Mismatch.ChunkNumber);
        Assert.Equal(3, error.Mismatch.ByteOffset);
    }

    [Fact]
    public async Task WriteAsync_MismatchInALaterChunk_CountsChunksAndBytesFromThatChunk()
    {
        var replay = await OpenAsync(CaptureText.Body(Session));
        await Write(replay, "*IDN?\n");
        await ReadText(replay);

        var error = await Assert.ThrowsAsync<ReplayMismatchException>(() => Write(replay, "FREQ:CENT 137.6MHZ\n")).WaitAsync(Timeout);

        Assert.Equal(7, error.Mismatch.Line);
        Assert.Equal(3, error.Mismatch.ChunkNumber);
        Assert.Equal(14, error.Mismatch.ByteOffset);
        Assert.Contains("expected \"5\" (0x35), got \"6\" (0x36)", error.Message);
    }

    [Fact]
    public async Task WriteAsync_StrictMismatch_ConsumesNothingSoTheRightCommandStillWorks()
    {
        var replay = await OpenAsync(CaptureText.Body(Session));
        await Assert.ThrowsAsync<ReplayMismatchException>(() => Write(replay, "*IDN?\n*RST\n")).WaitAsync(Timeout);

        await Write(replay, "*IDN?\n");

        Assert.Equal("Workshop,PSF-Sim,PSF-24-0001,0.1\n", await ReadText(replay));
    }

    [Fact]
    public async Task WriteAsync_CommandInOtherPieces_MatchesTheRecordedStream()
    {
        var replay = await OpenAsync(CaptureText.Body(Session));
        await Write(replay, "*ID");
        await Write(replay, "N?\n");
        await ReadText(replay);

        // Two recorded chunks written as one, then the reply to the second.
        await Write(replay, "FREQ:CENT 137.5MHZ\nFREQ:CENT?\n");

        Assert.Equal("137500000\n", await ReadText(replay));
    }

    [Fact]
    public async Task WriteAsync_DifferentCommandInLenientMode_ReportsItAndCarriesOn()
    {
        var mismatches = new List<ReplayMismatch>();
        var replay = await OpenAsync(CaptureText.Body(Session), new ReplayOptions { Mode = ReplayMode.Lenient, OnMismatch = mismatches.Add });
        await Write(replay, "*IDN?\n");
        await ReadText(replay);

        await Write(replay, "FREQ:CENT 137.55MHZ\n");
        await Write(replay, "FREQ:CENT?\n");

        var mismatch = Assert.Single(mismatches);
        Assert.Equal(7, mismatch.Line);
        Assert.Equal(15, mismatch.ByteOffset);
        Assert.Equal("FREQ:CENT 137.55MHZ\n", CaptureText.Latin1(mismatch.Actual));
        Assert.Equal("137500000\n", await ReadText(replay));
    }

    [Fact]
    public async Task WriteAsync_AfterTheEndInLenientMode_IsReportedAndDiscarded()
    {
        var mismatches = new List<ReplayMismatch>();
        var replay = await OpenAsync(CaptureText.Body("00000.100000 > OUTP OFF\\n"), new ReplayOptions { Mode = ReplayMode.Lenient, OnMismatch = mismatches.Add });
        await Write(replay, "OUTP OFF\n");

        await Write(replay, "*RST\n");

        Assert.True(Assert.Single(mismatches).RecordingEnded);
        Assert.Contains("the recording has ended", mismatches[0].Description);
        Assert.Equal(0, await Read(replay, new byte[16]));
    }

    [Fact]
    public async Task WriteAsync_AfterTheEndInStrictMode_SaysTheRecordingHasEnded()
    {
        var replay = await OpenAsync(CaptureText.Body(Session));
        await Write(replay, "*IDN?\nFREQ:CENT 137.5MHZ\nFREQ:CENT?\n");

        var error = await Assert.ThrowsAsync<ReplayMismatchException>(() => Write(replay, "*RST\n")).WaitAsync(Timeout);

        Assert.Equal("replay mismatch: the recording has ended: the host wrote \"*RST\\n\" after the last of the 5 recorded chunks of session.cap", error.Message);
        Assert.True(error.Mismatch.RecordingEnded);
    }

    [Fact]
    public async Task ReadAsync_AfterEveryRecordedByte_ReturnsZero()
    {
        var replay = await OpenAsync(CaptureText.Body(Session));
        await Write(replay, "*IDN?\nFREQ:CENT 137.5MHZ\nFREQ:CENT?\n");

        // Bytes the host did not read in between stay readable, in order.
        Assert.Equal("Workshop,PSF-Sim,PSF-24-0001,0.1\n", await ReadText(replay));
        Assert.Equal("137500000\n", await ReadText(replay));
        Assert.Equal(0, await Read(replay, new byte[16]));
        Assert.Equal(0, await Read(replay, new byte[16]));
    }

    [Fact]
    public async Task ReadAsync_SmallBuffer_ReturnsTheChunkInPieces()
    {
        var replay = await OpenAsync(CaptureText.Body(Session));
        await Write(replay, "*IDN?\n");
        var buffer = new byte[8];

        Assert.Equal(8, await Read(replay, buffer));
        Assert.Equal("Workshop", Encoding.ASCII.GetString(buffer));
        Assert.Equal(8, await Read(replay, buffer));
        Assert.Equal(",PSF-Sim", Encoding.ASCII.GetString(buffer));
    }

    [Fact]
    public async Task ReadAsync_BeforeTheCommandIsComplete_WaitsUntilCancelled()
    {
        var replay = await OpenAsync(CaptureText.Body(Session));
        await Write(replay, "*IDN?");
        using var cancel = new CancellationTokenSource(TimeSpan.FromMilliseconds(50));

        await Assert.ThrowsAnyAsync<OperationCanceledException>(() => replay.ReadAsync(new byte[16], cancel.Token).AsTask()).WaitAsync(Timeout);

        await Write(replay, "\n");
        Assert.Equal("Workshop,PSF-Sim,PSF-24-0001,0.1\n", await ReadText(replay));
    }

    [Fact]
    public async Task OpenAsync_DeviceSpeaksFirst_BannerIsReadableAtOnce()
    {
        var replay = await OpenAsync(CaptureText.Body("00000.000000 < rdy>\\x20", "00000.500000 > ver\\r"));

        Assert.Equal("rdy> ", await ReadText(replay));
        Assert.False(replay.Finished);
    }

    [Fact]
    public async Task ReadAsync_RecordedPace_WaitsForTheRecordedDelayAfterTheCommand()
    {
        var clock = new ManualTimeProvider();
        var replay = await OpenAsync(
            CaptureText.Body("00001.000000 > TRAC:DATA?\\n", "00001.250000 < #14", "00001.400000 < ABCD\\n"),
            new ReplayOptions { Pace = ReplayPace.Recorded },
            clock);
        clock.Advance(TimeSpan.FromSeconds(7));
        await Write(replay, "TRAC:DATA?\n");
        var buffer = new byte[16];

        var first = replay.ReadAsync(buffer, CancellationToken.None).AsTask();
        await WaitForTimer(clock);
        clock.Advance(TimeSpan.FromMilliseconds(249));
        await Task.Delay(20);
        Assert.False(first.IsCompleted, "the reply came 250 ms after the command in the recording");
        clock.Advance(TimeSpan.FromMilliseconds(1));
        Assert.Equal(3, await first.WaitAsync(Timeout));

        // The second chunk is due 400 ms after the command: 150 ms from now.
        var second = replay.ReadAsync(buffer, CancellationToken.None).AsTask();
        await WaitForTimer(clock);
        clock.Advance(TimeSpan.FromMilliseconds(149));
        await Task.Delay(20);
        Assert.False(second.IsCompleted);
        clock.Advance(TimeSpan.FromMilliseconds(1));
        Assert.Equal(5, await second.WaitAsync(Timeout));
        Assert.Equal("ABCD\n", Encoding.ASCII.GetString(buffer, 0, 5));
    }

    [Fact]
    public async Task ReadAsync_RecordedPaceAfterTheHostWasSlow_DoesNotWaitAgain()
    {
        var clock = new ManualTimeProvider();
        var replay = await OpenAsync(
            CaptureText.Body("00001.000000 > *IDN?\\n", "00001.250000 < ok\\n"),
            new ReplayOptions { Pace = ReplayPace.Recorded },
            clock);
        await Write(replay, "*IDN?\n");

        clock.Advance(TimeSpan.FromSeconds(1));

        Assert.Equal("ok\n", await ReadText(replay));
        Assert.Equal(0, clock.PendingTimerCount);
    }

    [Fact]
    public async Task ReadAsync_AsFastAsPossible_NeedsNoClock()
    {
        var clock = new ManualTimeProvider();
        var replay = await OpenAsync(CaptureText.Body(Session), new ReplayOptions(), clock);
        await Write(replay, "*IDN?\n");

        Assert.Equal("Workshop,PSF-Sim,PSF-24-0001,0.1\n", await ReadText(replay));
    }

    [Fact]
    public async Task WriteAsync_NotOpen_IsACallerMistake()
    {
        var replay = new ReplayTransport(CaptureText.Body(Session));

        await Assert.ThrowsAsync<InvalidOperationException>(() => Write(replay, "*IDN?\n")).WaitAsync(Timeout);
        Assert.Contains("replay of session.cap (memory (host end))", replay.Description);
    }

    [Fact]
    public async Task OpenAsync_AfterClose_CarriesOnWhereTheReplayWas()
    {
        var replay = await OpenAsync(CaptureText.Body(Session));
        await Write(replay, "*IDN?\n");
        await replay.CloseAsync();

        await replay.OpenAsync(CancellationToken.None);

        Assert.Equal("Workshop,PSF-Sim,PSF-24-0001,0.1\n", await ReadText(replay));
    }

    private static async Task<ReplayTransport> OpenAsync(CapturedSession session, ReplayOptions? options = null, TimeProvider? clock = null)
    {
        var replay = new ReplayTransport(session, options, clock);
        await replay.OpenAsync(CancellationToken.None).AsTask().WaitAsync(Timeout);
        return replay;
    }

    private static Task Write(ReplayTransport replay, string text) =>
        replay.WriteAsync(Encoding.Latin1.GetBytes(text), CancellationToken.None).AsTask().WaitAsync(Timeout);

    private static Task<int> Read(ReplayTransport replay, byte[] buffer) =>
        replay.ReadAsync(buffer, CancellationToken.None).AsTask().WaitAsync(Timeout);

    private static async Task<string> ReadText(ReplayTransport replay)
    {
        var buffer = new byte[256];
        int count = await Read(replay, buffer);
        return Encoding.Latin1.GetString(buffer, 0, count);
    }

    private static async Task WaitForTimer(ManualTimeProvider clock)
    {
        var deadline = DateTime.UtcNow + Timeout;
        while (clock.PendingTimerCount == 0)
        {
            Assert.True(DateTime.UtcNow < deadline, "the replay never started waiting");
            await Task.Delay(1);
        }
    }
}
