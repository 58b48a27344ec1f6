using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Profiles;
using BenchRunner.Simulator.Protocols.Raw;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Protocols.Raw;

// The project's profile-driven client, loaded with each example profile of docs/examples/profiles,
// against the bench-dialect servers over an in-memory pair.
public class BenchProfileTests
{
    private static readonly NetworkSweep PreselectorSweep = new(Frequency.FromMegahertz(127.5), Frequency.FromMegahertz(147.5), 201);

    [Fact]
    public async Task BenchVna_ConnectsConfiguresAndAcquiresS21AndS11()
    {
        var vna = new FakeNetworkAnalyser();
        await using var served = ServedDevice.Start(new BenchVnaServer(vna));
        await using var instrument = new ProfileInstrument("vna", Profile("bench-vna.yaml"), served.Host);
        await instrument.ConnectAsync(CancellationToken.None).WaitAsync(TestLimits.Await);
        var na = instrument.GetCapability<INetworkAnalyser>()!;

        await na.ConfigureSweepAsync(new NetworkSweep(PreselectorSweep.Start, PreselectorSweep.Stop, 201, Frequency.FromKilohertz(1), 4),
            CancellationToken.None).WaitAsync(TestLimits.Await);
        var traces = await na.AcquireAsync([TraceQuantity.S21, TraceQuantity.S11], CancellationToken.None).WaitAsync(TestLimits.Await);

        Assert.Equal(new InstrumentIdentity("benchrunner", "sim-vna", "SIM-VNA-0001", "1.0"), instrument.Identity);
        Assert.Equal((127.5e6, 147.5e6, 201, 1e3, 4), (vna.Start.Hertz, vna.Stop.Hertz, vna.Points, vna.IfBandwidth.Hertz, vna.Averages));
        Assert.Equal(ProfileSessionState.Ready, instrument.State);
        var (s21, s11) = (traces[0], traces[1]);
        Assert.Equal(201, s21.Count);
        for (int i = 0; i < 201; i++)
        {
            // Seven significant digits on the wire; |S| ≤ 1 keeps each part within 5e-7.
            var expected = FakeNetworkAnalyser.S21(s21.Axis.Hertz[i]);
            Assert.Equal(expected.Real, s21.Samples[i].Real, 1e-6);
            Assert.Equal(expected.Imaginary, s21.Samples[i].Imaginary, 1e-6);
            Assert.Equal((1 - expected).Real, s11.Samples[i].Real, 1e-6);
        }

        // At the resonance of the series resonator S21 = 1 and S11 = 0 (Pozar, Microwave Engineering, Table 4.2).
        Assert.Equal(1, s21.Samples[100].Magnitude, 1e-6);
        Assert.Equal(0, s11.Samples[100].Magnitude, 1e-6);
    }

    [Fact]
    public async Task BenchVna_RefusedSetting_IsTheDevicesErrorAndTheSessionStaysInStep()
    {
        var vna = new FakeNetworkAnalyser();
        await using var served = ServedDevice.Start(new BenchVnaServer(vna));
        await using var instrument = new ProfileInstrument("vna", Profile("bench-vna.yaml"), served.Host);
        await instrument.ConnectAsync(CancellationToken.None).WaitAsync(TestLimits.Await);
        var na = instrument.GetCapability<INetworkAnalyser>()!;

        // 1601 points is the dialect's maximum.
        var e = await Assert.ThrowsAsync<InstrumentReportedException>(() => na.ConfigureSweepAsync(
            new NetworkSweep(Frequency.FromMegahertz(130), Frequency.FromMegahertz(145), 1602), CancellationToken.None).WaitAsync(TestLimits.Await));

        Assert.Equal(3, e.Code);
        Assert.Equal("value out of range", e.Text);
        Assert.Equal("band 130000000 145000000 1602", e.Command);
        Assert.Equal(ProfileSessionState.Ready, instrument.State);
        await na.ConfigureSweepAsync(PreselectorSweep, CancellationToken.None).WaitAsync(TestLimits.Await);
        Assert.Equal(201, Assert.Single(await na.AcquireAsync([TraceQuantity.S21], CancellationToken.None).WaitAsync(TestLimits.Await)).Count);
    }

    [Theory]
    [InlineData(301)]
    [InlineData(null)]
    public async Task BenchSa_ConfiguresAndAcquiresTheTraceInDbm(int? points)
    {
        var sa = new FakeSpectrumAnalyser();
        await using var served = ServedDevice.Start(new BenchSaServer(sa));
        await using var instrument = new ProfileInstrument("sa", Profile("bench-sa.yaml"), served.Host);
        await instrument.ConnectAsync(CancellationToken.None).WaitAsync(TestLimits.Await);
        var analyser = instrument.GetCapability<ISpectrumAnalyser>()!;

        await analyser.ConfigureAsync(new SpectrumSettings(
            FrequencyRange.Between(Frequency.FromMegahertz(136), Frequency.FromMegahertz(139)),
            Frequency.FromKilohertz(30), Ratio.FromDecibels(20), Level.FromDbm(-10), points), CancellationToken.None).WaitAsync(TestLimits.Await);
        var trace = await analyser.AcquireAsync(CancellationToken.None).WaitAsync(TestLimits.Await);

        // The profile's default-points is 401, the analyser's power-on value (docs/simulator-dialect.md).
        int expected = points ?? 401;
        Assert.Equal(new InstrumentIdentity("benchrunner", "sim-sa", "SIM-SA-0001", "1.0"), instrument.Identity);
        Assert.Equal((136e6, 139e6, 30e3, 20.0, -10.0, expected),
            (sa.Start.Hertz, sa.Stop.Hertz, sa.ResolutionBandwidth.Hertz, sa.InputAttenuation.Decibels, sa.ReferenceLevel.Dbm, sa.Points));
        Assert.Equal(expected, trace.Count);
        for (int i = 0; i < trace.Count; i++)
        {
            // Hundredths of a dBm on the wire: within half a hundredth.
            Assert.Equal(sa.LevelAt(trace.Axis.Hertz[i]), trace.LevelsDb[i], 0.005 + 1e-9);
        }

        Assert.Equal(FakeSpectrumAnalyser.ToneDbm, trace.LevelsDb.Max());
    }

    [Fact]
    public async Task BenchGen_SwitchesTheOutputOffOnConnect_ThenTakesEverySetting()
    {
        var generator = new FakeSignalGenerator();
        generator.SetOutput(true);
        await using var served = ServedDevice.Start(new BenchGenServer(generator));
        await using var instrument = new ProfileInstrument("gen", Profile("bench-gen.yaml"), served.Host);

        await instrument.ConnectAsync(CancellationToken.None).WaitAsync(TestLimits.Await);
        // The profile's on-connect "rf off" puts the output in a known state.
        Assert.False(generator.OutputOn);
        var gen = instrument.GetCapability<ISignalGenerator>()!;
        await gen.SetFrequencyAsync(Frequency.FromMegahertz(137.5), CancellationToken.None).WaitAsync(TestLimits.Await);
        await gen.SetLevelAsync(Level.FromDbm(-20), CancellationToken.None).WaitAsync(TestLimits.Await);
        await gen.SetOutputAsync(true, CancellationToken.None).WaitAsync(TestLimits.Await);

        Assert.Equal(new InstrumentIdentity("benchrunner", "sim-gen", "SIM-GEN-0001", "1.0"), instrument.Identity);
        Assert.Equal((137.5e6, -20.0, true), (generator.Frequency.Hertz, generator.Level.Dbm, generator.OutputOn));
    }

    private static DriverProfile Profile(string file) =>
        DriverProfile.Load(RepositoryFiles.PathOf(Path.Combine("docs", "examples", "profiles", file)));
}
