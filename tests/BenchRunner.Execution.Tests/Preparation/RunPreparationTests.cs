using BenchRunner.Core.Diagnostics;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Preparation;

namespace BenchRunner.Execution.Tests.Preparation;

public sealed class RunPreparationTests
{
    private static readonly string VirtualBench = RepositoryFiles.Example("bench-virtual.yaml");

    [Fact]
    public void Load_KeepsTheExactTextsItParsed()
    {
        var planPath = RepositoryFiles.Example("plans/psf-137-check.yaml");

        var prepared = RunPreparation.Load(planPath, VirtualBench);

        Assert.Equal(File.ReadAllText(planPath), prepared.PlanText);
        Assert.Equal(File.ReadAllText(VirtualBench), prepared.RequiredBench.Text);
        var context = prepared.Context("0.1.0", "bench-pc");
        Assert.Equal(prepared.PlanText, context.PlanText);
        Assert.Equal(prepared.RequiredBench.Text, context.BenchText);
    }

    [Fact]
    public void Load_TheFileChangesAfterwards_TheRunStillCarriesTheTextThatWasParsed()
    {
        using var dir = new TempDirectory();
        Directory.CreateDirectory(dir.PathOf("plans"));
        File.Copy(RepositoryFiles.Example("psf-137-passband.yaml"), dir.PathOf("psf-137-passband.yaml"));
        var planPath = dir.PathOf("plans/plan.yaml");
        var original = File.ReadAllText(RepositoryFiles.Example("plans/psf-137-check.yaml"));
        File.WriteAllText(planPath, original);

        var prepared = RunPreparation.Load(planPath, VirtualBench);
        File.WriteAllText(planPath, "plan: something else entirely\n");

        Assert.Equal(original, prepared.PlanText);
        Assert.Equal("psf-137-check", prepared.Plan.Name);
    }

    [Fact]
    public void Load_ProblemsInBothFiles_AreReportedTogether()
    {
        using var dir = new TempDirectory();
        var planPath = dir.PathOf("plan.yaml");
        var benchPath = dir.PathOf("bench.yaml");
        File.WriteAllText(planPath, "plan: broken\nroles: { vna: network-analyser }\nsteps:\n  - sweep: { role: vna, traces: { S99: x } }\n");
        File.WriteAllText(benchPath, "bench: broken\ninstruments:\n  vna: { kind: teapot }\n");

        var ex = Assert.Throws<InputFormatException>(() => RunPreparation.Load(planPath, benchPath));

        Assert.Contains(ex.Problems, p => p.Location.File == planPath);
        Assert.Contains(ex.Problems, p => p.Location.File == benchPath);
    }

    [Fact]
    public void FromPlan_KeepsARenderingThatReadsBackToThePlan()
    {
        var bench = RunPreparation.LoadBench(VirtualBench);
        var plan = PlanFile.Parse("""
            plan: tone
            roles: { gen: signal-generator, sa: spectrum-analyser }
            steps:
              - set-generator: { role: gen, frequency: 137.5 MHz, level: -30 dBm, output: on }
              - set-spectrum-analyser: { role: sa, centre: 137.5 MHz, span: 4 MHz }
              - check-overload: { role: sa, trace: spectrum, threshold: -85 dBm }
            """, "tone.yaml", ".");

        var prepared = RunPreparation.FromPlan(plan, bench, "made in a test");

        Assert.Same(plan, prepared.Plan);
        Assert.Equal(PlanWriter.Write(plan, "made in a test"), prepared.PlanText);
        Assert.Equal(3, PlanFile.Parse(prepared.PlanText, "again.yaml", ".").Steps.Count);
    }
}
