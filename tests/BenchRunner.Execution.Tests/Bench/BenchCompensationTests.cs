using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Execution.Bench;

namespace BenchRunner.Execution.Tests.Bench;

public sealed class BenchCompensationTests
{
    private const string Source = "bench.yaml";

    private const string Instruments = """
        bench: b
        instruments:
          sa:
            kind: spectrum-analyser
            adapter: scpi
            connection: sim:sa
          vna:
            kind: network-analyser
            adapter: scpi
            connection: sim:vna
        """;

    private static BenchDefinition Parse(string compensation) => BenchFile.Parse(Instruments + "\n" + compensation, Source, RepositoryFiles.Example(""));

    private static InputFormatException Fails(string compensation) =>
        Assert.Throws<InputFormatException>(() => Parse(compensation));

    [Fact]
    public void Load_ProbeExample_CompensatesProbeDcBlockAndCable()
    {
        var bench = BenchFile.Load(RepositoryFiles.Example("bench-probe.yaml"));

        var sa = bench.CompensationOf("sa")!;
        Assert.True(sa.HasProbe);
        // 20·log10((4700 + 50)/50) = 39.554 dB (REFERENCES.md, series-resistor probe [calc]); + 0.3 dB DC block;
        // cable 0.4 dB at 150 MHz, and at 137.5 MHz 0.2 + (0.4 − 0.2)·(87.5/100) = 0.375 dB by linear interpolation.
        Assert.Equal(39.554 + 0.3 + 0.375, sa.Path.LossAt(Frequency.FromMegahertz(137.5)).Value.Decibels, 3);
        Assert.Equal(39.554 + 0.3 + 0.2, sa.LeastLoss.Decibels, 3);
        Assert.StartsWith("compensated: probe 4.7 kOhm into 50 Ohm (39.554 dB) + DC block 0.3 dB + cable table 50 MHz to 500 MHz", sa.Description);
        Assert.Null(bench.CompensationOf("gen"));
    }

    [Fact]
    public void Parse_AttenuatorsAndImpedance_AddUp()
    {
        var bench = Parse("""
            compensation:
              sa:
                probe: 450 Ohm
                impedance: 50 Ohm
                attenuators: [10 dB, 3 dB]
            """);

        // 450 Ω into 50 Ω: 20·log10(500/50) = 20.000 dB (REFERENCES.md [calc]).
        var sa = bench.CompensationOf("sa")!;
        Assert.Equal(33, sa.Path.LossAt(Frequency.FromMegahertz(1)).Value.Decibels, 9);
        Assert.Equal(33, sa.LeastLoss.Decibels, 9);
        Assert.Contains("\"series_ohms\":450", sa.ToJson());
        Assert.Contains("\"attenuators_db\":[10,3]", sa.ToJson());
    }

    [Fact]
    public void Parse_BadCompensation_ReportsEveryProblemWithItsPlace()
    {
        var ex = Fails("""
            compensation:
              vna:
                attenuators: [10 dB]
              sa:
                probe: 4.7 kOhm
                attenuators: [-10 dB]
                dc-block: lots
                colour: red
                cable:
                  100: 0.3 dB
                  500 MHz: 0.9 dB
              scope:
                probe: 10 kOhm
            """);

        var problems = ex.Problems.Select(p => p.ToString()).ToList();
        Assert.Contains(problems, p => p.StartsWith("bench.yaml:12:3: compensation is applied to spectrum traces; \"vna\" is a network-analyser", StringComparison.Ordinal));
        Assert.Contains(problems, p => p.StartsWith("bench.yaml:16:19:", StringComparison.Ordinal) && p.Contains("positive loss", StringComparison.Ordinal));
        Assert.Contains(problems, p => p.StartsWith("bench.yaml:17:15:", StringComparison.Ordinal));
        Assert.Contains(problems, p => p.StartsWith("bench.yaml:18:5:", StringComparison.Ordinal) && p.Contains("colour", StringComparison.Ordinal));
        Assert.Contains(problems, p => p.StartsWith("bench.yaml:20:7: \"100\" has no unit", StringComparison.Ordinal));
        Assert.Contains(problems, p => p.StartsWith("bench.yaml:22:3: \"compensation\" names \"scope\"", StringComparison.Ordinal));
    }

    [Fact]
    public void Parse_CableWithOnePointOrEmptyCompensation_IsRefused()
    {
        var one = Fails("""
            compensation:
              sa:
                cable:
                  100 MHz: 0.3 dB
            """);
        var empty = Fails("""
            compensation:
              sa: {}
            """);

        Assert.Contains("at least two frequencies", one.Problems.Single().Detail);
        Assert.Contains("declares nothing", empty.Problems.Single().Detail);
    }
}
