using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Profiles;
using BenchRunner.Instruments.Tests.Support;
using BenchRunner.Instruments.Transports;
using static BenchRunner.Instruments.Tests.Profiles.ProfileText;

namespace BenchRunner.Instruments.Tests.Profiles;

// A dialect without a prompt: settings acknowledged with "ok", data in dB and degrees
// ending at a line "end", read line by line.
public sealed class LineDialectTests
{
    private static readonly TimeSpan Limit = TimeSpan.FromSeconds(10);

    private static readonly DriverProfile Profile = DriverProfile.Parse(Lines(
        "profile: line-vna",
        "kinds: [network-analyser]",
        "framing: {acknowledgement: ok}",
        "identity: {maker: workshop, model: line-vna}",
        "error-reply: '^err: (?<text>.*)$'",
        "network-analyser:",
        "  setup: ['f1 {start:khz}', 'f2 {stop:khz}', 'n {points}']",
        "  read: {S21: s21?}",
        "  data:",
        "    columns: [freq-khz, db, deg]",
        "    frequency-tolerance: 1 Hz",
        "    end-line: end"), "line-vna.yaml");

    private static readonly NetworkSweep Sweep = new(Frequency.FromMegahertz(136), Frequency.FromMegahertz(139), 3);

    private static async Task<(ProfileInstrument Bench, ScriptedPeer Peer)> ConnectAsync(Func<string, IReadOnlyList<string>?> handler)
    {
        var (host, device) = InMemoryTransport.CreatePair();
        var peer = new ScriptedPeer(device, "\n", handler);
        var bench = new ProfileInstrument("vna2", Profile, host);
        await bench.ConnectAsync(CancellationToken.None).WaitAsync(Limit);
        return (bench, peer);
    }

    private static IReadOnlyList<string>? Good(string command) => command switch
    {
        "s21?" => ["136000 -3.0103 45", "137500 -20 -90", "139000 -6 180", "end"],
        _ => ["ok"],
    };

    [Fact]
    public async Task AcquireAsync_NoPrompt_ReadsLinesUpToTheEndLine()
    {
        var (bench, peer) = await ConnectAsync(Good);
        await using var _ = bench;
        await using var __ = peer;
        var na = bench.GetCapability<INetworkAnalyser>()!;

        await na.ConfigureSweepAsync(Sweep, CancellationToken.None).WaitAsync(Limit);
        var trace = Assert.Single(await na.AcquireAsync([TraceQuantity.S21], CancellationToken.None).WaitAsync(Limit));

        Assert.Equal(["f1 136000", "f2 139000", "n 3", "s21?"], peer.Received);
        Assert.Equal(new InstrumentIdentity("workshop", "line-vna", "0", "0"), bench.Identity);
        // REFERENCES: Touchstone 2.0 spec, DB format: (−3.0103 dB, 45°) → 0.5 + j0.5; (−20 dB, −90°) → −j0.1.
        Assert.Equal(0.5, trace.Samples[0].Real, 1e-5);
        Assert.Equal(0.5, trace.Samples[0].Imaginary, 1e-5);
        Assert.Equal(0, trace.Samples[1].Real, 1e-9);
        Assert.Equal(-0.1, trace.Samples[1].Imaginary, 1e-9);
        Assert.Equal(-20, trace.LevelsDb[1], 9);
    }

    [Fact]
    public async Task SettingAsync_ErrorInsteadOfAcknowledgement_RaisesTheDevicesText()
    {
        var (bench, peer) = await ConnectAsync(c => c.StartsWith("n ") ? ["err: too many points"] : Good(c));
        await using var _ = bench;
        await using var __ = peer;

        var e = await Assert.ThrowsAsync<InstrumentReportedException>(() =>
            bench.GetCapability<INetworkAnalyser>()!.ConfigureSweepAsync(Sweep, CancellationToken.None).WaitAsync(Limit));

        Assert.Equal(0, e.Code);
        Assert.Equal("too many points", e.Text);
        Assert.Equal("n 3", e.Command);
        Assert.Equal("vna2: the instrument refused the command: \"too many points\" (command \"n 3\") (received \"err: too many points\")", e.Message);
        Assert.Equal(ProfileSessionState.Ready, bench.State);
    }

    [Fact]
    public async Task SettingAsync_UnexpectedReply_NamesCommandAndReply()
    {
        var (bench, peer) = await ConnectAsync(c => c.StartsWith("f2") ? ["what?"] : Good(c));
        await using var _ = bench;
        await using var __ = peer;

        var e = await Assert.ThrowsAsync<InstrumentException>(() =>
            bench.GetCapability<INetworkAnalyser>()!.ConfigureSweepAsync(Sweep, CancellationToken.None).WaitAsync(Limit));

        Assert.Equal("vna2: unexpected reply to a setting; expected \"ok\" (command \"f2 139000\") (received \"what?\")", e.Message);
        // Without a prompt, what else the device sent cannot be known: the session is out of step.
        Assert.Equal(ProfileSessionState.Broken, bench.State);
    }

    [Fact]
    public async Task AcquireAsync_MalformedDataLine_NamesTheLineAndBreaksTheSession()
    {
        var (bench, peer) = await ConnectAsync(c => c == "s21?" ? ["136000 -3 45", "137500 -20", "139000 -6 180", "end"] : Good(c));
        await using var _ = bench;
        await using var __ = peer;
        var na = bench.GetCapability<INetworkAnalyser>()!;
        await na.ConfigureSweepAsync(Sweep, CancellationToken.None).WaitAsync(Limit);

        var e = await Assert.ThrowsAsync<InstrumentException>(() => na.AcquireAsync([TraceQuantity.S21], CancellationToken.None).WaitAsync(Limit));

        Assert.Equal("s21?", e.Command);
        Assert.Equal("137500 -20", e.Reply);
        Assert.Contains("unreadable data: line 2 \"137500 -20\" has 2 fields, expected 3", e.Message);
        Assert.True(e.IsTransient);
        Assert.Equal(ProfileSessionState.Broken, bench.State);
    }

    [Fact]
    public async Task AcquireAsync_FrequencyOffTheSweep_IsRefusedNamingThePoint()
    {
        var (bench, peer) = await ConnectAsync(c => c == "s21?" ? ["136000 -3 45", "137600 -20 0", "139000 -6 180", "end"] : Good(c));
        await using var _ = bench;
        await using var __ = peer;
        var na = bench.GetCapability<INetworkAnalyser>()!;
        await na.ConfigureSweepAsync(Sweep, CancellationToken.None).WaitAsync(Limit);

        var e = await Assert.ThrowsAsync<InstrumentException>(() => na.AcquireAsync([TraceQuantity.S21], CancellationToken.None).WaitAsync(Limit));

        Assert.Contains("point 2 is at 137.6 MHz, expected 137.5 MHz within 1 Hz", e.Message);
        Assert.Equal("vna2", e.Instrument);
    }

    [Fact]
    public async Task AcquireAsync_ParameterWithoutReadCommand_IsAnArgumentError()
    {
        var (bench, peer) = await ConnectAsync(Good);
        await using var _ = bench;
        await using var __ = peer;
        var na = bench.GetCapability<INetworkAnalyser>()!;
        await na.ConfigureSweepAsync(Sweep, CancellationToken.None).WaitAsync(Limit);

        var e = await Assert.ThrowsAsync<ArgumentException>(() => na.AcquireAsync([TraceQuantity.S11], CancellationToken.None));

        Assert.Contains("cannot read S11; it reads S21", e.Message);
    }

    [Fact]
    public async Task ConnectAsync_AfterABrokenSession_BringsItBack()
    {
        bool garble = true;
        var (bench, peer) = await ConnectAsync(c => c.StartsWith("f2") && garble ? ["what?"] : Good(c));
        await using var _ = bench;
        await using var __ = peer;
        var na = bench.GetCapability<INetworkAnalyser>()!;
        await Assert.ThrowsAsync<InstrumentException>(() => na.ConfigureSweepAsync(Sweep, CancellationToken.None).WaitAsync(Limit));
        Assert.Equal(ProfileSessionState.Broken, bench.State);
        garble = false;

        await bench.ConnectAsync(CancellationToken.None).WaitAsync(Limit);
        await na.ConfigureSweepAsync(Sweep, CancellationToken.None).WaitAsync(Limit);

        Assert.Equal(ProfileSessionState.Ready, bench.State);
    }
}
