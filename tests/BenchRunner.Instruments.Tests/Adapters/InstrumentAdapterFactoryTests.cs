using System.Numerics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Adapters;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Profiles;
using BenchRunner.Instruments.Scpi;
using BenchRunner.Instruments.Tests.Profiles;
using BenchRunner.Instruments.Tests.Support;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Tests.Adapters;

public class InstrumentAdapterFactoryTests
{
    private static readonly CancellationToken None = CancellationToken.None;

    // The demo preselector's band: 136 to 139 MHz in 201 points.
    private static readonly NetworkSweep Sweep = new(Frequency.FromMegahertz(136), Frequency.FromMegahertz(139), 201);

    private static readonly string[] DefaultSettingHeaders =
    [
        "SENSe:FREQuency:STARt", "SENSe:FREQuency:STOP", "SENSe:SWEep:POINts", "SENSe:BANDwidth:RESolution",
        "SENSe:AVERage:COUNt", "SENSe:AVERage:STATe", "INITiate:IMMediate", "INPut:ATTenuation", "DISPlay:WINDow:TRACe:Y:RLEVel",
        "SOURce:FREQuency", "SOURce:POWer", "OUTPut:STATe",
    ];

    // Values exactly representable as float32, so that REAL,32 gives them back unchanged.
    private static double[] ComplexPattern(int points) =>
        Enumerable.Range(0, points).SelectMany(i => new[] { 0.5 - i / 1024.0, -i / 2048.0 }).ToArray();

    private static (InMemoryTransport Host, InMemoryTransport Device) Pair() => InMemoryTransport.CreatePair("factory test");

    [Fact]
    public async Task Create_RawProfile_BuildsAProfileInstrument()
    {
        var (host, _) = Pair();

        await using var instrument = InstrumentAdapterFactory.Create("vna", ExampleProfiles.Vna, host);

        var raw = Assert.IsType<ProfileInstrument>(instrument);
        Assert.Same(ExampleProfiles.Vna, raw.Profile);
        Assert.Equal("vna", raw.Name);
        Assert.NotNull(raw.GetCapability<INetworkAnalyser>());
    }

    [Fact]
    public async Task Create_ScpiProfile_BuildsAScpiInstrumentWithTheProfilesCommandsOptionsAndLimits()
    {
        var profile = ExampleProfiles.ScpiVna;
        var (host, _) = Pair();

        await using var instrument = InstrumentAdapterFactory.Create("vna", profile, host);

        var scpi = Assert.IsType<ScpiInstrument>(instrument);
        Assert.Same(profile.ScpiCommands, scpi.Commands);
        Assert.Same(profile.ScpiOptions, scpi.Options);
        Assert.Equal(profile.Limits, scpi.Limits);
        Assert.NotNull(scpi.GetCapability<INetworkAnalyser>());
        Assert.Null(scpi.GetCapability<ISignalGenerator>());
    }

    [Fact]
    public async Task Create_NoProfile_ConnectsAndIdentifiesOnly()
    {
        var (device, host) = ScriptedScpiDevice.Start();
        await using var _ = device;

        await using var instrument = InstrumentAdapterFactory.Create("unknown", null, host);
        await instrument.ConnectAsync(None).Bounded();

        var scpi = Assert.IsType<ScpiInstrument>(instrument);
        Assert.True(scpi.Commands.IdentificationOnly);
        Assert.Equal(["*CLS", "*IDN?", "SYSTem:ERRor?"], device.Received);
        Assert.Equal(new InstrumentIdentity("Demo Bench Works", "Virtual Analyser 2", "0", "1.0.3"), instrument.Identity);
        Assert.Null(instrument.GetCapability<INetworkAnalyser>());
        Assert.Null(instrument.GetCapability<ISpectrumAnalyser>());
        Assert.Null(instrument.GetCapability<ISignalGenerator>());
        Assert.Equal(InstrumentLimits.None, instrument.Limits);
    }

    [Fact]
    public async Task Create_ScpiVnaProfile_SweepsAgainstAScriptedScpiPeer()
    {
        var (device, host) = ScriptedScpiDevice.Start();
        await using var _ = device;
        device.Accept(DefaultSettingHeaders);
        var pattern = ComplexPattern(201);
        device.AnswerNumbers("TRACe:DATA? S21", () => pattern);

        await using var instrument = InstrumentAdapterFactory.Create("vna", ExampleProfiles.ScpiVna, host);
        await instrument.ConnectAsync(None).Bounded();
        var analyser = instrument.GetCapability<INetworkAnalyser>()!;
        await analyser.ConfigureSweepAsync(Sweep, None).Bounded();
        var traces = await analyser.AcquireAsync([TraceQuantity.S21], None).Bounded();

        var trace = Assert.Single(traces);
        Assert.Equal(pattern.Chunk(2).Select(p => new Complex(p[0], p[1])), trace.Samples);
        Assert.True(trace.Axis.SamePointsAs(FrequencyAxis.Linear(Frequency.FromMegahertz(136), Frequency.FromMegahertz(139), 201)));
        Assert.Equal(
            ["*CLS", "*IDN?", "FORMat:DATA REAL,32", "FORMat:BORDer NORMal",
             "SENSe:FREQuency:STARt 136000000", "SENSe:FREQuency:STOP 139000000", "SENSe:SWEep:POINts 201",
             "INITiate:IMMediate", "*OPC?", "TRACe:DATA? S21"],
            device.Received.Where(c => c != "SYSTem:ERRor?"));
        // 201 complex points as float32 pairs: 1608 bytes, header #41608 (REFERENCES: IEEE 488.2 §8.7.9).
        Assert.StartsWith("#41608", System.Text.Encoding.Latin1.GetString(device.Sent[^2]));
        Assert.Equal(ScpiDataFormat.Real32, device.Format);
    }

    [Fact]
    public async Task Create_ScpiVnaProfile_RefusesAParameterItLeavesOutBeforeSendingAnything()
    {
        var (device, host) = ScriptedScpiDevice.Start();
        await using var _ = device;
        device.Accept(DefaultSettingHeaders);

        await using var instrument = InstrumentAdapterFactory.Create("vna", ExampleProfiles.ScpiVna, host);
        await instrument.ConnectAsync(None).Bounded();
        var analyser = instrument.GetCapability<INetworkAnalyser>()!;
        await analyser.ConfigureSweepAsync(Sweep, None).Bounded();
        int sent = device.Received.Count;

        var error = await Assert.ThrowsAsync<InstrumentException>(() => analyser.AcquireAsync([TraceQuantity.S22], None).Bounded());

        Assert.Contains("the command set has no command for fetching S22", error.Message);
        Assert.False(error.IsTransient);
        Assert.Equal(sent, device.Received.Count);
    }

    [Fact]
    public async Task Create_ProfileWithAnOverriddenCommand_SendsThatCommand()
    {
        var profile = DriverProfile.Parse(ScpiProfileText.With(
            "network-analyser:",
            "  start: SENS:FREQ:STAR {hz}",
            "  read: {S21: 'TRACe:DATA? TR2'}",
            "scpi:",
            "  data-format: ascii"), "p.yaml");
        var (device, host) = ScriptedScpiDevice.Start();
        await using var _ = device;
        device.Accept(DefaultSettingHeaders);
        device.Accept("SENS:FREQ:STAR");
        device.AnswerNumbers("TRACe:DATA? TR2", () => ComplexPattern(201));

        await using var instrument = InstrumentAdapterFactory.Create("vna", profile, host);
        await instrument.ConnectAsync(None).Bounded();
        var analyser = instrument.GetCapability<INetworkAnalyser>()!;
        await analyser.ConfigureSweepAsync(Sweep, None).Bounded();
        var trace = Assert.Single(await analyser.AcquireAsync([TraceQuantity.S21], None).Bounded());

        Assert.Equal("136000000", device.Setting("SENS:FREQ:STAR"));
        Assert.Null(device.Setting("SENSe:FREQuency:STARt"));
        Assert.Contains("FORMat:DATA ASCii", device.Received);
        Assert.DoesNotContain(device.Received, c => c.StartsWith("FORMat:BORDer", StringComparison.Ordinal));
        Assert.Contains("TRACe:DATA? TR2", device.Received);
        Assert.Equal(201, trace.Count);
    }

    [Fact]
    public async Task Create_ScpiSaProfile_AcquiresAnAsciiPowerTrace()
    {
        var (device, host) = ScriptedScpiDevice.Start();
        await using var _ = device;
        device.Accept(DefaultSettingHeaders);
        var levels = Enumerable.Range(0, 401).Select(i => i == 200 ? -20.25 : -90.5).ToArray();
        device.AnswerNumbers("TRACe:DATA? POWer", () => levels);

        await using var instrument = InstrumentAdapterFactory.Create("sa", ExampleProfiles.ScpiSa, host);
        await instrument.ConnectAsync(None).Bounded();
        var analyser = instrument.GetCapability<ISpectrumAnalyser>()!;
        await analyser.ConfigureAsync(new SpectrumSettings(
            FrequencyRange.AroundCentre(Frequency.FromMegahertz(137.5), Frequency.FromMegahertz(3)),
            Frequency.FromKilohertz(10), Ratio.FromDecibels(10), Level.FromDbm(-10), 401), None).Bounded();
        var trace = await analyser.AcquireAsync(None).Bounded();

        Assert.Equal(levels, trace.LevelsDb.ToArray());
        Assert.Equal(137.5e6, trace.Axis.Hertz[200], 3);
        Assert.Contains("FORMat:DATA ASCii", device.Received);
        Assert.Equal(ScpiDataFormat.Ascii, device.Format);
    }

    [Fact]
    public async Task Create_ScpiGenProfile_SetsTheGeneratorAndRefusesALevelAboveItsLimit()
    {
        var (device, host) = ScriptedScpiDevice.Start();
        await using var _ = device;
        device.Accept(DefaultSettingHeaders);

        await using var instrument = InstrumentAdapterFactory.Create("gen", ExampleProfiles.ScpiGen, host);
        await instrument.ConnectAsync(None).Bounded();
        var generator = instrument.GetCapability<ISignalGenerator>()!;
        await generator.SetFrequencyAsync(Frequency.FromMegahertz(137.5), None).Bounded();
        await generator.SetLevelAsync(Level.FromDbm(-20), None).Bounded();
        await generator.SetOutputAsync(true, None).Bounded();

        Assert.Equal(("137500000", "-20", "ON"), (device.Setting("SOURce:FREQuency"), device.Setting("SOURce:POWer"), device.Setting("OUTPut:STATe")));
        Assert.DoesNotContain(device.Received, c => c.StartsWith("FORMat:", StringComparison.Ordinal) || c == "*RST");
        await Assert.ThrowsAsync<ArgumentOutOfRangeException>(() => generator.SetLevelAsync(Level.FromDbm(3), None).Bounded());
        Assert.Equal("-20", device.Setting("SOURce:POWer"));
    }

    [Fact]
    public async Task Create_ProfileAskingForReset_ResetsOnConnect()
    {
        var profile = DriverProfile.Parse(ScpiProfileText.Of("signal-generator", "scpi: {reset-on-connect: true}"), "p.yaml");
        var (device, host) = ScriptedScpiDevice.Start();
        await using var _ = device;

        await using var instrument = InstrumentAdapterFactory.Create("gen", profile, host);
        await instrument.ConnectAsync(None).Bounded();

        Assert.Equal(1, device.Resets);
    }

    [Fact]
    public void Create_EmptyName_IsRefused()
    {
        var (host, _) = Pair();

        Assert.Throws<ArgumentException>(() => InstrumentAdapterFactory.Create(" ", null, host));
    }

    [Fact]
    public void ProfileInstrument_ScpiProfile_IsRefused()
    {
        var (host, _) = Pair();

        var error = Assert.Throws<ArgumentException>(() => new ProfileInstrument("vna", ExampleProfiles.ScpiVna, host));

        Assert.Contains("adapter: raw profiles only", error.Message);
    }
}
