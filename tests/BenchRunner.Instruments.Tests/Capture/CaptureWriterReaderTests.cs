using System.Text;
using BenchRunner.Instruments.Capture;

namespace BenchRunner.Instruments.Tests.Capture;

public sealed class CaptureWriterReaderTests
{
    private static readonly DateTimeOffset Start = new(2025, 3, 14, 9, 30, 0, TimeSpan.Zero);

    [Fact]
    public void WriteChunk_DocumentedExample_ProducesTheTextOfTheFormatDocument()
    {
        // The example of docs/capture-format.md, byte for byte, so the document cannot drift from the writer.
        const string expected =
            "benchrunner-capture 1\n" +
            "started: 2025-03-14T09:30:00.000000Z\n" +
            "connection: memory (host end)\n" +
            "instrument: sa\n" +
            "note: PSF-24-0001 preselector, after trimming\n" +
            "\n" +
            "00000.000000 ! opened\n" +
            "00000.001000 > *IDN?\\n\n" +
            "00000.012500 < Workshop,PSF-Sim,PSF-24-0001,0.1\\r\\n\n" +
            "00000.020000 > FREQ:CENT 137.5MHZ;SPAN 3MHZ\\n\n" +
            "00000.020150 > TRAC:DATA?\\n\n" +
            "00000.052000 <b IzE0AAH/gAo=\n" +
            "00000.052100 < rdy>\\x20\n" +
            "00001.000000 ! closed\n";

        var stream = new MemoryStream();
        using (var writer = new CaptureWriter(stream, new CaptureHeader(Start, "memory (host end)", "sa", "PSF-24-0001 preselector, after trimming"), leaveOpen: true))
        {
            writer.WriteEvent(TimeSpan.Zero, "opened");
            writer.WriteChunk(Ms(1), CaptureDirection.HostToDevice, "*IDN?\n"u8);
            writer.WriteChunk(Ms(12.5), CaptureDirection.DeviceToHost, "Workshop,PSF-Sim,PSF-24-0001,0.1\r\n"u8);
            writer.WriteChunk(Ms(20), CaptureDirection.HostToDevice, "FREQ:CENT 137.5MHZ;SPAN 3MHZ\n"u8);
            writer.WriteChunk(Ms(20.15), CaptureDirection.HostToDevice, "TRAC:DATA?\n"u8);
            writer.WriteChunk(Ms(52), CaptureDirection.DeviceToHost, [(byte)'#', (byte)'1', (byte)'4', 0x00, 0x01, 0xFF, 0x80, (byte)'\n']);
            writer.WriteChunk(Ms(52.1), CaptureDirection.DeviceToHost, "rdy> "u8);
            writer.WriteEvent(TimeSpan.FromSeconds(1), "closed");
        }

        Assert.Equal(expected, Encoding.ASCII.GetString(stream.ToArray()));
    }

    [Fact]
    public void Parse_DocumentedExample_GivesHeaderChunksAndEvents()
    {
        var session = CaptureText.Parse(
            "benchrunner-capture 1\n" +
            "started: 2025-03-14T09:30:00.000000Z\n" +
            "connection: memory (host end)\n" +
            "instrument: sa\n" +
            "note: PSF-24-0001 preselector, after trimming\n" +
            "\n" +
            "00000.000000 ! opened\n" +
            "00000.001000 > *IDN?\\n\n" +
            "00000.052000 <b IzE0AAH/gAo=\n" +
            "00000.052100 < rdy>\\x20\n");

        Assert.Equal(1, session.Header.FormatVersion);
        Assert.Equal(Start, session.Header.StartedUtc);
        Assert.Equal("memory (host end)", session.Header.Connection);
        Assert.Equal("sa", session.Header.Instrument);
        Assert.Equal("PSF-24-0001 preselector, after trimming", session.Header.Note);
        Assert.Equal("opened", Assert.Single(session.Events).Text);
        Assert.Equal(3, session.Chunks.Count);
        Assert.Equal("*IDN?\n", CaptureText.Latin1(session.Chunks[0].Data));
        Assert.Equal(8, session.Chunks[0].Line);
        Assert.Equal(new byte[] { (byte)'#', (byte)'1', (byte)'4', 0x00, 0x01, 0xFF, 0x80, (byte)'\n' }, session.Chunks[1].Data.ToArray());
        Assert.Equal(CaptureDirection.DeviceToHost, session.Chunks[1].Direction);
        Assert.Equal(Ms(52), session.Chunks[1].Offset);
        Assert.Equal("rdy> ", CaptureText.Latin1(session.Chunks[2].Data));
        Assert.Null(session.IncompleteLine);
    }

    [Fact]
    public void WriteThenParse_SeededRandomChunks_RoundTripExactly()
    {
        var random = new Random(20250314);
        var chunks = new List<CaptureChunk>();
        long micros = 0;
        for (int i = 0; i < 400; i++)
        {
            micros += random.Next(0, 3) == 0 ? 0 : random.Next(1, 5_000_000);
            var direction = random.Next(2) == 0 ? CaptureDirection.HostToDevice : CaptureDirection.DeviceToHost;
            chunks.Add(new CaptureChunk(TimeSpan.FromMicroseconds(micros), direction, RandomBytes(random)));
        }

        var header = new CaptureHeader(Start, "serial\tport \\ \"x\" \u00b5", "vna", "trailing space ", [new("fixture-id", "PSF-24-0001")]);
        var text = Write(header, writer =>
        {
            foreach (var chunk in chunks)
            {
                writer.WriteChunk(chunk.Offset, chunk.Direction, chunk.Data.Span);
            }
        });

        var session = CaptureText.Parse(text);

        Assert.Equal(header.Connection, session.Header.Connection);
        Assert.Equal(header.Note, session.Header.Note);
        Assert.Equal(header.Extra, session.Header.Extra);
        Assert.Equal(chunks.Count, session.Chunks.Count);
        for (int i = 0; i < chunks.Count; i++)
        {
            Assert.Equal(chunks[i].Offset, session.Chunks[i].Offset);
            Assert.Equal(chunks[i].Direction, session.Chunks[i].Direction);
            Assert.Equal(chunks[i].Data.ToArray(), session.Chunks[i].Data.ToArray());
            Assert.Equal(8 + i, session.Chunks[i].Line);
        }

        Assert.True(text.All(c => c is '\n' or (>= ' ' and <= '~')), "a capture is printable ASCII and LF only");
        Assert.Contains(" <b ", text);
        Assert.Contains(" > ", text);
    }

    [Fact]
    public void Escaping_AllByteValues_RoundTripInBothEncodings()
    {
        var all = Enumerable.Range(0, 256).Select(b => (byte)b).ToArray();

        var escaped = CaptureEscaping.Escape(all);
        var base64 = Convert.ToBase64String(all);

        Assert.Equal(all, CaptureEscaping.TryUnescape(escaped, 0, out _, out _));
        Assert.Equal(all, CaptureEscaping.TryDecodeBase64(base64, 0, out _, out _));
        Assert.True(CaptureEscaping.PreferBase64(all));
        Assert.Equal(escaped.Length, CaptureEscaping.EscapedLength(all));
    }

    [Theory]
    [InlineData("*IDN?\n", "*IDN?\\n")]
    [InlineData("rdy> ", "rdy>\\x20")]
    [InlineData(" a ", " a\\x20")]
    [InlineData("a\\b", "a\\\\b")]
    [InlineData("\u0006", "\\x06")]
    [InlineData("\r\n\t", "\\r\\n\\t")]
    [InlineData("\u00b5\u007f", "\\xB5\\x7F")]
    public void Escape_DocumentedRules_GiveTheDocumentedText(string latin1, string expected)
    {
        var bytes = Encoding.Latin1.GetBytes(latin1);

        Assert.Equal(expected, CaptureEscaping.Escape(bytes));
        Assert.Equal(bytes, CaptureEscaping.TryUnescape(expected, 0, out _, out _));
    }

    [Fact]
    public void Parse_LowerCaseHexEscape_IsAccepted()
    {
        var session = CaptureText.Body("00000.000001 < \\xb5\\xfe");

        Assert.Equal(new byte[] { 0xB5, 0xFE }, session.Chunks[0].Data.ToArray());
    }

    [Fact]
    public void Parse_CommentsBlankLinesAndCrLf_AreAccepted()
    {
        var session = CaptureText.Parse(CaptureText.Header.Replace("\n", "\r\n") + "# trimmed by hand\r\n\r\n00000.000001 > A\\r\r\n");

        Assert.Equal("A\r", CaptureText.Latin1(Assert.Single(session.Chunks).Data));
    }

    [Fact]
    public void Parse_LastLineWithoutLineEnd_IsLeftOutAndReported()
    {
        var session = CaptureText.Parse(CaptureText.Header + "00000.000001 > *IDN?\\n\n00000.000002 < Works");

        Assert.Single(session.Chunks);
        Assert.Equal(6, session.IncompleteLine);
    }

    [Fact]
    public void WriteChunk_EachChunk_IsFlushedBeforeItReturns()
    {
        var file = new MemoryStream();
        var buffered = new BufferedStream(file, 1 << 16);
        using var writer = new CaptureWriter(buffered, new CaptureHeader(Start, "memory"));

        writer.WriteChunk(Ms(1), CaptureDirection.HostToDevice, "*IDN?\n"u8);

        Assert.EndsWith("00000.001000 > *IDN?\\n\n", Encoding.ASCII.GetString(file.ToArray()));
    }

    [Fact]
    public void WriteChunk_EarlierOffset_IsRefused()
    {
        using var writer = new CaptureWriter(new MemoryStream(), new CaptureHeader(Start, "memory"));
        writer.WriteChunk(Ms(5), CaptureDirection.HostToDevice, "A"u8);

        Assert.Throws<ArgumentOutOfRangeException>(() => writer.WriteChunk(Ms(4), CaptureDirection.DeviceToHost, "B"u8));
        writer.WriteChunk(Ms(5), CaptureDirection.DeviceToHost, "B"u8);
        Assert.Equal(2, writer.ChunkCount);
    }

    [Fact]
    public void WriteChunk_OffsetBeyondTenDigitsOfSeconds_IsRefusedRatherThanWrittenUnreadably()
    {
        using var writer = new CaptureWriter(new MemoryStream(), new CaptureHeader(Start, "memory"));

        writer.WriteChunk(TimeSpan.FromSeconds(9_999_999_999), CaptureDirection.HostToDevice, "A"u8);
        Assert.Throws<ArgumentOutOfRangeException>(() => writer.WriteChunk(TimeSpan.FromSeconds(10_000_000_000), CaptureDirection.HostToDevice, "A"u8));
    }

    [Fact]
    public void WriteChunk_OffsetFinerThanAMicrosecond_IsTruncatedToMicroseconds()
    {
        var text = Write(new CaptureHeader(Start, "memory"), w => w.WriteChunk(TimeSpan.FromTicks(12_345_678_9), CaptureDirection.HostToDevice, "A"u8));

        Assert.Contains("00012.345678 > A\n", text);
    }

    [Fact]
    public void Create_ExistingFile_IsNotOverwrittenUnlessAsked()
    {
        var path = Path.Combine(Path.GetTempPath(), $"capture-{Guid.NewGuid():N}.cap");
        try
        {
            File.WriteAllText(path, "keep");
            var header = new CaptureHeader(Start, "memory");

            Assert.Throws<IOException>(() => CaptureWriter.Create(path, header));
            Assert.Equal("keep", File.ReadAllText(path));

            using (var writer = CaptureWriter.Create(path, header, overwrite: true))
            {
                writer.WriteChunk(Ms(1), CaptureDirection.HostToDevice, "*IDN?\n"u8);
            }

            Assert.Equal("*IDN?\n", CaptureText.Latin1(Assert.Single(CaptureReader.Read(path).Chunks).Data));
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void Exchanges_CommandsAndReplies_AreJoinedAcrossChunks()
    {
        var session = CaptureText.Body(
            "00000.000000 < rdy>\\x20",
            "00000.001000 > FREQ:CENT?",
            "00000.001000 > \\n",
            "00000.003000 < 1375",
            "00000.004000 < 00000\\n",
            "00000.005000 > OUTP ON\\n");

        var exchanges = session.Exchanges();

        Assert.Equal(3, exchanges.Count);
        Assert.Null(exchanges[0].Command);
        Assert.Equal("rdy> ", CaptureText.Latin1(exchanges[0].Reply!.Data));
        Assert.Equal("FREQ:CENT?\n", CaptureText.Latin1(exchanges[1].Command!.Data));
        Assert.Equal("137500000\n", CaptureText.Latin1(exchanges[1].Reply!.Data));
        Assert.Equal(2, exchanges[1].Reply!.ChunkCount);
        Assert.Equal(Ms(2), exchanges[1].ReplyDelay);
        Assert.Equal("> OUTP ON\\n", exchanges[2].ToString());
        Assert.Null(exchanges[2].Reply);
        Assert.Equal(4, session.Messages().Count);
    }

    private static TimeSpan Ms(double milliseconds) => TimeSpan.FromTicks((long)Math.Round(milliseconds * TimeSpan.TicksPerMillisecond));

    private static string Write(CaptureHeader header, Action<CaptureWriter> body)
    {
        var stream = new MemoryStream();
        using (var writer = new CaptureWriter(stream, header, leaveOpen: true))
        {
            body(writer);
        }

        return Encoding.ASCII.GetString(stream.ToArray());
    }

    private static byte[] RandomBytes(Random random)
    {
        var length = random.Next(1, 300);
        var bytes = new byte[length];
        switch (random.Next(4))
        {
            case 0:
                random.NextBytes(bytes);
                break;
            case 1:
                const string text = "ABCDEFGHIJKLMNOPQRSTUVWXYZ0123456789 :;,.?*#\\\r\n\t";
                for (int i = 0; i < length; i++) bytes[i] = (byte)text[random.Next(text.Length)];
                break;
            case 2:
                for (int i = 0; i < length; i++) bytes[i] = (byte)(random.Next(4) == 0 ? random.Next(256) : random.Next(0x20, 0x7F));
                break;
            default:
                for (int i = 0; i < length; i++) bytes[i] = (byte)" \\x"[random.Next(3)];
                break;
        }

        return bytes;
    }
}
