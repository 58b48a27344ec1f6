using System.Numerics;
using System.Text;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Scpi;
using BenchRunner.Instruments.Tests.Support;

namespace BenchRunner.Instruments.Tests.Scpi;

public class ScpiInstrumentTests
{
    private static readonly CancellationToken None = CancellationToken.None;

    // The demo preselector's band: 136 to 139 MHz in 201 points.
    private static readonly NetworkSweep Sweep = new(Frequency.FromMegahertz(136), Frequency.FromMegahertz(139), 201);

    private static readonly string[] SweepHeaders =
    [
        "SENSe:FREQuency:STARt", "SENSe:FREQuency:STOP", "SENSe:SWEep:POINts", "SENSe:BANDwidth:RESolution",
        "SENSe:AVERage:COUNt", "SENSe:AVERage:STATe", "INITiate:IMMediate",
    ];

    private static async Task<(ScriptedScpiDevice Device, ScpiInstrument Instrument)> ConnectAsync(
        ScpiCommandSet commands, ScpiInstrumentOptions? options = null, InstrumentLimits? limits = null)
    {
        var (device, host) = ScriptedScpiDevice.Start();
        device.Accept(SweepHeaders);
        device.Accept("INPut:ATTenuation", "DISPlay:WINDow:TRACe:Y:RLEVel", "SOURce:FREQuency", "SOURce:POWer", "OUTPut:STATe");
        var instrument = new ScpiInstrument("vna", host, commands, options, limits);
        await instrument.ConnectAsync(None).Bounded();
        return (device, instrument);
    }

    private static ScpiCommandSet Network(ScpiDataFormat format = ScpiDataFormat.Real32, ScpiByteOrder order = ScpiByteOrder.Normal) =>
        new() { Network = new() { Enabled = true }, DataFormat = format, ByteOrder = order };

    // Values exactly representable as float32, so every format gives them back unchanged.
    private static double[] ComplexPattern(int points, double scale = 1) =>
        Enumerable.Range(0, points).SelectMany(i => new[] { scale * (0.5 - i / 1024.0), -scale * i / 2048.0 }).ToArray();

    private static Complex[] AsComplex(double[] pairs) =>
        pairs.Chunk(2).Select(p => new Complex(p[0], p[1])).ToArray();

    private static string Latin1(byte[] bytes) => Encoding.Latin1.GetString(bytes);

    [Fact]
    public async Task ConnectAsync_Default_ClearsIdentifiesAndSelectsTheFormatWithoutReset()
    {
        var (device, instrument) = await ConnectAsync(Network());
        await using var _ = device;
        await using var __ = instrument;

        Assert.Equal(
            ["*CLS", "*IDN?", "SYSTem:ERRor?", "FORMat:DATA REAL,32", "SYSTem:ERRor?", "FORMat:BORDer NORMal", "SYSTem:ERRor?"],
            device.Received);
        Assert.Equal(0, device.Resets);
        Assert.Equal(new InstrumentIdentity("Demo Bench Works", "Virtual Analyser 2", "0", "1.0.3"), instrument.Identity);
        Assert.Equal(SessionState.Ready, instrument.Session.State);
    }

    [Fact]
    public async Task ConnectAsync_ResetOnConnect_SendsRstAndWaitsForIt()
    {
        var (device, instrument) = await ConnectAsync(Network(), new ScpiInstrumentOptions { ResetOnConnect = true });
        await using var _ = device;
        await using var __ = instrument;

        var received = device.Received.ToList();
        int reset = received.IndexOf("*RST");
        Assert.Equal(1, device.Resets);
        Assert.Equal("*OPC?", received[reset + 1]);
        Assert.True(reset < received.IndexOf("FORMat:DATA REAL,32"), "the format must be chosen after the reset, which restores ASCii");
    }

    [Fact]
    public async Task ConnectAsync_AsciiFormat_SendsNoByteOrder()
    {
        var (device, instrument) = await ConnectAsync(Network(ScpiDataFormat.Ascii));
        await using var _ = device;
        await using var __ = instrument;

        Assert.Contains("FORMat:DATA ASCii", device.Received);
        Assert.DoesNotContain(device.Received, c => c.StartsWith("FORMat:BORDer", StringComparison.Ordinal));
    }

    [Fact]
    public async Task ConnectAsync_GeneratorOnly_SelectsNoDataFormat()
    {
        var (device, instrument) = await ConnectAsync(new ScpiCommandSet { Generator = new() { Enabled = true } });
        await using var _ = device;
        await using var __ = instrument;

        Assert.Equal(["*CLS", "*IDN?", "SYSTem:ERRor?"], device.Received);
    }

    [Fact]
    public async Task GetCapability_GivesOnlyTheEnabledCapabilities()
    {
        var (device, instrument) = await ConnectAsync(new ScpiCommandSet { Network = new() { Enabled = true }, Generator = new() { Enabled = true } });
        await using var _ = device;
        await using var __ = instrument;

        Assert.NotNull(instrument.GetCapability<INetworkAnalyser>());
        Assert.NotNull(instrument.GetCapability<ISignalGenerator>());
        Assert.Null(instrument.GetCapability<ISpectrumAnalyser>());
        Assert.Null(instrument.GetCapability<IInstrument>());
    }

    [Theory]
    [InlineData(ScpiDataFormat.Real32, ScpiByteOrder.Normal, "#41608")]   // 201 complex float32 (REFERENCES: IEEE 488.2 §8.7.9)
    [InlineData(ScpiDataFormat.Real32, ScpiByteOrder.Swapped, "#41608")]
    [InlineData(ScpiDataFormat.Real64, ScpiByteOrder.Normal, "#43216")]   // 402 float64 = 3216 bytes (calc)
    [InlineData(ScpiDataFormat.Real64, ScpiByteOrder.Swapped, "#43216")]
    [InlineData(ScpiDataFormat.Ascii, ScpiByteOrder.Normal, "0.5,-0,")]
    public async Task AcquireAsync_EachFormatAndByteOrder_GivesTheSamplesSent(ScpiDataFormat format, ScpiByteOrder order, string replyStart)
    {
        var (device, instrument) = await ConnectAsync(Network(format, order));
        await using var _ = device;
        await using var __ = instrument;
        var pattern = ComplexPattern(201);
        device.AnswerNumbers("TRACe:DATA? S21", () => pattern);
        var analyser = instrument.GetCapability<INetworkAnalyser>()!;

        await analyser.ConfigureSweepAsync(Sweep, None).Bounded();
        var traces = await analyser.AcquireAsync([TraceQuantity.S21], None).Bounded();

        var trace = Assert.Single(traces);
        Assert.Equal(TraceQuantity.S21, trace.Quantity);
        Assert.Equal(AsComplex(pattern), trace.Samples.ToArray());
        Assert.True(trace.Axis.SamePointsAs(FrequencyAxis.Linear(Frequency.FromMegahertz(136), Frequency.FromMegahertz(139), 201)));
        Assert.StartsWith(replyStart, Latin1(device.Sent[^2]));
        Assert.Equal(order, device.ByteOrder);
    }

    [Fact]
    public async Task AcquireAsync_SweepsThenWaitsThenFetches()
    {
        var (device, instrument) = await ConnectAsync(Network());
        await using var _ = device;
        await using var __ = instrument;
        device.AnswerNumbers("TRACe:DATA? S21", () => ComplexPattern(201));
        var analyser = instrument.GetCapability<INetworkAnalyser>()!;

        await analyser.ConfigureSweepAsync(Sweep, None).Bounded();
        await analyser.AcquireAsync([TraceQuantity.S21], None).Bounded();

        // After the four commands of connecting: *CLS, *IDN?, FORMat:DATA, FORMat:BORDer.
        var sent = device.Received.Where(c => c != "SYSTem:ERRor?").Skip(4).ToList();
        Assert.Equal(
            ["SENSe:FREQuency:STARt 136000000", "SENSe:FREQuency:STOP 139000000", "SENSe:SWEep:POINts 201",
             "INITiate:IMMediate", "*OPC?", "TRACe:DATA? S21"],
            sent);
    }

    [Fact]
    public async Task AcquireAsync_SeveralParameters_ComeInTheOrderAsked()
    {
        var (device, instrument) = await ConnectAsync(Network());
        await using var _ = device;
        await using var __ = instrument;
        device.AnswerNumbers("TRACe:DATA? S11", () => ComplexPattern(201, 0.25));
        device.AnswerNumbers("TRACe:DATA? S21", () => ComplexPattern(201));
        var analyser = instrument.GetCapability<INetworkAnalyser>()!;
        await analyser.ConfigureSweepAsync(Sweep, None).Bounded();

        var traces = await analyser.AcquireAsync([TraceQuantity.S21, TraceQuantity.S11], None).Bounded();

        Assert.Equal([TraceQuantity.S21, TraceQuantity.S11], traces.Select(t => t.Quantity));
        Assert.Equal(AsComplex(ComplexPattern(201, 0.25)), traces[1].Samples.ToArray());
    }

    [Fact]
    public async Task AcquireAsync_WrongPointCount_SaysWhatWasExpectedAndWhatCame()
    {
        var (device, instrument) = await ConnectAsync(Network());
        await using var _ = device;
        await using var __ = instrument;
        device.AnswerNumbers("TRACe:DATA? S21", () => ComplexPattern(101));
        var analyser = instrument.GetCapability<INetworkAnalyser>()!;
        await analyser.ConfigureSweepAsync(Sweep, None).Bounded();

        var error = await Assert.ThrowsAsync<InstrumentException>(() => analyser.AcquireAsync([TraceQuantity.S21], None).Bounded());

        Assert.Contains("S21: expected 201 points but the instrument sent 202 values (101 points of 2 values)", error.Message);
        Assert.Contains("SENSe:SWEep:POINts 201", error.Message);
        Assert.Equal(("vna", "TRACe:DATA? S21", "a block of 808 bytes"), (error.Instrument, error.Command, error.Reply));
        Assert.False(error.IsTransient);
    }

    [Fact]
    public async Task AcquireAsync_OddNumberOfValues_IsAMismatch()
    {
        var (device, instrument) = await ConnectAsync(Network(ScpiDataFormat.Ascii));
        await using var _ = device;
        await using var __ = instrument;
        device.AnswerNumbers("TRACe:DATA? S21", () => ComplexPattern(201).Take(401).ToArray());
        var analyser = instrument.GetCapability<INetworkAnalyser>()!;
        await analyser.ConfigureSweepAsync(Sweep, None).Bounded();

        var error = await Assert.ThrowsAsync<InstrumentException>(() => analyser.AcquireAsync([TraceQuantity.S21], None).Bounded());

        Assert.Contains("401 values (not a whole number of points of 2 values)", error.Message);
    }

    [Fact]
    public async Task AcquireAsync_NotANumberMarker_NamesThePoint()
    {
        var (device, instrument) = await ConnectAsync(Network());
        await using var _ = device;
        await using var __ = instrument;
        var pattern = ComplexPattern(201);
        pattern[5] = ScpiNumber.NotANumber;
        device.AnswerNumbers("TRACe:DATA? S21", () => pattern);
        var analyser = instrument.GetCapability<INetworkAnalyser>()!;
        await analyser.ConfigureSweepAsync(Sweep, None).Bounded();

        var error = await Assert.ThrowsAsync<InstrumentException>(() => analyser.AcquireAsync([TraceQuantity.S21], None).Bounded());

        // Point 3 of the sweep (values 4 and 5) at 136 MHz + 2 × 15 kHz.
        Assert.Contains("point 3 (136.03 MHz)", error.Message);
    }

    [Fact]
    public async Task AcquireAsync_ParameterWithoutQuery_IsRefusedBeforeSweeping()
    {
        var commands = new ScpiCommandSet
        {
            Network = new() { Enabled = true, TraceQueries = new() { [TraceQuantity.S21] = "TRACe:DATA? S21" } },
        };
        var (device, instrument) = await ConnectAsync(commands);
        await using var _ = device;
        await using var __ = instrument;
        var analyser = instrument.GetCapability<INetworkAnalyser>()!;
        await analyser.ConfigureSweepAsync(Sweep, None).Bounded();

        var error = await Assert.ThrowsAsync<InstrumentException>(() => analyser.AcquireAsync([TraceQuantity.S22], None).Bounded());

        Assert.Contains("no command for fetching S22", error.Message);
        Assert.DoesNotContain("INITiate:IMMediate", device.Received);
    }

    [Fact]
    public async Task AcquireAsync_BeforeConfiguring_IsRefused()
    {
        var (device, instrument) = await ConnectAsync(Network());
        await using var _ = device;
        await using var __ = instrument;

        await Assert.ThrowsAsync<InvalidOperationException>(() => instrument.GetCapability<INetworkAnalyser>()!.AcquireAsync([TraceQuantity.S21], None).Bounded());
    }

    [Fact]
    public async Task AcquireAsync_FrequencyListQuery_BuildsTheAxisFromIt()
    {
        var commands = new ScpiCommandSet
        {
            Network = new() { Enabled = true, FrequencyListQuery = "SENSe:FREQuency:DATA?" },
            DataFormat = ScpiDataFormat.Real64,
        };
        var (device, instrument) = await ConnectAsync(commands);
        await using var _ = device;
        await using var __ = instrument;
        double[] hertz = [137.0e6, 137.25e6, 137.5e6, 137.75e6, 138.0e6];
        device.AnswerNumbers("SENSe:FREQuency:DATA?", () => hertz);
        device.AnswerNumbers("TRACe:DATA? S21", () => ComplexPattern(5));
        var analyser = instrument.GetCapability<INetworkAnalyser>()!;
        await analyser.ConfigureSweepAsync(new NetworkSweep(Frequency.FromMegahertz(137), Frequency.FromMegahertz(138), 5), None).Bounded();

        var trace = (await analyser.AcquireAsync([TraceQuantity.S21], None).Bounded())[0];

        Assert.Equal(FrequencyAxisKind.List, trace.Axis.Kind);
        Assert.Equal(hertz, trace.Axis.Hertz.ToArray());
    }

    [Fact]
    public async Task AcquireAsync_FrequencyListOfTheWrongLength_IsAMismatch()
    {
        var commands = new ScpiCommandSet
        {
            Network = new() { Enabled = true, FrequencyListQuery = "SENSe:FREQuency:DATA?" },
            DataFormat = ScpiDataFormat.Ascii,
        };
        var (device, instrument) = await ConnectAsync(commands);
        await using var _ = device;
        await using var __ = instrument;
        device.AnswerNumbers("SENSe:FREQuency:DATA?", () => [137.0e6, 137.5e6, 138.0e6]);
        var analyser = instrument.GetCapability<INetworkAnalyser>()!;
        await analyser.ConfigureSweepAsync(new NetworkSweep(Frequency.FromMegahertz(137), Frequency.FromMegahertz(138), 5), None).Bounded();

        var error = await Assert.ThrowsAsync<InstrumentException>(() => analyser.AcquireAsync([TraceQuantity.S21], None).Bounded());

        Assert.Contains("the frequency list: expected 5 points but the instrument sent 3 values", error.Message);
    }

    [Fact]
    public async Task ConfigureSweepAsync_BandwidthAndAveraging_SendsThem()
    {
        var (device, instrument) = await ConnectAsync(Network());
        await using var _ = device;
        await using var __ = instrument;
        var sweep = new NetworkSweep(Frequency.FromMegahertz(136), Frequency.FromMegahertz(139), 201, Frequency.FromKilohertz(1), 4);

        await instrument.GetCapability<INetworkAnalyser>()!.ConfigureSweepAsync(sweep, None).Bounded();

        Assert.Equal("1000", device.Setting("SENSe:BANDwidth:RESolution"));
        Assert.Equal("4", device.Setting("SENSe:AVERage:COUNt"));
        Assert.Equal("ON", device.Setting("SENSe:AVERage:STATe"));
    }

    [Fact]
    public async Task ConfigureSweepAsync_BandwidthWithoutCommand_IsRefused()
    {
        var commands = new ScpiCommandSet { Network = new() { Enabled = true, IfBandwidth = null } };
        var (device, instrument) = await ConnectAsync(commands);
        await using var _ = device;
        await using var __ = instrument;
        var sweep = new NetworkSweep(Frequency.FromMegahertz(136), Frequency.FromMegahertz(139), 201, Frequency.FromKilohertz(1));

        var error = await Assert.ThrowsAsync<InstrumentException>(() => instrument.GetCapability<INetworkAnalyser>()!.ConfigureSweepAsync(sweep, None).Bounded());

        Assert.Contains("no command for the IF bandwidth", error.Message);
        Assert.DoesNotContain(device.Received, c => c.StartsWith("SENSe:FREQuency", StringComparison.Ordinal));
    }

    [Fact]
    public async Task ConfigureSweepAsync_DeviceRejectsASetting_RaisesItsError()
    {
        var (device, instrument) = await ConnectAsync(Network());
        await using var _ = device;
        await using var __ = instrument;
        device.Script("SENSe:SWEep:POINts", _ =>
        {
            device.PushError(-222, "Data out of range");
            return Task.FromResult<byte[]?>(null);
        });

        var error = await Assert.ThrowsAsync<InstrumentReportedException>(() => instrument.GetCapability<INetworkAnalyser>()!.ConfigureSweepAsync(Sweep, None).Bounded());

        Assert.Equal((-222, "SENSe:SWEep:POINts 201"), (error.Code, error.Command));
        await Assert.ThrowsAsync<InvalidOperationException>(() => instrument.GetCapability<INetworkAnalyser>()!.AcquireAsync([TraceQuantity.S21], None).Bounded());
    }

    [Fact]
    public async Task AcquireAsync_SweepTimesOut_BreaksAndConnectRecovers()
    {
        var options = new ScpiInstrumentOptions { Session = new() { CompletionTimeout = TimeSpan.FromMilliseconds(300) } };
        var (device, instrument) = await ConnectAsync(Network(), options);
        await using var _ = device;
        await using var __ = instrument;
        device.AnswerNumbers("TRACe:DATA? S21", () => ComplexPattern(201));
        var analyser = instrument.GetCapability<INetworkAnalyser>()!;
        await analyser.ConfigureSweepAsync(Sweep, None).Bounded();
        var sweepDone = device.AnswerLate("*OPC?", "1");

        await Assert.ThrowsAsync<InstrumentTimeoutException>(() => analyser.AcquireAsync([TraceQuantity.S21], None).Bounded());
        Assert.Equal(SessionState.Broken, instrument.Session.State);

        // The sweep finishes while the reset waits; its late "1" must not put replies out of step.
        var connect = instrument.ConnectAsync(None);
        sweepDone.SetResult();
        await connect.Bounded();
        var traces = await analyser.AcquireAsync([TraceQuantity.S21], None).Bounded();

        Assert.Equal(SessionState.Ready, instrument.Session.State);
        Assert.Equal(AsComplex(ComplexPattern(201)), traces[0].Samples.ToArray());
    }

    [Fact]
    public async Task SpectrumAnalyser_ConfigureAndAcquire_GivesThePowerTrace()
    {
        var commands = new ScpiCommandSet { Spectrum = new() { Enabled = true }, DataFormat = ScpiDataFormat.Ascii };
        var (device, instrument) = await ConnectAsync(commands);
        await using var _ = device;
        await using var __ = instrument;
        var levels = Enumerable.Range(0, 401).Select(i => -90.0 + (i == 200 ? 70 : 0)).ToArray();
        device.AnswerNumbers("TRACe:DATA? POWer", () => levels);
        var analyser = instrument.GetCapability<ISpectrumAnalyser>()!;
        var settings = new SpectrumSettings(
            FrequencyRange.AroundCentre(Frequency.FromMegahertz(137.5), Frequency.FromMegahertz(3)),
            Frequency.FromKilohertz(10), Ratio.FromDecibels(10), Level.FromDbm(-10), 401);

        await analyser.ConfigureAsync(settings, None).Bounded();
        var trace = await analyser.AcquireAsync(None).Bounded();

        Assert.Equal(("136000000", "139000000"), (device.Setting("SENSe:FREQuency:STARt"), device.Setting("SENSe:FREQuency:STOP")));
        Assert.Equal(("10000", "10", "-10", "401"), (device.Setting("SENSe:BANDwidth:RESolution"), device.Setting("INPut:ATTenuation"),
            device.Setting("DISPlay:WINDow:TRACe:Y:RLEVel"), device.Setting("SENSe:SWEep:POINts")));
        Assert.Equal(levels, trace.LevelsDb.ToArray());
        Assert.Equal(137.5e6, trace.Axis.Hertz[200], 3);
        Assert.DoesNotContain("SENSe:SWEep:POINts?", device.Received);
    }

    [Fact]
    public async Task SpectrumAnalyser_PointsLeftToTheInstrument_AreAsked()
    {
        var commands = new ScpiCommandSet { Spectrum = new() { Enabled = true } };
        var (device, instrument) = await ConnectAsync(commands);
        await using var _ = device;
        await using var __ = instrument;
        device.Answer("SENSe:SWEep:POINts?", "+501");
        device.AnswerNumbers("TRACe:DATA? POWer", () => Enumerable.Repeat(-95.5, 501).ToArray());
        var analyser = instrument.GetCapability<ISpectrumAnalyser>()!;
        await analyser.ConfigureAsync(new SpectrumSettings(
            FrequencyRange.Between(Frequency.FromMegahertz(21.3), Frequency.FromMegahertz(21.5)),
            Frequency.FromKilohertz(1), Ratio.FromDecibels(0), Level.FromDbm(-20)), None).Bounded();

        var trace = await analyser.AcquireAsync(None).Bounded();

        Assert.Equal(501, trace.Count);
        Assert.Null(device.Setting("SENSe:SWEep:POINts"));
    }

    [Fact]
    public async Task SpectrumAnalyser_AskedPointsDisagreeWithTrace_IsAMismatch()
    {
        var commands = new ScpiCommandSet { Spectrum = new() { Enabled = true } };
        var (device, instrument) = await ConnectAsync(commands);
        await using var _ = device;
        await using var __ = instrument;
        device.Answer("SENSe:SWEep:POINts?", "501");
        device.AnswerNumbers("TRACe:DATA? POWer", () => Enumerable.Repeat(-95.5, 201).ToArray());
        var analyser = instrument.GetCapability<ISpectrumAnalyser>()!;
        await analyser.ConfigureAsync(new SpectrumSettings(
            FrequencyRange.Between(Frequency.FromMegahertz(21.3), Frequency.FromMegahertz(21.5)),
            Frequency.FromKilohertz(1), Ratio.FromDecibels(0), Level.FromDbm(-20)), None).Bounded();

        var error = await Assert.ThrowsAsync<InstrumentException>(() => analyser.AcquireAsync(None).Bounded());

        // 201 float32 values make a 804-byte block: header #3804 (REFERENCES: IEEE 488.2 §8.7.9).
        Assert.Contains("expected 501 points but the instrument sent 201 values", error.Message);
        Assert.StartsWith("#3804", Latin1(device.Sent[^2]));
    }

    [Fact]
    public async Task SignalGenerator_Settings_AreSentInScpiForm()
    {
        var (device, instrument) = await ConnectAsync(new ScpiCommandSet { Generator = new() { Enabled = true } });
        await using var _ = device;
        await using var __ = instrument;
        var generator = instrument.GetCapability<ISignalGenerator>()!;

        await generator.SetFrequencyAsync(Frequency.FromMegahertz(137.5), None).Bounded();
        await generator.SetLevelAsync(Level.FromDbm(-20), None).Bounded();
        await generator.SetOutputAsync(true, None).Bounded();

        Assert.Equal(("137500000", "-20", "ON"), (device.Setting("SOURce:FREQuency"), device.Setting("SOURce:POWer"), device.Setting("OUTPut:STATe")));
    }

    [Fact]
    public async Task SignalGenerator_LevelAboveDeclaredMaximum_IsRefusedWithoutSending()
    {
        var limits = new InstrumentLimits(MaxOutputLevel: Level.FromDbm(0));
        var (device, instrument) = await ConnectAsync(new ScpiCommandSet { Generator = new() { Enabled = true } }, limits: limits);
        await using var _ = device;
        await using var __ = instrument;

        await Assert.ThrowsAsync<ArgumentOutOfRangeException>(() => instrument.GetCapability<ISignalGenerator>()!.SetLevelAsync(Level.FromDbm(10), None).Bounded());

        Assert.DoesNotContain(device.Received, c => c.StartsWith("SOURce:POWer", StringComparison.Ordinal));
    }

    [Fact]
    public async Task SignalGenerator_DeviceRejectsLevel_RaisesDataOutOfRange()
    {
        var (device, instrument) = await ConnectAsync(new ScpiCommandSet { Generator = new() { Enabled = true } });
        await using var _ = device;
        await using var __ = instrument;
        device.Script("SOURce:POWer", _ =>
        {
            device.PushError(-222, "Data out of range");
            return Task.FromResult<byte[]?>(null);
        });

        var error = await Assert.ThrowsAsync<InstrumentReportedException>(() => instrument.GetCapability<ISignalGenerator>()!.SetLevelAsync(Level.FromDbm(30), None).Bounded());

        // -222 "Data out of range": SCPI-1999 Vol 2 §21.8 (REFERENCES).
        Assert.Equal(("vna", "SOURce:POWer 30", -222, "Data out of range"), (error.Instrument, error.Command, error.Code, error.Text));
    }

    [Fact]
    public void Constructor_InvalidCommandSet_ListsItsProblems()
    {
        var (host, _) = BenchRunner.Instruments.Transports.InMemoryTransport.CreatePair();
        var commands = new ScpiCommandSet { Generator = new() { Enabled = true, Output = "OUTPut:STATe", Level = null } };

        var error = Assert.Throws<ArgumentException>(() => new ScpiInstrument("sig", host, commands));

        Assert.Contains("generator.output:", error.Message);
        Assert.Contains("generator.level: a command is required", error.Message);
    }
}
