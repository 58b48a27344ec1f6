using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Figures;
using BenchRunner.Core.Traces;
using BenchRunner.Execution.Plans;

namespace BenchRunner.Execution.Tests.Plans;

public sealed class PlanFileTests
{
    private const string Source = "plan.yaml";

    private static InputFormatException Fails(string text) =>
        Assert.Throws<InputFormatException>(() => PlanFile.Parse(text, Source, RepositoryFiles.Example("plans")));

    private static List<string> Places(InputFormatException ex) =>
        ex.Problems.Select(p => $"{p.Location.Line}:{p.Location.Column}").ToList();

    [Fact]
    public void Load_PreselectorExample_HasItsStepsAndLimits()
    {
        var plan = PlanFile.Load(RepositoryFiles.Example("plans/psf-137-check.yaml"));

        Assert.Equal("psf-137-check", plan.Name);
        var setup = Assert.IsType<NetworkAnalyserSetup>(plan.Steps[1]);
        Assert.Equal((127.5e6, 147.5e6, 401), (setup.Start.Hertz, setup.Stop.Hertz, setup.Points));
        var sweep = Assert.IsType<SweepStep>(plan.Steps[2]);
        Assert.Equal([TraceQuantity.S21, TraceQuantity.S11], sweep.Traces.Select(t => t.Quantity));
        Assert.Equal("psf-137-passband", Assert.IsType<MaskCheck>(plan.Steps[3]).Mask.Name);
        var figures = Assert.IsType<FigureCheck>(plan.Steps[4]);
        var centre = figures.Limits.Single(l => l.Key == FigureKeys.CentreFrequency);
        Assert.Equal(137.2e6, centre.Min!.Value, 1e-3);
        Assert.Equal(137.8e6, centre.Max!.Value, 1e-3);
        Assert.Equal(4, figures.Limits.Single(l => l.Key == FigureKeys.InsertionLoss).Max);
    }

    [Fact]
    public void Load_LnaExample_ReadsSpanAroundTheCarrier()
    {
        var plan = PlanFile.Load(RepositoryFiles.Example("plans/lna-harmonics.yaml"));

        var sa = Assert.IsType<SpectrumAnalyserSetup>(plan.Steps[1]);
        Assert.Equal((136.5e6, 138.5e6), (sa.Start.Hertz, sa.Stop.Hertz));
        var gen = Assert.IsType<GeneratorSetup>(plan.Steps[0]);
        Assert.Equal((-30.0, true), (gen.Level!.Value.Dbm, gen.Output!.Value));
    }

    [Fact]
    public void Parse_EachKindOfProblem_IsReportedAtItsTokenAllTogether()
    {
        var ex = Fails("""
            plan: p
            roles:
              vna: network-analyser
              sa: spectrum-analyser
            steps:
              - set-network-analyser: { role: vna, start: 127.5, stop: 147.5 MHz, points: 401, colour: red }
              - set-generator: { role: gen, level: -10 dBm }
              - set-spectrum-analyser: { role: vna, centre: 137.5 MHz, span: 2 MHz }
              - check-figures:
                  trace: passband
                  figures: { center_hz: { max: 1 MHz } }
              - sweep: { role: vna, traces: { S21: passband } }
              - check-figures:
                  trace: passband
                  figures:
                    centre_hz: { max: 1 MHz }
                    insertion_loss_db: { max: 4 dBm }
                    bandwidth_3db_hz: { min: 4 MHz, max: 2.5 MHz }
              - repeat:
                  until: { trace: passband, figures: { loaded_q: { min: 40 } } }
                  steps:
                    - wait: 1
            """);

        Assert.Equal(["6:47", "6:84", "7:28", "8:36", "10:14", "16:9", "17:35", "18:34", "20:7", "22:17"], Places(ex));
        Assert.Contains("has no unit", ex.Problems[0].Detail);
        Assert.Contains("unknown key \"colour\"", ex.Problems[1].Detail);
        Assert.Contains("unknown role \"gen\"", ex.Problems[2].Detail);
        Assert.Contains("needs a spectrum-analyser, but role \"vna\" is a network-analyser", ex.Problems[3].Detail);
        Assert.Contains("no earlier step acquires it", ex.Problems[4].Detail);
        Assert.Contains("unknown figure \"centre_hz\"", ex.Problems[5].Detail);
        Assert.Contains("expected a ratio in dB", ex.Problems[6].Detail);
        Assert.Contains("is above its \"max\"", ex.Problems[7].Detail);
        Assert.Contains("needs a cap", ex.Problems[8].Detail);
        Assert.Contains("no unit", ex.Problems[9].Detail);
    }

    [Fact]
    public void Parse_DuplicateStepName_IsAnError()
    {
        var ex = Fails("""
            plan: p
            roles: { vna: network-analyser }
            steps:
              - { name: hello, message: one }
              - { name: hello, message: two }
            """);

        Assert.Equal(["5:13"], Places(ex));
        Assert.Contains("already used (line 4)", ex.Problems[0].Detail);
    }

    [Fact]
    public void Parse_InlineMaskWithAProblem_IsReportedInThePlan()
    {
        var ex = Fails("""
            plan: p
            roles: { vna: network-analyser }
            steps:
              - sweep: { role: vna, traces: { S21: passband } }
              - check-mask:
                  trace: passband
                  mask:
                    mask: inline
                    upper:
                      - 130 MHz: -25 dB
                    wobble: 3
            """);

        var problem = Assert.Single(ex.Problems);
        Assert.Equal("plan.yaml:11:9", problem.Location.ToString());
        Assert.Contains("unknown key \"wobble\"", problem.Detail);
    }

    [Fact]
    public void Parse_RepeatUntilWithCap_IsValid()
    {
        var plan = PlanFile.Parse("""
            plan: tune
            roles: { vna: network-analyser }
            steps:
              - repeat:
                  until: { trace: passband, figures: { center_hz: { target: 137.5 MHz, tolerance: 100 kHz } } }
                  at-most: 500
                  steps:
                    - sweep: { role: vna, traces: { S21: passband } }
                    - wait: 500 ms
            """, Source, ".");

        var repeat = Assert.IsType<RepeatStep>(Assert.Single(plan.Steps));
        Assert.Equal(500, repeat.AtMost);
        Assert.Equal("passband", repeat.Until!.Trace);
        Assert.Equal(2, repeat.Steps.Count);
    }
}
