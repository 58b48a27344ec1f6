using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Instruments.Tests.Capture;

public sealed class CaptureReaderErrorTests
{
    [Fact]
    public void Parse_BadMagicLine_NamesLineOneColumnOne()
    {
        var error = Fails("benchrunner-log 1\nstarted: 2025-03-14T09:30:00.000000Z\n\n");

        Assert.Equal(new SourceLocation("session.cap", 1, 1), error.Location);
        Assert.Contains("expected \"benchrunner-capture 1\"", error.Message);
        Assert.StartsWith("session.cap:1:1: ", error.Message);
    }

    [Fact]
    public void Parse_EmptyFile_IsNotACapture()
    {
        var error = Fails("");

        Assert.Equal(new SourceLocation("session.cap", 1, 1), error.Location);
    }

    [Fact]
    public void Parse_UnknownVersion_NamesBothVersions()
    {
        var error = Fails(CaptureText.Header.Replace("capture 1", "capture 2"));

        Assert.Equal(new SourceLocation("session.cap", 1, 21), error.Location);
        Assert.Contains("version 2 is not supported", error.Detail);
        Assert.Contains("reads version 1", error.Detail);
    }

    [Theory]
    [InlineData("capture x", 21)]
    [InlineData("capture ", 21)]
    [InlineData("capture 01", 21)]
    public void Parse_VersionThatIsNotANumber_IsRejected(string magic, int column)
    {
        var error = Fails(CaptureText.Header.Replace("capture 1", magic));

        Assert.Equal(new SourceLocation("session.cap", 1, column), error.Location);
        Assert.Contains("format version number", error.Detail);
    }

    [Theory]
    [InlineData("0000a.000000 > A", 5, "time offset")]
    [InlineData("00001.25 > A", 9, "six decimals")]
    [InlineData("00001.2500000 > A", 13, "space after the time offset")]
    [InlineData("> A", 1, "time offset")]
    [InlineData("12345678901.000000 > A", 11, "time offset")]
    public void Parse_BadTimestamp_NamesItsColumn(string line, int column, string expected)
    {
        var error = Fails(CaptureText.Header + "00000.000001 > *IDN?\\n\n" + line + "\n");

        Assert.Equal(new SourceLocation("session.cap", 6, column), error.Location);
        Assert.Contains(expected, error.Detail);
    }

    [Theory]
    [InlineData("00000.001000 > *IDN?\\q", 21, "unknown escape \"\\q\"")]
    [InlineData("00000.001000 > *IDN?\\x4G", 21, "two hexadecimal digits")]
    [InlineData("00000.001000 > *IDN?\\x4", 21, "two hexadecimal digits")]
    [InlineData("00000.001000 > *IDN?\\", 21, "backslash ends the line")]
    [InlineData("00000.001000 > *IDN?\t", 21, "U+0009")]
    [InlineData("00000.001000 > caf\u00e9", 19, "U+00E9")]
    public void Parse_BadEscape_NamesTheColumnOfTheBackslash(string line, int column, string expected)
    {
        var error = Fails(CaptureText.Header + line + "\n");

        Assert.Equal(new SourceLocation("session.cap", 5, column), error.Location);
        Assert.Contains(expected, error.Detail);
    }

    [Fact]
    public void Parse_DecreasingTimestamps_NameBothLines()
    {
        var error = Fails(CaptureText.Header + "00000.000000 ! opened\n00001.000000 > A\n00000.500000 < B\n");

        Assert.Equal(new SourceLocation("session.cap", 7, 1), error.Location);
        Assert.Equal("session.cap:7:1: the time offset 0.500000 s is earlier than 1.000000 s on line 6; offsets never decrease", error.Message);
    }

    [Fact]
    public void Parse_EventEarlierThanChunk_IsADecreasingTimestamp()
    {
        var error = Fails(CaptureText.Header + "00002.000000 > A\n00001.000000 ! closed\n");

        Assert.Equal(new SourceLocation("session.cap", 6, 1), error.Location);
    }

    [Theory]
    [InlineData("00000.000001 = A", 14, "expected '>'")]
    [InlineData("00000.000001 >> A", 14, "expected '>'")]
    [InlineData("00000.000001  A", 14, "expected '>'")]
    [InlineData("00000.000001 >", 15, "at least one byte")]
    [InlineData("00000.000001 > ", 16, "at least one byte")]
    [InlineData("00000.000001 <b QUJ", 20, "groups of four")]
    [InlineData("00000.000001 <b QU*D", 19, "not base64")]
    [InlineData("00000.000001 <b QQ=A", 20, "not base64")]
    public void Parse_BadChunkLine_SaysWhatWasExpected(string line, int column, string expected)
    {
        var error = Fails(CaptureText.Header + line + "\n");

        Assert.Equal(new SourceLocation("session.cap", 5, column), error.Location);
        Assert.Contains(expected, error.Detail);
    }

    [Fact]
    public void Parse_HeaderWithoutBlankLine_SaysTheFileEndsInTheHeader()
    {
        var error = Fails("benchrunner-capture 1\nstarted: 2025-03-14T09:30:00.000000Z\n");

        Assert.Contains("ends inside the header", error.Detail);
    }

    [Fact]
    public void Parse_MissingStarted_NamesTheBlankLine()
    {
        var error = Fails("benchrunner-capture 1\nconnection: memory\n\n");

        Assert.Equal(new SourceLocation("session.cap", 3, 0), error.Location);
        Assert.Contains("\"started:\"", error.Detail);
    }

    [Fact]
    public void Parse_MissingConnection_IsRejected()
    {
        var error = Fails("benchrunner-capture 1\nstarted: 2025-03-14T09:30:00.000000Z\n\n");

        Assert.Contains("\"connection:\"", error.Detail);
    }

    [Theory]
    [InlineData("started: 2025-03-14 09:30:00Z")]
    [InlineData("started: 2025-03-14T09:30:00.000000+01:00")]
    [InlineData("started: 2025-02-30T09:30:00.000000Z")]
    public void Parse_BadStartTime_NamesTheValue(string line)
    {
        var error = Fails(CaptureText.Header.Replace("started: 2025-03-14T09:30:00.000000Z", line));

        Assert.Equal(new SourceLocation("session.cap", 2, 10), error.Location);
        Assert.Contains("yyyy-mm-ddThh:mm:ss.ffffffZ", error.Detail);
    }

    [Theory]
    [InlineData("Connection: memory", 1, "key: value")]
    [InlineData("connection memory", 1, "key: value")]
    [InlineData("connection:memory", 12, "space after the colon")]
    [InlineData("started: 2025-03-14T09:30:00.000000Z", 1, "given twice")]
    public void Parse_BadHeaderLine_IsRejected(string line, int column, string expected)
    {
        var error = Fails(CaptureText.Header.Replace("connection: memory (host end)", line));

        Assert.Equal(new SourceLocation("session.cap", 3, column), error.Location);
        Assert.Contains(expected, error.Detail);
    }

    [Fact]
    public void Read_MalformedFile_NamesThePath()
    {
        var path = Path.Combine(Path.GetTempPath(), $"capture-{Guid.NewGuid():N}.cap");
        try
        {
            File.WriteAllText(path, CaptureText.Header + "00000.000001 > \\z\n");

            var error = Assert.Throws<InputFormatException>(() => BenchRunner.Instruments.Capture.CaptureReader.Read(path));

            Assert.Equal(new SourceLocation(path, 5, 16), error.Location);
        }
        finally
        {
            File.Delete(path);
        }
    }

    private static InputFormatException Fails(string text) =>
        Assert.Throws<InputFormatException>(() => CaptureText.Parse(text));
}
