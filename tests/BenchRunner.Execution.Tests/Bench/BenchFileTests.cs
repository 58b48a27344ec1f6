using BenchRunner.Core.Diagnostics;
using BenchRunner.Execution.Bench;
using BenchRunner.Instruments.Adapters;
using BenchRunner.Instruments.Kinds;

namespace BenchRunner.Execution.Tests.Bench;

public sealed class BenchFileTests
{
    private const string Source = "bench.yaml";

    private static InputFormatException Fails(string text, string? folder = null) =>
        Assert.Throws<InputFormatException>(() => BenchFile.Parse(text, Source, folder ?? RepositoryFiles.Example("")));

    [Fact]
    public void Load_VirtualBenchExample_HasThreeInstrumentsAndTheCable()
    {
        var bench = BenchFile.Load(RepositoryFiles.Example("bench-virtual.yaml"));

        Assert.Equal("virtual-bench", bench.Name);
        Assert.Equal(["vna", "sa", "gen"], bench.Instruments.Keys);
        Assert.Equal(InstrumentKind.SpectrumAnalyser, bench.Instruments["sa"].Kind);
        Assert.Equal("sa", bench.Instruments["sa"].Connection.SimulatorName);
        Assert.Equal("bench-gen", bench.Instruments["gen"].Profile!.Name);
        var path = Assert.Single(bench.Paths);
        Assert.Equal(("gen", "sa", -1.0), (path.From, path.To, path.Gain.Decibels));
    }

    [Fact]
    public void Load_BenchLimitBelowProfile_NarrowsIt()
    {
        var bench = BenchFile.Load(RepositoryFiles.Example("bench-virtual.yaml"));

        // The profile declares +10 dBm for the analyser; the bench declares 0 dBm, which holds.
        Assert.Equal(0, bench.Instruments["sa"].MaxInputLevel!.Value.Dbm);
        Assert.Equal(10, bench.Instruments["vna"].MaxInputLevel!.Value.Dbm);
    }

    [Fact]
    public void Parse_BenchLimitAboveProfile_TheProfileHolds()
    {
        var bench = BenchFile.Parse("""
            bench: b
            instruments:
              sa:
                kind: spectrum-analyser
                adapter: profile
                profile: profiles/bench-sa.yaml
                connection: sim:sa
                limits:
                  max-input-level: +20 dBm
            """, Source, RepositoryFiles.Example(""));

        Assert.Equal(10, bench.Instruments["sa"].MaxInputLevel!.Value.Dbm);
    }

    [Fact]
    public void Parse_ScpiWithoutProfile_IsValid()
    {
        var bench = BenchFile.Parse("""
            bench: b
            instruments:
              gen:
                kind: signal-generator
                adapter: scpi
                connection: tcp:192.0.2.10:5025
            """, Source, ".");

        Assert.Equal(AdapterKind.Scpi, bench.Instruments["gen"].Adapter);
        Assert.Null(bench.Instruments["gen"].MaxOutputLevel);
    }

    [Fact]
    public void Parse_SeveralProblems_ReportsEachWithItsLineAndColumn()
    {
        var ex = Fails("""
            bench: b
            instruments:
              vna:
                kind: network-analyzer
                adapter: profile
                connection: carrier-pigeon:vna
                colour: blue
              sa:
                kind: spectrum-analyser
                adapter: scpi
                connection: sim:sa
                limits:
                  max-input-level: 0
            paths:
              gen -> sa: -1
              sa to vna: 3 dB
            """);

        var lines = ex.Problems.Select(p => $"{p.Location.Line}:{p.Location.Column}").ToList();
        Assert.Equal(["4:11", "5:5", "6:17", "7:5", "13:24", "15:3", "15:14", "16:3"], lines);
        Assert.Contains("unknown value \"network-analyzer\"", ex.Problems[0].Detail);
        Assert.Contains("names no profile file", ex.Problems[1].Detail);
        Assert.Contains("unknown key \"colour\"", ex.Problems[3].Detail);
        Assert.Contains("has no unit", ex.Problems[4].Detail);
        Assert.Contains("\"gen\", which is not an instrument", ex.Problems[5].Detail);
        Assert.Contains("not a path", ex.Problems[7].Detail);
        Assert.All(ex.Message.Split('\n'), line => Assert.StartsWith("bench.yaml:", line));
    }

    [Fact]
    public void Parse_ProfileOfTheWrongKind_IsAnError()
    {
        var ex = Fails("""
            bench: b
            instruments:
              sa:
                kind: spectrum-analyser
                adapter: profile
                profile: profiles/bench-gen.yaml
                connection: sim:sa
            """);

        var problem = Assert.Single(ex.Problems);
        Assert.Equal((6, 14), (problem.Location.Line, problem.Location.Column));
        Assert.Contains("describes signal-generator, not spectrum-analyser", problem.Detail);
    }

    [Fact]
    public void Parse_MissingProfileFile_NamesTheKeyValue()
    {
        var ex = Fails("""
            bench: b
            instruments:
              sa:
                kind: spectrum-analyser
                adapter: profile
                profile: no-such-profile.yaml
                connection: sim:sa
            """);

        var problem = Assert.Single(ex.Problems);
        Assert.Equal((6, 14), (problem.Location.Line, problem.Location.Column));
        Assert.Contains("no profile file \"no-such-profile.yaml\"", problem.Detail);
    }

    [Fact]
    public void Parse_MissingNameAndInstruments_ReportsBoth()
    {
        var ex = Fails("description: nothing here\n");

        Assert.Equal(2, ex.Problems.Count);
        Assert.Contains(ex.Problems, p => p.Detail.Contains("missing key \"bench\""));
        Assert.Contains(ex.Problems, p => p.Detail.Contains("missing key \"instruments\""));
    }
}
