using System.Text.Json;
using BenchRunner.Cli.Tests.Support;

namespace BenchRunner.Cli.Tests.Commands;

public sealed class RunCommandTests
{
    private static readonly string Bench = RepositoryFiles.Example("bench-virtual.yaml");

    [Fact]
    public void Run_DemoPlanOnTheVirtualBench_PassesAndIsStored()
    {
        using var dir = new TempDirectory();
        var db = dir.PathOf("runs.db");

        var run = CliRun.Of("run", RepositoryFiles.Example("plans/psf-137-check.yaml"), "--bench", Bench, "--db", db, "--dut", "PSF-24-0001", "--json");

        Assert.Equal(0, run.ExitCode);
        using var doc = JsonDocument.Parse(run.Out);
        Assert.True(doc.RootElement.GetProperty("passed").GetBoolean());
        Assert.Equal(4, doc.RootElement.GetProperty("checks").GetArrayLength());
        var stored = CliRun.Of("results", "--db", db, "--dut", "PSF-24-0001");
        Assert.Contains("passed", stored.Out);
        Assert.Contains("PSF-24-0001", run.Error + stored.Out);
    }

    [Fact]
    public void Run_LimitTheBoardMisses_FailsWithExitCodeOneNamingTheCheck()
    {
        using var dir = new TempDirectory();
        var plan = TestPlans.WriteTight(dir, points: 401);

        var run = CliRun.Of("run", plan, "--bench", Bench, "--db", dir.PathOf("runs.db"));

        Assert.Equal(1, run.ExitCode);
        Assert.Contains("FAIL", run.Out);
        Assert.Contains("failed: insertion_loss_db of passband", run.Out);
    }

    [Fact]
    public void Run_PlanWithAnError_IsBadInputAndTouchesNothing()
    {
        using var dir = new TempDirectory();
        var plan = dir.Write("broken.yaml", "plan: broken\nroles:\n  vna: network-analyser\nsteps:\n  - sweep:\n      role: vna\n      traces:\n        S21: passband\n  - check-mask:\n      trace: nowhere\n      mask: ../psf-137-passband.yaml\n");
        var db = dir.PathOf("runs.db");

        var run = CliRun.Of("run", plan, "--bench", Bench, "--db", db);

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("broken.yaml:", run.Error);
        Assert.False(File.Exists(db));
    }

    [Fact]
    public void Run_WithoutBench_IsBadInput()
    {
        var run = CliRun.Of("run", RepositoryFiles.Example("plans/psf-137-check.yaml"));

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("--bench", run.Error);
    }
}
