using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Profiles;
using BenchRunner.Instruments.Tests.Support;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Tests.Profiles;

// The profile-driven instrument against a scripted peer speaking the example dialect
// (docs/simulator-dialect.md) over an in-memory pair.
public sealed class ProfileInstrumentTests
{
    private static readonly TimeSpan Limit = TimeSpan.FromSeconds(10);

    private static readonly NetworkSweep PreselectorSweep =
        new(Frequency.FromMegahertz(127.5), Frequency.FromMegahertz(147.5), 201);

    [Fact]
    public async Task ConnectAsync_BenchVna_ReadsTheIdentity()
    {
        await using var bench = Vna(out _, out var peer);

        await bench.ConnectAsync(CancellationToken.None).WaitAsync(Limit);

        Assert.Equal(new InstrumentIdentity("benchrunner", "sim-vna", "SIM-VNA-0001", "1.0"), bench.Identity);
        Assert.Equal(ProfileSessionState.Ready, bench.State);
        Assert.Equal(["who"], peer.Received);
    }

    [Fact]
    public async Task ConfigureSweepAsync_BenchVna_SendsTheBandInWholeHertz()
    {
        await using var bench = Vna(out _, out var peer);
        await bench.ConnectAsync(CancellationToken.None).WaitAsync(Limit);
        var na = bench.GetCapability<INetworkAnalyser>()!;

        await na.ConfigureSweepAsync(new NetworkSweep(Frequency.FromMegahertz(127.5), Frequency.FromMegahertz(147.5), 201,
            ifBandwidth: Frequency.FromKilohertz(1), averages: 4), CancellationToken.None).WaitAsync(Limit);

        Assert.Equal(["who", "band 127500000 147500000 201", "ifbw 1000", "avg 4"], peer.Received);
    }

    [Fact]
    public async Task AcquireAsync_BenchVna_ReturnsS21AndS11OnTheSweepAxis()
    {
        await using var bench = Vna(out var model, out var peer);
        await bench.ConnectAsync(CancellationToken.None).WaitAsync(Limit);
        var na = bench.GetCapability<INetworkAnalyser>()!;
        await na.ConfigureSweepAsync(PreselectorSweep, CancellationToken.None).WaitAsync(Limit);

        var traces = await na.AcquireAsync([TraceQuantity.S21, TraceQuantity.S11], CancellationToken.None).WaitAsync(Limit);

        Assert.Equal([TraceQuantity.S21, TraceQuantity.S11], traces.Select(t => t.Quantity));
        var s21 = traces[0];
        var s11 = traces[1];
        Assert.Equal(201, s21.Count);
        Assert.Equal(137.5e6, s21.Axis.Hertz[100], 6);
        // At the resonance of the series resonator S21 = 1 (0 dB) and S11 = 0: series-impedance
        // two-port, Pozar, Microwave Engineering, Table 4.2 (S21 = 2Z0/(2Z0+Z), S11 = Z/(Z+2Z0)).
        Assert.Equal(1, s21.Samples[100].Real, 1e-6);
        Assert.Equal(0, s11.Samples[100].Magnitude, 1e-6);
        for (int i = 0; i < 201; i += 25)
        {
            var expected = BenchVnaModel.S21(model.PointHertz(i));
            // The dialect prints seven significant digits.
            Assert.Equal(expected.Real, s21.Samples[i].Real, 1e-6);
            Assert.Equal(expected.Imaginary, s21.Samples[i].Imaginary, 1e-6);
            Assert.Equal((1 - expected).Real, s11.Samples[i].Real, 1e-6);
        }

        Assert.Equal(["who", "band 127500000 147500000 201", "go", "data s21", "data s11"], peer.Received);
    }

    [Fact]
    public async Task AcquireAsync_DeviceRefusesTheCommand_RaisesItsErrorWithInstrumentAndCommand()
    {
        await using var bench = Vna(out _, out _);
        await bench.ConnectAsync(CancellationToken.None).WaitAsync(Limit);
        var na = bench.GetCapability<INetworkAnalyser>()!;
        // 1601 points is the dialect's maximum; the device refuses 1602.
        var refused = new NetworkSweep(Frequency.FromMegahertz(130), Frequency.FromMegahertz(145), 1602);

        var e = await Assert.ThrowsAsync<InstrumentReportedException>(() =>
            na.ConfigureSweepAsync(refused, CancellationToken.None).WaitAsync(Limit));

        Assert.Equal(3, e.Code);
        Assert.Equal("value out of range", e.Text);
        Assert.Equal("vna", e.Instrument);
        Assert.Equal("band 130000000 145000000 1602", e.Command);
        Assert.Equal("err 3 value out of range", e.Reply);
        Assert.False(e.IsTransient);
        Assert.StartsWith("vna: the instrument refused the command with error 3: \"value out of range\"", e.Message);
        // A refusal read up to the prompt leaves the conversation in step.
        Assert.Equal(ProfileSessionState.Ready, bench.State);
        await na.ConfigureSweepAsync(PreselectorSweep, CancellationToken.None).WaitAsync(Limit);
    }

    [Fact]
    public async Task AcquireAsync_EchoedCommands_AreNotTakenForReplies()
    {
        // The bench network analyser echoes every command; were the echo not discarded,
        // "go" would be an unexpected reply and "data s21" a malformed data line.
        await using var bench = Vna(out _, out _);
        Assert.True(bench.Profile.Framing.Echo);
        await bench.ConnectAsync(CancellationToken.None).WaitAsync(Limit);
        var na = bench.GetCapability<INetworkAnalyser>()!;
        await na.ConfigureSweepAsync(PreselectorSweep, CancellationToken.None).WaitAsync(Limit);

        var traces = await na.AcquireAsync([TraceQuantity.S21], CancellationToken.None).WaitAsync(Limit);

        Assert.Equal(201, Assert.Single(traces).Count);
    }

    [Fact]
    public async Task AcquireAsync_DeviceStaysSilent_TimesOutNamingTheCommandAndBreaksTheSession()
    {
        var clock = new ManualTimeProvider();
        var (host, device) = InMemoryTransport.CreatePair();
        var model = new BenchVnaModel();
        await using var peer = new ScriptedPeer(device, "\n", model.Handle, "br-vna> ", echo: true);
        await using var bench = new ProfileInstrument("vna", ExampleProfiles.Vna, host, clock);
        await bench.ConnectAsync(CancellationToken.None).WaitAsync(Limit);
        var na = bench.GetCapability<INetworkAnalyser>()!;
        model.Silent.Add("band 127500000 147500000 201");

        var configure = na.ConfigureSweepAsync(PreselectorSweep, CancellationToken.None);
        await clock.WaitForTimersAsync(1);
        clock.Advance(TimeSpan.FromSeconds(2));
        var e = await Assert.ThrowsAsync<InstrumentTimeoutException>(() => configure.WaitAsync(Limit));

        Assert.Equal("vna", e.Instrument);
        Assert.Equal("band 127500000 147500000 201", e.Command);
        Assert.True(e.IsTransient);
        Assert.Contains("no complete reply within 2000 ms", e.Message);
        Assert.Equal(ProfileSessionState.Broken, bench.State);
        var next = await Assert.ThrowsAsync<InstrumentException>(() => na.ConfigureSweepAsync(PreselectorSweep, CancellationToken.None).WaitAsync(Limit));
        Assert.Contains("connect again", next.Message);
    }

    [Fact]
    public async Task ConfigureSweepAsync_OutsideTheDeclaredRange_IsRefusedBeforeSending()
    {
        await using var bench = Vna(out _, out var peer);
        await bench.ConnectAsync(CancellationToken.None).WaitAsync(Limit);
        var na = bench.GetCapability<INetworkAnalyser>()!;

        await Assert.ThrowsAsync<ArgumentOutOfRangeException>(() =>
            na.ConfigureSweepAsync(new NetworkSweep(Frequency.FromMegahertz(1000), Frequency.FromMegahertz(2000), 11), CancellationToken.None));

        Assert.Equal(["who"], peer.Received);
    }

    [Fact]
    public async Task GetCapability_BenchVna_OffersOnlyTheNetworkAnalyser()
    {
        await using var bench = Vna(out _, out _);

        Assert.NotNull(bench.GetCapability<INetworkAnalyser>());
        Assert.Null(bench.GetCapability<ISpectrumAnalyser>());
        Assert.Null(bench.GetCapability<ISignalGenerator>());
    }

    [Fact]
    public async Task AcquireAsync_BenchSa_ReturnsTheScaledPowerTrace()
    {
        var (host, device) = InMemoryTransport.CreatePair();
        var model = new BenchSaModel();
        await using var peer = new ScriptedPeer(device, "\n", model.Handle, "br-sa> ");
        await using var bench = new ProfileInstrument("sa", ExampleProfiles.Sa, host);
        await bench.ConnectAsync(CancellationToken.None).WaitAsync(Limit);
        var sa = bench.GetCapability<ISpectrumAnalyser>()!;
        var settings = new SpectrumSettings(FrequencyRange.AroundCentre(Frequency.FromMegahertz(137.5), Frequency.FromMegahertz(10)),
            Frequency.FromKilohertz(30), Ratio.FromDecibels(10), Level.FromDbm(-20), Points: 101);

        await sa.ConfigureAsync(settings, CancellationToken.None).WaitAsync(Limit);
        var trace = await sa.AcquireAsync(CancellationToken.None).WaitAsync(Limit);

        Assert.Equal(new InstrumentIdentity("benchrunner", "sim-sa", "SIM-SA-0001", "1.0"), bench.Identity);
        Assert.Equal(["span 132500000 142500000", "rbw 30000", "att 10", "ref -20", "pts 101"], model.Settings);
        Assert.Equal(101, trace.Count);
        Assert.Equal(-30.0, trace.LevelsDb[50], 9);   // "-3000" hundredths of a dBm
        Assert.Equal(-90.0, trace.LevelsDb[0], 9);
        Assert.Equal(137.5e6, trace.Axis.Hertz[50], 3);
    }

    [Fact]
    public async Task AcquireAsync_BenchSaWithoutPointCount_UsesTheProfileDefault()
    {
        var (host, device) = InMemoryTransport.CreatePair();
        var model = new BenchSaModel();
        await using var peer = new ScriptedPeer(device, "\n", model.Handle, "br-sa> ");
        await using var bench = new ProfileInstrument("sa", ExampleProfiles.Sa, host);
        await bench.ConnectAsync(CancellationToken.None).WaitAsync(Limit);
        var sa = bench.GetCapability<ISpectrumAnalyser>()!;

        await sa.ConfigureAsync(new SpectrumSettings(FrequencyRange.Between(Frequency.FromMegahertz(130), Frequency.FromMegahertz(145)),
            Frequency.FromKilohertz(100), Ratio.FromDecibels(0), Level.FromDbm(0)), CancellationToken.None).WaitAsync(Limit);
        var trace = await sa.AcquireAsync(CancellationToken.None).WaitAsync(Limit);

        Assert.Contains("pts 401", model.Settings);
        Assert.Equal(401, trace.Count);
    }

    [Fact]
    public async Task Generator_BenchGen_SendsEachSettingAndChecksTheAcknowledgement()
    {
        var (host, device) = InMemoryTransport.CreatePair();
        var model = new BenchGenModel();
        await using var peer = new ScriptedPeer(device, "\r", model.Handle);
        await using var bench = new ProfileInstrument("gen", ExampleProfiles.Gen, host);
        await bench.ConnectAsync(CancellationToken.None).WaitAsync(Limit);
        var gen = bench.GetCapability<ISignalGenerator>()!;

        await gen.SetFrequencyAsync(Frequency.FromMegahertz(137.5), CancellationToken.None).WaitAsync(Limit);
        await gen.SetLevelAsync(Level.FromDbm(-30), CancellationToken.None).WaitAsync(Limit);
        await gen.SetOutputAsync(true, CancellationToken.None).WaitAsync(Limit);

        Assert.Equal(["who", "rf off", "tone 137.5", "lvl -30", "rf on"], peer.Received);
        Assert.Equal(137.5, model.FrequencyMegahertz);
        Assert.Equal(-30, model.LevelDbm);
        Assert.True(model.Output);
        Assert.Equal("SIM-GEN-0001", bench.Identity.Serial);
    }

    [Fact]
    public async Task Generator_DeviceRefusesWithoutAPrompt_RaisesItsErrorAndStaysInStep()
    {
        var (host, device) = InMemoryTransport.CreatePair();
        var model = new BenchGenModel { HighestLevelDbm = -10 };
        await using var peer = new ScriptedPeer(device, "\r", model.Handle);
        await using var bench = new ProfileInstrument("gen", ExampleProfiles.Gen, host);
        await bench.ConnectAsync(CancellationToken.None).WaitAsync(Limit);
        var gen = bench.GetCapability<ISignalGenerator>()!;

        var e = await Assert.ThrowsAsync<InstrumentReportedException>(() => gen.SetLevelAsync(Level.FromDbm(-5), CancellationToken.None).WaitAsync(Limit));

        Assert.Equal("gen", e.Instrument);
        Assert.Equal("lvl -5", e.Command);
        Assert.Equal(3, e.Code);
        await gen.SetLevelAsync(Level.FromDbm(-20), CancellationToken.None).WaitAsync(Limit);
        Assert.Equal(-20, model.LevelDbm);
    }

    [Fact]
    public async Task Generator_LevelAboveTheDeclaredMaximum_IsRefusedBeforeSending()
    {
        var (host, device) = InMemoryTransport.CreatePair();
        await using var peer = new ScriptedPeer(device, "\r", new BenchGenModel().Handle);
        await using var bench = new ProfileInstrument("gen", ExampleProfiles.Gen, host);
        await bench.ConnectAsync(CancellationToken.None).WaitAsync(Limit);

        await Assert.ThrowsAsync<ArgumentOutOfRangeException>(() =>
            bench.GetCapability<ISignalGenerator>()!.SetLevelAsync(Level.FromDbm(3), CancellationToken.None));

        Assert.Equal(["who", "rf off"], peer.Received);
    }

    [Fact]
    public async Task Generator_SettleDelay_IsWaitedOnTheInjectedClock()
    {
        var clock = new ManualTimeProvider();
        var (host, device) = InMemoryTransport.CreatePair();
        await using var peer = new ScriptedPeer(device, "\r", new BenchGenModel().Handle);
        await using var bench = new ProfileInstrument("gen", ExampleProfiles.Gen, host, clock);
        await bench.ConnectAsync(CancellationToken.None).WaitAsync(Limit);

        var set = bench.GetCapability<ISignalGenerator>()!.SetOutputAsync(true, CancellationToken.None);
        // The acknowledgement's read timer has gone; the settle delay's timer is left.
        await WaitForSettleTimerAsync(clock, peer, "rf on");
        clock.Advance(TimeSpan.FromMilliseconds(19));
        await Task.Delay(50);
        Assert.False(set.IsCompleted);
        clock.Advance(TimeSpan.FromMilliseconds(1));
        await set.WaitAsync(Limit);
    }

    [Fact]
    public async Task Operations_BeforeConnect_AreRefused()
    {
        await using var bench = Vna(out _, out _);

        await Assert.ThrowsAsync<InvalidOperationException>(() =>
            bench.GetCapability<INetworkAnalyser>()!.ConfigureSweepAsync(PreselectorSweep, CancellationToken.None));
    }

    private static ProfileInstrument Vna(out BenchVnaModel model, out ScriptedPeer peer)
    {
        var (host, device) = InMemoryTransport.CreatePair();
        model = new BenchVnaModel();
        peer = new ScriptedPeer(device, "\n", model.Handle, "br-vna> ", echo: true);
        return new ProfileInstrument("vna", ExampleProfiles.Vna, host);
    }

    private static async Task WaitForSettleTimerAsync(ManualTimeProvider clock, ScriptedPeer peer, string command)
    {
        var deadline = DateTime.UtcNow + Limit;
        while (!(peer.Received.Contains(command) && clock.PendingTimerCount == 1 && await StableAsync(clock)))
        {
            if (DateTime.UtcNow > deadline)
            {
                throw new TimeoutException("The settle delay never started.");
            }

            await Task.Delay(5);
        }
    }

    private static async Task<bool> StableAsync(ManualTimeProvider clock)
    {
        await Task.Delay(20);
        return clock.PendingTimerCount == 1;
    }
}
