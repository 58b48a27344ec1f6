using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Instruments.Tests.Scpi;

public class ScpiCommandSetTests
{
    [Fact]
    public void Problems_DefaultsWithEveryCapabilityEnabled_AreNone()
    {
        var commands = new ScpiCommandSet
        {
            Network = new() { Enabled = true },
            Spectrum = new() { Enabled = true },
            Generator = new() { Enabled = true },
        };

        Assert.Empty(commands.Problems());
        commands.Validate();
    }

    [Fact]
    public void Defaults_AreTheDocumentedScpiStyleCommands()
    {
        var commands = new ScpiCommandSet();

        Assert.Equal("SENSe:FREQuency:STARt {hz}", commands.Network.Start);
        Assert.Equal("SENSe:SWEep:POINts {points}", commands.Network.Points);
        Assert.Equal("SENSe:BANDwidth:RESolution {hz}", commands.Spectrum.ResolutionBandwidth);
        Assert.Equal("INPut:ATTenuation {db}", commands.Spectrum.InputAttenuation);
        Assert.Equal("DISPlay:WINDow:TRACe:Y:RLEVel {dbm}", commands.Spectrum.ReferenceLevel);
        Assert.Equal("INITiate:IMMediate", commands.Trigger);
        Assert.Equal("SOURce:FREQuency {hz}", commands.Generator.Frequency);
        Assert.Equal("SOURce:POWer {dbm}", commands.Generator.Level);
        Assert.Equal("OUTPut:STATe {state}", commands.Generator.Output);
        Assert.Equal(ScpiDataFormat.Real32, commands.DataFormat);
        Assert.Equal(ScpiByteOrder.Normal, commands.ByteOrder);
        Assert.Equal(4, commands.Network.TraceQueries.Count);
    }

    [Fact]
    public void Problems_NothingEnabled_IsReported()
    {
        Assert.Contains(new ScpiCommandSet().Problems(), p => p.Contains("no capability is enabled"));
    }

    [Fact]
    public void Problems_IdentificationOnly_AreNone()
    {
        Assert.Empty(new ScpiCommandSet { IdentificationOnly = true }.Problems());
    }

    [Fact]
    public void Problems_IdentificationOnlyWithACapability_IsReported()
    {
        var commands = new ScpiCommandSet { IdentificationOnly = true, Generator = new() { Enabled = true } };

        Assert.Contains(commands.Problems(), p => p.StartsWith("identificationOnly: a capability is enabled", StringComparison.Ordinal));
    }

    [Fact]
    public void Validate_SeveralProblems_ReportsEveryOneAtOnce()
    {
        var commands = new ScpiCommandSet
        {
            Network = new()
            {
                Enabled = true,
                Start = "SENSe:FREQuency:STARt",
                Points = null,
                TraceQueries = new() { [TraceQuantity.S21] = "TRACe:DATA S21", [TraceQuantity.Power] = "TRACe:DATA? P" },
            },
            Generator = new() { Enabled = true, Level = "SOURce:POWer {hz}" },
            Trigger = "INITiate:IMMediate?",
        };

        var problems = commands.Problems();
        var error = Assert.Throws<ArgumentException>(commands.Validate);

        Assert.Equal(6, problems.Count);
        Assert.Contains(problems, p => p.StartsWith("network.start:", StringComparison.Ordinal) && p.Contains("{hz}"));
        Assert.Contains(problems, p => p.StartsWith("network.points: a command is required", StringComparison.Ordinal));
        Assert.Contains(problems, p => p.StartsWith("network.traceQueries.S21:", StringComparison.Ordinal) && p.Contains("must be a query"));
        Assert.Contains(problems, p => p.StartsWith("network.traceQueries:", StringComparison.Ordinal) && p.Contains("Power is not an S-parameter"));
        Assert.Contains(problems, p => p.StartsWith("generator.level:", StringComparison.Ordinal) && p.Contains("{dbm}, not {hz}"));
        Assert.Contains(problems, p => p.StartsWith("trigger:", StringComparison.Ordinal) && p.Contains("must not be a query"));
        Assert.All(problems, p => Assert.Contains(p, error.Message));
    }

    [Fact]
    public void Problems_DisabledSection_IsNotChecked()
    {
        var commands = new ScpiCommandSet
        {
            Generator = new() { Enabled = true },
            Spectrum = new() { Enabled = false, TraceQuery = null },
        };

        Assert.Empty(commands.Problems());
    }

    [Fact]
    public void Problems_OptionalCommandsLeftOut_AreFine()
    {
        var commands = new ScpiCommandSet
        {
            Network = new() { Enabled = true, IfBandwidth = null, AverageCount = null, AverageState = null },
            DataFormatCommand = null,
            ByteOrderCommand = null,
        };

        Assert.Empty(commands.Problems());
    }

    [Fact]
    public void Problems_NoTraceQueries_IsReported()
    {
        var commands = new ScpiCommandSet { Network = new() { Enabled = true, TraceQueries = [] } };

        Assert.Contains(commands.Problems(), p => p.StartsWith("network.traceQueries: at least one", StringComparison.Ordinal));
    }
}
