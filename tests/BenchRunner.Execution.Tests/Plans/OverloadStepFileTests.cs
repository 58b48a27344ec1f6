using BenchRunner.Core.Diagnostics;
using BenchRunner.Execution.Plans;

namespace BenchRunner.Execution.Tests.Plans;

public sealed class OverloadStepFileTests
{
    private const string Source = "plan.yaml";

    private const string Head = """
        plan: p
        roles: { sa: spectrum-analyser, vna: network-analyser }
        steps:
          - set-spectrum-analyser: { role: sa, centre: 137.5 MHz, span: 2 MHz }
        """;

    private static TestPlan Parse(string steps) => PlanFile.Parse(Head + "\n" + steps, Source, RepositoryFiles.Example("plans"));

    private static InputFormatException Fails(string text) =>
        Assert.Throws<InputFormatException>(() => PlanFile.Parse(text, Source, RepositoryFiles.Example("plans")));

    [Fact]
    public void Load_OverloadExample_ReadsTheStepAndLetsLaterChecksJudgeItsTrace()
    {
        var plan = PlanFile.Load(RepositoryFiles.Example("plans/lna-overload.yaml"));

        var step = Assert.Single(plan.Steps.OfType<OverloadCheckStep>());
        Assert.Equal(("sa", "output", 10.0, -85.0), (step.Role, step.Trace.Name, step.RaiseBy.Decibels, step.Threshold.Dbm));
        Assert.Equal([137.5e6], step.Carriers.Select(c => c.Hertz));
        Assert.Equal([137.5e6, 137.8e6], step.Lines!.Select(c => c.Hertz));
        Assert.Equal("output", Assert.Single(plan.Steps.OfType<FigureCheck>()).Trace);
    }

    [Fact]
    public void Parse_MinimalStep_TakesTheDefaults()
    {
        var plan = Parse("  - check-overload: { role: sa, trace: spectrum }");

        var step = Assert.IsType<OverloadCheckStep>(plan.Steps[1]);
        Assert.Equal((10.0, -90.0, 1.0), (step.RaiseBy.Decibels, step.Threshold.Dbm, step.ToleranceDb));
        Assert.Empty(step.Carriers);
        Assert.Null(step.Lines);
        Assert.Equal("check-overload", step.Word);
    }

    [Fact]
    public void Parse_BadStep_ReportsEachProblemWithItsPlace()
    {
        var ex = Assert.Throws<InputFormatException>(() => Parse("""
              - check-overload: { role: vna, trace: spectrum, raise-by: 2 dB, tolerance: 1 dB, carriers: [137.5], colour: red }
              - check-overload: { role: sa, trace: spectrum, lines: [] }
            """));

        var problems = ex.Problems.Select(p => p.ToString()).ToList();
        Assert.Contains(problems, p => p.StartsWith("plan.yaml:5:29: \"check-overload\" needs a spectrum-analyser", StringComparison.Ordinal));
        Assert.Contains(problems, p => p.StartsWith("plan.yaml:5:78: a 2 dB step cannot tell real lines", StringComparison.Ordinal));
        Assert.Contains(problems, p => p.StartsWith("plan.yaml:5:95: expected a frequency", StringComparison.Ordinal));
        Assert.Contains(problems, p => p.StartsWith("plan.yaml:5:103:", StringComparison.Ordinal) && p.Contains("colour", StringComparison.Ordinal));
        Assert.Contains(problems, p => p.StartsWith("plan.yaml:6:57: \"lines\" is empty", StringComparison.Ordinal));
    }

    [Fact]
    public void Parse_NoAnalyserSetupBefore_IsRefused()
    {
        var ex = Fails("""
            plan: p
            roles: { sa: spectrum-analyser }
            steps:
              - check-overload: { role: sa, trace: spectrum }
              - set-spectrum-analyser: { role: sa, centre: 137.5 MHz, span: 2 MHz }
            """);

        var problem = Assert.Single(ex.Problems);
        Assert.Equal((4, 5), (problem.Location.Line, problem.Location.Column));
        Assert.Contains("no earlier \"set-spectrum-analyser\" step", problem.Detail);
    }

    [Fact]
    public void Parse_TraceNameOfAnSParameter_IsRefused()
    {
        var ex = Fails("""
            plan: p
            roles: { sa: spectrum-analyser, vna: network-analyser }
            steps:
              - set-network-analyser: { role: vna, start: 127.5 MHz, stop: 147.5 MHz, points: 201 }
              - sweep: { role: vna, traces: { S21: passband } }
              - set-spectrum-analyser: { role: sa, centre: 137.5 MHz, span: 2 MHz }
              - check-overload: { role: sa, trace: passband }
            """);

        Assert.Contains("already names the S21 trace of line 5", Assert.Single(ex.Problems).Detail);
    }
}
