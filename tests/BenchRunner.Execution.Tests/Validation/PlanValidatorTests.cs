using BenchRunner.Core.Diagnostics;
using BenchRunner.Execution.Validation;
using BenchRunner.Execution.Preparation;

namespace BenchRunner.Execution.Tests.Validation;

public sealed class PlanValidatorTests
{
    private static readonly string VirtualBench = RepositoryFiles.Example("bench-virtual.yaml");

    [Theory]
    [InlineData("psf-137-check.yaml")]
    [InlineData("lna-harmonics.yaml")]
    public void Load_Examples_ValidateAgainstTheVirtualBench(string plan)
    {
        var validated = RunPreparation.Load(RepositoryFiles.Example("plans/" + plan), VirtualBench);

        Assert.NotNull(validated.Bench);
        Assert.All(validated.Plan.Roles, r => Assert.Equal(r.Kind, validated.Bench!.Definition.Instruments[r.Role].Kind));
    }

    [Fact]
    public void Load_GeneratorTooHotForTheAnalyser_NamesBothAndThePath()
    {
        using var dir = new TempDirectory();
        var plan = dir.Write("hot.yaml", """
            plan: hot
            roles: { gen: signal-generator, sa: spectrum-analyser }
            steps:
              - set-generator: { role: gen, level: -5 dBm }
              - set-generator: { role: gen, level: +0.5 dBm }
            """);
        // The bench's own limits would refuse +0.5 dBm (max output 0 dBm), so use a bench whose
        // generator may go higher but whose analyser input is 0 dBm behind a 1 dB cable.
        var bench = dir.Write("bench.yaml", """
            bench: b
            instruments:
              gen: { kind: signal-generator, adapter: scpi, connection: sim:gen, limits: { max-output-level: +10 dBm } }
              sa: { kind: spectrum-analyser, adapter: scpi, connection: sim:sa, limits: { max-input-level: 0 dBm } }
            paths:
              gen -> sa: -0.4 dB
            """);

        var ex = Assert.Throws<InputFormatException>(() => RunPreparation.Load(plan, bench));

        // +0.5 dBm - 0.4 dB = +0.1 dBm, above 0 dBm; -5 dBm - 0.4 dB is below it (arithmetic of dB gains).
        var problem = Assert.Single(ex.Problems);
        Assert.Equal((5, 40), (problem.Location.Line, problem.Location.Column));
        Assert.StartsWith("gen level +0.5 dBm through gen -> sa (-0.4 dB) reaches +0.1 dBm at sa, above its declared maximum input of 0 dBm", problem.Detail);
        Assert.Contains("attenuator", problem.Detail);
    }

    [Fact]
    public void Load_RoleMissingOrOfTheWrongKind_ReportsEach()
    {
        using var dir = new TempDirectory();
        var plan = dir.Write("p.yaml", """
            plan: p
            roles:
              vna: spectrum-analyser
              dmm: network-analyser
            steps:
              - message: hello
            """);

        var ex = Assert.Throws<InputFormatException>(() => RunPreparation.Load(plan, VirtualBench));

        Assert.Equal([(3, 3), (4, 3)], ex.Problems.Select(p => (p.Location.Line, p.Location.Column)));
        Assert.Contains("on the bench \"virtual-bench\" it is a network-analyser", ex.Problems[0].Detail);
        Assert.Contains("has no instrument of that name", ex.Problems[1].Detail);
    }

    [Fact]
    public void Load_ProblemsInBothFiles_AreReportedTogether()
    {
        using var dir = new TempDirectory();
        var plan = dir.Write("p.yaml", "plan: p\nroles: { vna: network-analyser }\nsteps:\n  - wait: soon\n");
        var bench = dir.Write("b.yaml", "bench: b\ninstruments: { vna: { kind: network-analyser, adapter: scpi } }\n");

        var ex = Assert.Throws<InputFormatException>(() => RunPreparation.Load(plan, bench));

        Assert.Equal(2, ex.Problems.Count);
        Assert.EndsWith("p.yaml", ex.Problems[0].Location.File);
        Assert.EndsWith("b.yaml", ex.Problems[1].Location.File);
    }
}
