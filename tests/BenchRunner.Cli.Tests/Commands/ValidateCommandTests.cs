using System.Text.Json;
using BenchRunner.Cli.Tests.Support;

namespace BenchRunner.Cli.Tests.Commands;

public sealed class ValidateCommandTests
{
    private static readonly string Bench = RepositoryFiles.Example("bench-virtual.yaml");

    [Fact]
    public void Validate_ExamplePlanOnTheVirtualBench_ExitsZeroWithASummary()
    {
        var run = CliRun.Of("validate", RepositoryFiles.Example("plans/psf-137-check.yaml"), "--bench", Bench);

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("\"psf-137-check\" is valid on bench \"virtual-bench\"", run.Out);
        Assert.Contains("checks  4 (1 mask, 3 figure limits)", run.Out);
        Assert.Equal("", run.Error);
    }

    [Fact]
    public void Validate_BadPlan_ExitsTwoWithEveryProblemOnItsOwnLine()
    {
        using var dir = new TempDirectory();
        var plan = dir.Write("bad.yaml", "plan: bad\nroles: { vna: network-analyser }\nsteps:\n  - wait: 5\n  - check-mask: { trace: nothing, mask: none.yaml }\n");

        var run = CliRun.Of("validate", plan, "--json");

        Assert.Equal(2, run.ExitCode);
        var lines = run.Error.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(3, lines.Length);
        Assert.All(lines, l => Assert.Matches(@"bad\.yaml:\d+:\d+: ", l));
        using var doc = JsonDocument.Parse(run.Out);
        Assert.False(doc.RootElement.GetProperty("valid").GetBoolean());
        Assert.Equal(3, doc.RootElement.GetProperty("problems").GetArrayLength());
        Assert.Equal(4, doc.RootElement.GetProperty("problems")[0].GetProperty("line").GetInt32());
    }
}
