using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Adapters;
using BenchRunner.Instruments.Kinds;
using BenchRunner.Instruments.Profiles;
using BenchRunner.Instruments.Scpi;
using static BenchRunner.Instruments.Tests.Profiles.ScpiProfileText;

namespace BenchRunner.Instruments.Tests.Profiles;

public class ScpiProfileTests
{
    private const string Source = "p.yaml";

    private static DriverProfile Parse(string text) => DriverProfile.Parse(text, Source);

    [Fact]
    public void Load_BenchVnaScpi_EnablesTheNetworkAnalyserWithTheDefaultCommands()
    {
        var p = ExampleProfiles.ScpiVna;
        var defaults = new ScpiNetworkCommands();

        Assert.Equal(("bench-vna-scpi", AdapterKind.Scpi, "scpi"), (p.Name, p.AdapterKind, p.Adapter));
        Assert.Equal([InstrumentKind.NetworkAnalyser], p.Kinds);
        var c = p.ScpiCommands!;
        Assert.True(c.Network.Enabled);
        Assert.False(c.Spectrum.Enabled);
        Assert.False(c.Generator.Enabled);
        Assert.Equal(
            (defaults.Start, defaults.Stop, defaults.Points, defaults.IfBandwidth, defaults.AverageCount, defaults.AverageState),
            (c.Network.Start, c.Network.Stop, c.Network.Points, c.Network.IfBandwidth, c.Network.AverageCount, c.Network.AverageState));
        Assert.Equal([TraceQuantity.S11, TraceQuantity.S21], c.Network.TraceQueries.Keys.Order());
        Assert.Equal("TRACe:DATA? S21", c.Network.TraceQueries[TraceQuantity.S21]);
        Assert.Equal(("INITiate:IMMediate", ScpiDataFormat.Real32, ScpiByteOrder.Normal), (c.Trigger, c.DataFormat, c.ByteOrder));
        Assert.Equal(("FORMat:DATA {format}", "FORMat:BORDer {order}"), (c.DataFormatCommand, c.ByteOrderCommand));
        Assert.Empty(c.Problems());
    }

    [Fact]
    public void Load_BenchVnaScpi_ReadsTimingLimitsAndSafeOptions()
    {
        var p = ExampleProfiles.ScpiVna;
        var o = p.ScpiOptions!;

        Assert.Equal((TimeSpan.FromSeconds(5), TimeSpan.FromSeconds(30)), (o.Session.CommandTimeout, o.Session.CompletionTimeout));
        Assert.Equal((p.Timing.CommandTimeout, p.Timing.SweepTimeout), (o.Session.CommandTimeout, o.Session.CompletionTimeout));
        Assert.True(o.Session.DrainErrors);
        Assert.False(o.ResetOnConnect);
        Assert.Equal(1048576, o.Framing!.MaxMessageBytes);
        Assert.Same(o.Framing, p.Framing);
        Assert.Null(o.Framing.Prompt);
        Assert.False(o.Framing.Echo);
        Assert.Equal(Frequency.FromMegahertz(1), p.Limits.FrequencyRange!.Value.Start);
        Assert.Equal(Frequency.FromGigahertz(1.5), p.Limits.FrequencyRange!.Value.Stop);
        Assert.Equal(Level.FromDbm(10), p.Limits.MaxInputLevel);
        o.Validate();
    }

    [Fact]
    public void Load_BenchVnaScpi_HasNoRawParts()
    {
        var p = ExampleProfiles.ScpiVna;

        Assert.Null(p.Identity);
        Assert.Null(p.ErrorReply);
        Assert.Null(p.Acknowledgement);
        Assert.Empty(p.OnConnect);
        Assert.Null(p.NetworkAnalyser);
    }

    [Fact]
    public void Load_BenchSaScpi_EnablesTheSpectrumAnalyserWithAsciiTraces()
    {
        var p = ExampleProfiles.ScpiSa;
        var c = p.ScpiCommands!;

        Assert.Equal([InstrumentKind.SpectrumAnalyser], p.Kinds);
        Assert.True(c.Spectrum.Enabled);
        Assert.False(c.Network.Enabled);
        Assert.Equal(ScpiDataFormat.Ascii, c.DataFormat);
        Assert.Equal("TRACe:DATA? POWer", c.Spectrum.TraceQuery);
        Assert.Equal("SENSe:SWEep:POINts?", c.Spectrum.PointsQuery);
        Assert.Equal("DISPlay:WINDow:TRACe:Y:RLEVel {dbm}", c.Spectrum.ReferenceLevel);
        Assert.Null(c.Spectrum.FrequencyListQuery);
        Assert.False(p.ScpiOptions!.ResetOnConnect);
        Assert.Empty(c.Problems());
    }

    [Fact]
    public void Load_BenchGenScpi_EnablesTheGeneratorWithItsOutputRange()
    {
        var p = ExampleProfiles.ScpiGen;
        var c = p.ScpiCommands!;

        Assert.Equal([InstrumentKind.SignalGenerator], p.Kinds);
        Assert.True(c.Generator.Enabled);
        Assert.False(c.FetchesTraces);
        Assert.Equal(("SOURce:FREQuency {hz}", "SOURce:POWer {dbm}", "OUTPut:STATe {state}"), (c.Generator.Frequency, c.Generator.Level, c.Generator.Output));
        Assert.Equal((Level.FromDbm(-80), Level.FromDbm(0)), (p.Limits.MinOutputLevel!.Value, p.Limits.MaxOutputLevel!.Value));
        Assert.Equal(TimeSpan.FromSeconds(2), p.ScpiOptions!.Session.CommandTimeout);
        // The sweep timeout is not given, so it keeps the session's default (docs/scpi-adapter.md: 60 s).
        Assert.Equal(TimeSpan.FromSeconds(60), p.ScpiOptions.Session.CompletionTimeout);
        Assert.Empty(c.Problems());
    }

    [Fact]
    public void Parse_MinimalProfile_KeepsEveryDefault()
    {
        var p = Parse(With());
        var c = p.ScpiCommands!;
        var o = p.ScpiOptions!;

        Assert.Equal(4, c.Network.TraceQueries.Count);
        Assert.Equal("SENSe:FREQuency:STARt {hz}", c.Network.Start);
        // The documented session defaults (docs/scpi-adapter.md, Timeouts and Errors).
        Assert.Equal((TimeSpan.FromSeconds(5), TimeSpan.FromSeconds(60), true, 32, "SYSTem:ERRor?"),
            (o.Session.CommandTimeout, o.Session.CompletionTimeout, o.Session.DrainErrors, o.Session.MaxErrorReads, o.Session.ErrorQuery));
        Assert.Equal((TimeSpan.Zero, TimeSpan.Zero), (p.Timing.SettleAfterSetting, p.Timing.SettleBeforeRead));
        Assert.False(o.ResetOnConnect);
        Assert.Equal(("\n", "\n"), (o.Framing!.WriteTerminator, o.Framing.ReadTerminator));
    }

    [Fact]
    public void Parse_OverriddenCommand_ReplacesOnlyThatCommand()
    {
        var p = Parse(With(
            "network-analyser:",
            "  start: SENS:FREQ:STAR {hz}",
            "  read: {S21: 'TRACe:DATA? TR2'}"));
        var n = p.ScpiCommands!.Network;

        Assert.Equal("SENS:FREQ:STAR {hz}", n.Start);
        Assert.Equal("SENSe:FREQuency:STOP {hz}", n.Stop);
        Assert.Equal("TRACe:DATA? TR2", n.TraceQueries[TraceQuantity.S21]);
        Assert.Equal("TRACe:DATA? S11", n.TraceQueries[TraceQuantity.S11]);
        Assert.Equal(4, n.TraceQueries.Count);
    }

    [Fact]
    public void Parse_NoneOnOptionalCommands_LeavesThemOut()
    {
        var p = Parse(With(
            "network-analyser:",
            "  if-bandwidth: none",
            "  average-count: NONE",
            "  average-state: none",
            "scpi:",
            "  data-format-command: none",
            "  byte-order-command: none"));
        var c = p.ScpiCommands!;

        Assert.Equal((null, null, null), (c.Network.IfBandwidth, c.Network.AverageCount, c.Network.AverageState));
        Assert.Equal((null, null), (c.DataFormatCommand, c.ByteOrderCommand));
        Assert.Equal("SENSe:SWEep:POINts {points}", c.Network.Points);
    }

    [Fact]
    public void Parse_EveryScpiOption_IsRead()
    {
        var p = Parse(With(
            "framing:",
            "  command-end: crlf",
            "  reply-end: lf",
            "  max-message-bytes: 65536",
            "timing:",
            "  command-timeout: 750 ms",
            "  sweep-timeout: 2 min",
            "scpi:",
            "  trigger: INIT",
            "  data-format: REAL64",
            "  byte-order: swapped",
            "  data-format-command: FORM {format}",
            "  byte-order-command: FORM:BORD {order}",
            "  drain-errors: false",
            "  error-query: SYST:ERR?",
            "  max-error-reads: 8",
            "  reset-on-connect: true"));
        var c = p.ScpiCommands!;
        var o = p.ScpiOptions!;

        Assert.Equal(("INIT", ScpiDataFormat.Real64, ScpiByteOrder.Swapped), (c.Trigger, c.DataFormat, c.ByteOrder));
        Assert.Equal(("FORM {format}", "FORM:BORD {order}"), (c.DataFormatCommand, c.ByteOrderCommand));
        Assert.Equal((TimeSpan.FromMilliseconds(750), TimeSpan.FromMinutes(2)), (o.Session.CommandTimeout, o.Session.CompletionTimeout));
        Assert.Equal((false, "SYST:ERR?", 8), (o.Session.DrainErrors, o.Session.ErrorQuery, o.Session.MaxErrorReads));
        Assert.True(o.ResetOnConnect);
        Assert.Equal(("\r\n", 65536), (o.Framing!.WriteTerminator, o.Framing.MaxMessageBytes));
    }

    [Fact]
    public void Parse_SpectrumOverrides_AreRead()
    {
        var p = Parse(Of("spectrum-analyser",
            "spectrum-analyser:",
            "  resolution-bandwidth: SENS:BWID {hz}",
            "  input-attenuation: INP:ATT {db}",
            "  reference-level: DISP:TRAC:Y:RLEV {dbm}",
            "  points: none",
            "  points-query: none",
            "  read: 'TRACe:DATA? TR1'",
            "  frequency-list: 'SENSe:FREQuency:DATA?'"));
        var s = p.ScpiCommands!.Spectrum;

        Assert.Equal(("SENS:BWID {hz}", "INP:ATT {db}", "DISP:TRAC:Y:RLEV {dbm}"), (s.ResolutionBandwidth, s.InputAttenuation, s.ReferenceLevel));
        Assert.Equal((null, null), (s.Points, s.PointsQuery));
        Assert.Equal(("TRACe:DATA? TR1", "SENSe:FREQuency:DATA?"), (s.TraceQuery, s.FrequencyListQuery));
        Assert.Equal("SENSe:FREQuency:STARt {hz}", s.Start);
    }

    [Fact]
    public void Parse_GeneratorOverrides_AreRead()
    {
        var p = Parse(Of("signal-generator",
            "signal-generator:",
            "  frequency: FREQ {hz}",
            "  level: POW {dbm}",
            "  output: OUTP {state}"));
        var g = p.ScpiCommands!.Generator;

        Assert.Equal(("FREQ {hz}", "POW {dbm}", "OUTP {state}"), (g.Frequency, g.Level, g.Output));
    }

    [Fact]
    public void Parse_BareSection_KeepsTheDefaults()
    {
        var p = Parse(With("network-analyser:"));

        Assert.Equal("SENSe:SWEep:POINts {points}", p.ScpiCommands!.Network.Points);
    }

    [Fact]
    public void Parse_SeveralKinds_EnableEachCapability()
    {
        var p = Parse(Of("network-analyser, signal-generator"));

        Assert.Equal([InstrumentKind.NetworkAnalyser, InstrumentKind.SignalGenerator], p.Kinds);
        Assert.True(p.ScpiCommands!.Network.Enabled);
        Assert.True(p.ScpiCommands.Generator.Enabled);
        Assert.False(p.ScpiCommands.Spectrum.Enabled);
    }

    [Fact]
    public void Parse_AdapterInCapitals_IsScpi()
    {
        var p = Parse(ProfileText.Lines("profile: t", "adapter: SCPI", "kinds: [signal-generator]"));

        Assert.Equal((AdapterKind.Scpi, "scpi"), (p.AdapterKind, p.Adapter));
    }

    [Fact]
    public void Parse_RawProfile_HasNoScpiParts()
    {
        var p = ExampleProfiles.Vna;

        Assert.Equal(AdapterKind.Raw, p.AdapterKind);
        Assert.Null(p.ScpiCommands);
        Assert.Null(p.ScpiOptions);
        Assert.NotNull(p.Identity);
    }
}
