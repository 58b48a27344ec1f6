using System.Text;
using BenchRunner.Instruments.Capture;
using BenchRunner.Instruments.Transports;
using BenchRunner.Instruments.Tests.Support;
using NSubstitute;

namespace BenchRunner.Instruments.Tests.Capture;

public sealed class RecordingTransportTests
{
    private static readonly TimeSpan Timeout = TimeSpan.FromSeconds(10);

    [Fact]
    public async Task WriteAndRead_ThroughTheRecorder_AreRecordedWithTheClocksTime()
    {
        var clock = new ManualTimeProvider();
        var (host, device) = InMemoryTransport.CreatePair();
        await device.OpenAsync(CancellationToken.None);
        var stream = new MemoryStream();
        var recording = new RecordingTransport(host, new CaptureWriter(stream, new CaptureHeader(clock.GetUtcNow(), host.Description), leaveOpen: true), clock);
        await recording.OpenAsync(CancellationToken.None);

        clock.Advance(TimeSpan.FromMilliseconds(1.5));
        await recording.WriteAsync("*IDN?\n"u8.ToArray(), CancellationToken.None);
        clock.Advance(TimeSpan.FromMilliseconds(2));
        await device.WriteAsync("id\n"u8.ToArray(), CancellationToken.None);
        var buffer = new byte[16];
        int count = await recording.ReadAsync(buffer, CancellationToken.None).AsTask().WaitAsync(Timeout);

        Assert.Equal("id\n", Encoding.ASCII.GetString(buffer, 0, count));
        Assert.Equal(host.Description, recording.Description);
        Assert.True(recording.IsOpen);
        var session = Parse(stream);
        Assert.Equal(TimeSpan.FromMicroseconds(1500), session.Chunks[0].Offset);
        Assert.Equal(CaptureDirection.HostToDevice, session.Chunks[0].Direction);
        Assert.Equal(TimeSpan.FromMicroseconds(3500), session.Chunks[1].Offset);
        Assert.Equal("id\n", CaptureText.Latin1(session.Chunks[1].Data));
    }

    [Fact]
    public async Task Constructor_WriterStartedEarlier_OffsetsCountFromTheHeadersStart()
    {
        var clock = new ManualTimeProvider();
        var header = new CaptureHeader(clock.GetUtcNow(), "memory");
        var stream = new MemoryStream();
        var writer = new CaptureWriter(stream, header, leaveOpen: true);
        clock.Advance(TimeSpan.FromSeconds(2));
        var (host, device) = InMemoryTransport.CreatePair();
        var recording = new RecordingTransport(host, writer, clock);
        await recording.OpenAsync(CancellationToken.None);

        await recording.WriteAsync("A"u8.ToArray(), CancellationToken.None);

        Assert.Equal(TimeSpan.FromSeconds(2), Parse(stream).Chunks[0].Offset);
    }

    [Fact]
    public async Task ReadAsync_PeerClosed_ReturnsZeroAndNotesItOnce()
    {
        var (host, device) = InMemoryTransport.CreatePair();
        var stream = new MemoryStream();
        var clock = new ManualTimeProvider();
        var recording = new RecordingTransport(host, new CaptureWriter(stream, new CaptureHeader(clock.GetUtcNow(), "memory"), leaveOpen: true), clock);
        await recording.OpenAsync(CancellationToken.None);
        await device.OpenAsync(CancellationToken.None);
        await device.CloseAsync();

        Assert.Equal(0, await recording.ReadAsync(new byte[8], CancellationToken.None).AsTask().WaitAsync(Timeout));
        Assert.Equal(0, await recording.ReadAsync(new byte[8], CancellationToken.None).AsTask().WaitAsync(Timeout));
        await recording.CloseAsync();

        Assert.Equal(["opened", "closed by peer", "closed"], Parse(stream).Events.Select(e => e.Text));
        Assert.Contains("00000.000000 ! closed by peer\n", Encoding.ASCII.GetString(stream.ToArray()));
    }

    [Fact]
    public async Task WriteAsync_InnerFails_TheSameErrorPassesThroughAndIsNoted()
    {
        var inner = Substitute.For<ITransport>();
        var failure = new IOException("the cable was pulled");
        inner.WriteAsync(Arg.Any<ReadOnlyMemory<byte>>(), Arg.Any<CancellationToken>()).Returns(_ => ValueTask.FromException(failure));
        var stream = new MemoryStream();
        var recording = new RecordingTransport(inner, new CaptureWriter(stream, new CaptureHeader(DateTimeOffset.UnixEpoch, "serial"), leaveOpen: true), new ManualTimeProvider());

        var thrown = await Assert.ThrowsAsync<IOException>(() => recording.WriteAsync("*IDN?\n"u8.ToArray(), CancellationToken.None).AsTask()).WaitAsync(Timeout);

        Assert.Same(failure, thrown);
        var session = Parse(stream);
        Assert.Empty(session.Chunks);
        Assert.Equal("write failed: IOException: the cable was pulled", Assert.Single(session.Events).Text);
    }

    [Fact]
    public async Task ReadAsync_Cancelled_TheCancellationPassesThroughAndIsNoted()
    {
        var (host, _) = InMemoryTransport.CreatePair();
        var stream = new MemoryStream();
        var recording = new RecordingTransport(host, new CaptureWriter(stream, new CaptureHeader(DateTimeOffset.UnixEpoch, "memory"), leaveOpen: true), new ManualTimeProvider());
        await recording.OpenAsync(CancellationToken.None);
        using var cancel = new CancellationTokenSource(TimeSpan.FromMilliseconds(30));

        await Assert.ThrowsAnyAsync<OperationCanceledException>(() => recording.ReadAsync(new byte[8], cancel.Token).AsTask()).WaitAsync(Timeout);

        Assert.Equal(["opened", "read cancelled"], Parse(stream).Events.Select(e => e.Text));
    }

    [Fact]
    public async Task ToFile_WritesAHeaderNamingTheConnectionAndInstrument()
    {
        var path = Path.Combine(Path.GetTempPath(), $"capture-{Guid.NewGuid():N}.cap");
        try
        {
            var clock = new ManualTimeProvider();
            var (host, _) = InMemoryTransport.CreatePair("bench");
            await using (var recording = RecordingTransport.ToFile(host, path, "siggen", "PSF-24-0002 LNA", clock))
            {
                await recording.OpenAsync(CancellationToken.None);
                await recording.WriteAsync("OUTP ON\n"u8.ToArray(), CancellationToken.None);
            }

            var session = CaptureReader.Read(path);
            Assert.Equal("bench (host end)", session.Header.Connection);
            Assert.Equal("siggen", session.Header.Instrument);
            Assert.Equal("PSF-24-0002 LNA", session.Header.Note);
            Assert.Equal(clock.GetUtcNow(), session.Header.StartedUtc);
            Assert.Equal("OUTP ON\n", CaptureText.Latin1(Assert.Single(session.Chunks).Data));
            Assert.Equal(["opened", "closed"], session.Events.Select(e => e.Text));
        }
        finally
        {
            File.Delete(path);
        }
    }

    private static CapturedSession Parse(MemoryStream stream) =>
        CaptureText.Parse(Encoding.ASCII.GetString(stream.ToArray()));
}
