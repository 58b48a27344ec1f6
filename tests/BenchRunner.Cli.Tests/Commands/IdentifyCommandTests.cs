using System.Net;
using System.Net.Sockets;
using System.Text.Json;
using BenchRunner.Cli.Tests.Support;

namespace BenchRunner.Cli.Tests.Commands;

public sealed class IdentifyCommandTests
{
    [Fact]
    public async Task Identify_ScpiDeviceOverTcp_ShowsTheFourIdentityFields()
    {
        await using var device = new LoopbackScpiDevice();

        var run = CliRun.Of("identify", device.Connection);

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("Maker         BENCHRUNNER", run.Out);
        Assert.Contains("Model         TEST-DEVICE", run.Out);
        Assert.Contains("Serial        0042", run.Out);
        Assert.Contains("Firmware      1.2", run.Out);
        Assert.Contains("identification only", run.Out);
    }

    [Fact]
    public async Task Identify_Recorded_ReplaysToTheSameIdentityWithNoDevice()
    {
        using var dir = new TempDirectory();
        var capture = dir.PathOf("idn.capture");
        await using (var device = new LoopbackScpiDevice())
        {
            Assert.Equal(0, CliRun.Of("identify", device.Connection, "--record", capture).ExitCode);
        }

        var replayed = CliRun.Of("identify", $"replay:{capture}", "--json");

        Assert.Equal(0, replayed.ExitCode);
        using var doc = JsonDocument.Parse(replayed.Out);
        Assert.Equal("TEST-DEVICE", doc.RootElement.GetProperty("model").GetString());
        Assert.Equal("0042", doc.RootElement.GetProperty("serial").GetString());
        var shown = CliRun.Of("replay", capture);
        Assert.Equal(0, shown.ExitCode);
        Assert.Contains("*IDN?", shown.Out);
        Assert.Contains(LoopbackScpiDevice.Identity, shown.Out);
    }

    [Fact]
    public void Identify_RecordingOverAnExistingFile_IsRefused()
    {
        using var dir = new TempDirectory();
        var capture = dir.Write("taken.capture", "keep me");

        var run = CliRun.Of("identify", "tcp:127.0.0.1:9", "--record", capture);

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("exists already", run.Error);
        Assert.Equal("keep me", File.ReadAllText(capture));
    }

    [Fact]
    public void Identify_NobodyListening_IsAnInstrumentFailureNamingHostAndPort()
    {
        // A port that was free a moment ago: nothing listens there now.
        var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        int port = ((IPEndPoint)listener.LocalEndpoint).Port;
        listener.Stop();

        var run = CliRun.Of("identify", $"tcp:127.0.0.1:{port}");

        Assert.Equal(3, run.ExitCode);
        Assert.Contains($"127.0.0.1:{port}", run.Error);
    }

    [Fact]
    public void Identify_MalformedConnection_IsBadInput()
    {
        var run = CliRun.Of("identify", "tcp:127.0.0.1");

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("is not a connection", run.Error);
    }

    [Fact]
    public void Identify_MalformedProfile_IsBadInputWithItsLine()
    {
        using var dir = new TempDirectory();
        var profile = dir.Write("bad.yaml", "profile: bad\nadapter: telepathy\n");

        var run = CliRun.Of("identify", "tcp:127.0.0.1:9", "--profile", profile);

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("bad.yaml:2:", run.Error);
    }
}
