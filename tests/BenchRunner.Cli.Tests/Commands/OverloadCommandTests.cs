using System.Text.Json;
using BenchRunner.Cli.Tests.Support;

namespace BenchRunner.Cli.Tests.Commands;

/// <summary>
/// <c>benchrunner overload</c> on the virtual bench. Its demo scene holds a −15 dBm line at 68.9 MHz
/// whose 2nd harmonic the analyser's mixer makes at 137.8 MHz: at 0 dB attenuation 2·(−15) − 35 =
/// −65 dBm, at 10 dB (2·(−25) − 35) + 10 = −75 dBm, the 2 dB/dB rule shown as −10 dB
/// (REFERENCES.md, Spectrum-analyser distortion [book]; the scene is DemoScene).
/// </summary>
public sealed class OverloadCommandTests
{
    private static readonly string Bench = RepositoryFiles.Example("bench-virtual.yaml");

    [Fact]
    public void Overload_SpurMadeByTheAnalyser_FailsNamingItWithAdviceAndIsStored()
    {
        using var dir = new TempDirectory();
        var db = dir.PathOf("runs.db");

        var run = CliRun.Of("overload", "--bench", Bench, "--centre", "137.5MHz", "--span", "4MHz", "--tone", "137.5MHz",
            "--tone-level", "-30dBm", "--line", "137.8MHz", "--threshold", "-85dBm", "--db", db);

        Assert.Equal(1, run.ExitCode);
        Assert.Contains("Overload check FAIL: the analyser made 1 line the plan relies on: 137.8 MHz (-10.0 dB, analyser-made (2nd order))", run.Out);
        Assert.Contains("add an external pad", run.Out);
        Assert.Matches(@"137\.5 MHz +-31 dBm +0\.0 dB +real +carrier 1", run.Out);
        var stored = CliRun.Of("results", "--db", db, "--run", "1");
        Assert.Contains("FAIL  overload check of spectrum", stored.Out);
        Assert.Contains("analyser-made (2nd order)", stored.Out);
        Assert.Contains("#1 spectrum: overloaded; no path compensation", stored.Out);
    }

    [Fact]
    public async Task Overload_StoredPlanText_ReadsBackToThePlanThatRan()
    {
        using var dir = new TempDirectory();
        var db = dir.PathOf("runs.db");

        var run = CliRun.Of("overload", "--bench", Bench, "--centre", "137.5MHz", "--span", "4MHz", "--tone", "137.5MHz",
            "--tone-level", "-30dBm", "--line", "137.8MHz", "--threshold", "-85dBm", "--db", db);

        Assert.Equal(1, run.ExitCode);
        await using var store = BenchRunner.Storage.ResultStores.Open(db);
        var stored = (await store.GetRunAsync(1))!;
        var plan = BenchRunner.Execution.Plans.PlanFile.Parse(stored.Record.PlanText, "stored.yaml", dir.Path);
        Assert.Equal(["set-generator", "set-spectrum-analyser", "check-overload", "set-generator"], plan.Steps.Select(s => s.Word));
        var check = Assert.IsType<BenchRunner.Execution.Plans.OverloadCheckStep>(plan.Steps[2]);
        Assert.Equal(-85, check.Threshold.Dbm);
        Assert.Equal(137.8e6, Assert.Single(check.Lines!).Hertz);
        var analyser = Assert.IsType<BenchRunner.Execution.Plans.SpectrumAnalyserSetup>(plan.Steps[1]);
        Assert.Equal(135.5e6, analyser.Start.Hertz);
        Assert.Equal(139.5e6, analyser.Stop.Hertz);
        Assert.Equal(false, Assert.IsType<BenchRunner.Execution.Plans.GeneratorSetup>(plan.Steps[3]).Output);
    }

    [Fact]
    public void Overload_Json_ListsEveryLineWithItsClass()
    {
        using var dir = new TempDirectory();

        var run = CliRun.Of("overload", "--bench", Bench, "--centre", "137.5MHz", "--span", "4MHz", "--threshold", "-85dBm",
            "--carrier", "68.9MHz", "--db", dir.PathOf("runs.db"), "--json");

        // Every line counts when none is named, so the analyser's own harmonic fails the check.
        Assert.Equal(1, run.ExitCode);
        using var doc = JsonDocument.Parse(run.Out);
        Assert.True(doc.RootElement.GetProperty("overloaded").GetBoolean());
        var spur = doc.RootElement.GetProperty("lines").EnumerateArray().Single(l => Math.Abs(l.GetProperty("frequency_hz").GetDouble() - 137.8e6) < 20e3);
        Assert.Equal("analyser_second_order", spur.GetProperty("class").GetString());
        Assert.Equal("H2 of carrier 1", spur.GetProperty("label").GetString());
        Assert.Equal(-10, spur.GetProperty("change_db").GetDouble(), 0.5);
        // 68.9 MHz lies outside the span: its level is not measured, so there is no dBc.
        Assert.Equal(JsonValueKind.Null, spur.GetProperty("dbc").ValueKind);
    }

    [Fact]
    public void Overload_ToneTooHotForTheAnalyser_IsBadInputBeforeAnythingIsTouched()
    {
        using var dir = new TempDirectory();

        var run = CliRun.Of("overload", "--bench", Bench, "--centre", "137.5MHz", "--span", "4MHz", "--tone", "137.5MHz", "--tone-level", "+5dBm",
            "--db", dir.PathOf("runs.db"));

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("above its declared maximum", run.Error);
        Assert.False(File.Exists(dir.PathOf("runs.db")));
    }

    [Theory]
    [InlineData("--centre", "137.5")]
    [InlineData("--start", "136MHz")]
    public void Overload_BadSpan_IsAUsageError(string option, string value)
    {
        var run = CliRun.Of("overload", "--bench", Bench, option, value, "--span", "4MHz");

        Assert.Equal(2, run.ExitCode);
        Assert.StartsWith("benchrunner: ", run.Error);
    }

    [Fact]
    public void Run_OverloadExamplePlan_FlagsTheFigureChecksOnTheOverloadedTrace()
    {
        using var dir = new TempDirectory();

        var run = CliRun.Of("run", RepositoryFiles.Example("plans/lna-overload.yaml"), "--bench", Bench, "--db", dir.PathOf("runs.db"), "--json");

        Assert.Equal(1, run.ExitCode);
        using var doc = JsonDocument.Parse(run.Out);
        var checks = doc.RootElement.GetProperty("checks").EnumerateArray().ToList();
        Assert.False(checks[0].GetProperty("passed").GetBoolean());
        Assert.True(checks[0].GetProperty("lines").GetArrayLength() >= 2);
        Assert.All(checks.Skip(1), c => Assert.True(c.GetProperty("trace_overloaded").GetBoolean()));
    }

    [Fact]
    public void Run_PlanOnAProbedBench_PrintsTheProbingCautions()
    {
        using var dir = new TempDirectory();
        var plan = dir.Write("probe.yaml", """
            plan: probe
            roles: { sa: spectrum-analyser }
            steps:
              - set-spectrum-analyser: { role: sa, centre: 137.5 MHz, span: 4 MHz }
              - sweep: { role: sa, traces: { power: probed } }
            """);

        var run = CliRun.Of("run", plan, "--bench", RepositoryFiles.Example("bench-probe.yaml"), "--db", dir.PathOf("runs.db"));

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("CAUTION: sa probes inside a working circuit", run.Error);
        Assert.Contains("mains-powered or high-voltage", run.Error);
        Assert.Contains("DC block", run.Error);
    }
}
