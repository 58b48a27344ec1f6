using System.Text;
using System.Text.Json;
using System.Text.RegularExpressions;
using BenchRunner.Cli.Tests.Support;
using BenchRunner.Instruments.Capture;

namespace BenchRunner.Cli.Tests.Commands;

public sealed class ReplayCommandTests
{
    private static string WriteCapture(TempDirectory dir)
    {
        var path = dir.PathOf("vna.capture");
        var header = new CaptureHeader(new DateTimeOffset(2026, 12, 1, 14, 3, 11, TimeSpan.Zero), "tcp 127.0.0.1:5025", instrument: "vna");
        using (var writer = CaptureWriter.Create(path, header))
        {
            writer.WriteEvent(TimeSpan.Zero, "opened");
            writer.WriteChunk(TimeSpan.FromMilliseconds(1), CaptureDirection.HostToDevice, "*IDN?\n"u8);
            writer.WriteChunk(TimeSpan.FromMilliseconds(3), CaptureDirection.DeviceToHost, "BENCHRUNNER,SIM-VNA,0001,1.0\n"u8);
            var block = new byte[1608];
            new Random(7).NextBytes(block);
            writer.WriteChunk(TimeSpan.FromMilliseconds(5), CaptureDirection.HostToDevice, "TRAC:DATA? S21\n"u8);
            writer.WriteChunk(TimeSpan.FromMilliseconds(9), CaptureDirection.DeviceToHost, [.. "#41608"u8, .. block, (byte)'\n']);
        }

        return path;
    }

    [Fact]
    public void Replay_WellFormedCapture_ShowsTheConversationInOrder()
    {
        using var dir = new TempDirectory();
        var path = WriteCapture(dir);

        var run = CliRun.Of("replay", path);

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("Connection  tcp 127.0.0.1:5025", run.Out);
        Assert.Contains("2 messages sent", run.Out);
        var idn = run.Out.IndexOf("*IDN?", StringComparison.Ordinal);
        var reply = run.Out.IndexOf("BENCHRUNNER,SIM-VNA,0001,1.0", StringComparison.Ordinal);
        Assert.True(idn > 0 && reply > idn);
        Assert.Matches(new Regex(@"reply\s+#41608.*\(1615 bytes\)"), run.Out);
    }

    [Fact]
    public void Replay_Json_GivesTheTimelineWithByteCounts()
    {
        using var dir = new TempDirectory();
        var path = WriteCapture(dir);

        var run = CliRun.Of("replay", path, "--json");

        Assert.Equal(0, run.ExitCode);
        using var doc = JsonDocument.Parse(run.Out);
        var timeline = doc.RootElement.GetProperty("timeline");
        Assert.Equal(5, timeline.GetArrayLength());
        Assert.Equal("event", timeline[0].GetProperty("kind").GetString());
        Assert.Equal(1615, timeline[4].GetProperty("bytes").GetInt32());
        Assert.Equal(6 + 15, doc.RootElement.GetProperty("bytes_sent").GetInt32());
        Assert.True(doc.RootElement.GetProperty("complete").GetBoolean());
    }

    [Fact]
    public void Replay_MalformedCapture_IsBadInputNamingTheLine()
    {
        using var dir = new TempDirectory();
        var path = WriteCapture(dir);
        var lines = File.ReadAllLines(path, Encoding.Latin1).ToList();
        lines.Add("not-a-time > *RST");
        File.WriteAllLines(path, lines, Encoding.Latin1);

        var run = CliRun.Of("replay", path);

        Assert.Equal(2, run.ExitCode);
        Assert.Matches(new Regex($@"vna\.capture:{lines.Count}:1: "), run.Error);
    }

    [Fact]
    public void Replay_MissingFile_IsBadInput()
    {
        var run = CliRun.Of("replay", "no-such.capture");

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("no-such.capture: no such file", run.Error);
    }
}
