using BenchRunner.Execution.Bench;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Validation;

namespace BenchRunner.Execution.Tests.Validation;

/// <summary>The safety pre-check and the cautions when the analyser looks into a circuit through a compensated probe path.</summary>
public sealed class CompensationSafetyTests
{
    private const string Bench = """
        bench: b
        instruments:
          gen: { kind: signal-generator, adapter: scpi, connection: sim:gen, limits: { max-output-level: +30 dBm } }
          sa: { kind: spectrum-analyser, adapter: scpi, connection: sim:sa, limits: { max-input-level: 0 dBm } }
        paths:
          gen -> sa: -1 dB
        """;

    private const string Probe = """

        compensation:
          sa:
            probe: 450 Ohm
            cable: { 10 MHz: 0.5 dB, 500 MHz: 2 dB }
        """;

    private static TestPlan Plan(string level) => PlanFile.Parse($$"""
        plan: p
        roles: { gen: signal-generator, sa: spectrum-analyser }
        steps:
          - set-generator: { role: gen, frequency: 137.5 MHz, level: {{level}}, output: on }
          - set-spectrum-analyser: { role: sa, centre: 137.5 MHz, span: 2 MHz }
          - sweep: { role: sa, traces: { power: probed } }
        """, "plan.yaml", ".");

    private static BenchDefinition Parse(string text) => BenchFile.Parse(text, "bench.yaml", ".");

    [Fact]
    public void CheckAgainstBench_ProbePath_TakesTheFixturesLeastLossOffTheArrivingLevel()
    {
        // 450 Ω into 50 Ω loses 20.000 dB (REFERENCES.md, series-resistor probe [calc]); the cable at least 0.5 dB.
        // +19 dBm − 1 dB − 20.5 dB = −2.5 dBm at sa: allowed. Without the probe it would reach +18 dBm.
        Assert.Empty(PlanValidator.CheckAgainstBench(Plan("+19 dBm"), Parse(Bench + Probe)));
        Assert.Single(PlanValidator.CheckAgainstBench(Plan("+19 dBm"), Parse(Bench)));
    }

    [Fact]
    public void CheckAgainstBench_ProbePathStillTooHot_NamesTheCompensatedPath()
    {
        // +22 dBm − 1 dB − 20.5 dB = +0.5 dBm, above the 0 dBm maximum.
        var problem = Assert.Single(PlanValidator.CheckAgainstBench(Plan("+22 dBm"), Parse(Bench + Probe)));

        Assert.StartsWith("gen level +22 dBm through gen -> sa (-1 dB) and sa's compensated input path (at least +20.5 dB of loss) reaches +0.5 dBm at sa", problem.Detail);
    }

    [Fact]
    public void For_PlanSweepingAProbedAnalyser_GivesTheCautions()
    {
        var cautions = ProbingCautions.For(Plan("-10 dBm"), Parse(Bench + Probe));

        Assert.StartsWith("CAUTION: sa probes inside a working circuit (compensated: probe 450 Ohm into 50 Ohm (20 dB)", cautions[0]);
        Assert.Contains(cautions, c => c.Contains("mains-powered or high-voltage", StringComparison.Ordinal));
        Assert.Contains(cautions, c => c.Contains("No DC block is declared", StringComparison.Ordinal));
        // 0 dBm at the input + 20.5 dB least loss = +20.5 dBm at the probed point.
        Assert.Contains(cautions, c => c.Contains("about 20.5 dBm at the probed point", StringComparison.Ordinal));
        Assert.Contains(cautions, c => c.Contains("local codes", StringComparison.Ordinal));
    }

    [Fact]
    public void For_PlanWithoutProbe_GivesNone()
    {
        Assert.Empty(ProbingCautions.For(Plan("-10 dBm"), Parse(Bench)));
        Assert.Empty(ProbingCautions.For(Plan("-10 dBm"), Parse(Bench + "\ncompensation:\n  sa:\n    attenuators: [10 dB]\n")));
    }

    [Fact]
    public void CheckAgainstBench_SpanBeyondTheCableTable_IsAProblemAtTheSetup()
    {
        var bench = Parse(Bench + "\ncompensation:\n  sa:\n    cable: { 137 MHz: 0.3 dB, 138 MHz: 0.3 dB }\n");

        var problem = Assert.Single(PlanValidator.CheckAgainstBench(Plan("-10 dBm"), bench));

        Assert.Equal(5, problem.Location.Line);
        Assert.StartsWith("the span 136.5 MHz to 138.5 MHz of sa reaches outside the cable table of its compensation (137 MHz to 138 MHz", problem.Detail);
    }
}
