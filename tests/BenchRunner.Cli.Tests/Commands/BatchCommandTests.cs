using System.Text.Json;
using BenchRunner.Cli.Batch;
using BenchRunner.Cli.Tests.Support;
using BenchRunner.Core.Figures;
using BenchRunner.Core.Traces;
using BenchRunner.Execution.Plans;
using BenchRunner.Simulator.Circuits;
using BenchRunner.Simulator.Devices;

namespace BenchRunner.Cli.Tests.Commands;

public sealed class BatchCommandTests
{
    private static readonly string Plan = RepositoryFiles.Example("plans/psf-137-check.yaml");
    private static readonly string Bench = RepositoryFiles.Example("bench-virtual.yaml");

    /// <summary>
    /// What the lot model says each board fails: its circuit's S21 over the plan's sweep, against the
    /// plan's mask and figure limits, with no instrument in between.
    /// </summary>
    private static Dictionary<string, List<string>> ExpectedFailures()
    {
        var plan = PlanFile.Load(Plan);
        var setup = plan.AllSteps().OfType<NetworkAnalyserSetup>().Single();
        var axis = FrequencyAxis.Linear(setup.Start, setup.Stop, setup.Points);
        var mask = plan.AllSteps().OfType<MaskCheck>().Single();
        var figureCheck = plan.AllSteps().OfType<FigureCheck>().Single();
        var expected = new Dictionary<string, List<string>>();
        foreach (var board in BoardLot.Generate(20, seed: 73).Boards)
        {
            var s21 = board.Sweep(axis, [TraceQuantity.S21])[0];
            var failed = new List<string>();
            if (!mask.Mask.Evaluate(s21).Passed)
            {
                failed.Add($"mask {mask.Mask.Name} on {mask.Trace}");
            }

            var figures = FigureSummary.ForFilter(s21);
            failed.AddRange(figureCheck.Limits
                .Where(l => figures.First(f => f.Key == l.Key).Value is not { } v || !l.Passes(v.Value))
                .Select(l => $"{l.Key} of {figureCheck.Trace}"));
            expected[board.Serial] = failed;
        }

        return expected;
    }

    private static JsonElement Summary(CliRun run) => JsonDocument.Parse(run.Out).RootElement.GetProperty("summary");

    private static List<string> Strings(JsonElement array) => array.EnumerateArray().Select(e => e.GetString()!).ToList();

    [Fact]
    public void Batch_SeededLotFromTheExampleFile_GivesTheYieldAndRankingTheLotModelPredicts()
    {
        using var dir = new TempDirectory();
        var expected = ExpectedFailures();
        var failing = expected.Where(e => e.Value.Count > 0).Select(e => e.Key).Order(StringComparer.Ordinal).ToList();
        var ranking = expected.Values.SelectMany(f => f).GroupBy(f => f)
            .OrderByDescending(g => g.Count()).ThenBy(g => g.Key, StringComparer.Ordinal)
            .Select(g => (g.Key, g.Count())).ToList();
        // docs/simulator.md: with seed 73, boards 0002, 0012 and 0020 fail the example mask.
        Assert.Equal(["PSF-24-0002", "PSF-24-0012", "PSF-24-0020"], failing);

        // No --bench: the built-in virtual bench, whose fixture holds the simulated lot.
        var run = CliRun.Of("batch", Plan, "--lot", "PSF-24-L07", "--serials", RepositoryFiles.Example("lot-psf-24-l07.txt"),
            "--db", dir.PathOf("lot.db"), "--json");

        Assert.Equal(1, run.ExitCode);
        var summary = Summary(run);
        Assert.Equal(20, summary.GetProperty("boards").GetInt32());
        Assert.Equal(failing, Strings(summary.GetProperty("failed_serials")));
        Assert.Equal((20.0 - failing.Count) / 20, summary.GetProperty("yield").GetDouble(), 12);
        Assert.Equal((20.0 - failing.Count) / 20, summary.GetProperty("first_pass_yield").GetDouble(), 12);
        Assert.Equal(ranking, summary.GetProperty("failures_by_check").EnumerateArray()
            .Select(f => (f.GetProperty("check").GetString()!, f.GetProperty("failures").GetInt32())).ToList());
        var boards = JsonDocument.Parse(run.Out).RootElement.GetProperty("boards").EnumerateArray().ToList();
        Assert.Equal(20, boards.Count);
        foreach (var board in boards)
        {
            var serial = board.GetProperty("serial").GetString()!;
            Assert.Equal(expected[serial], Strings(board.GetProperty("failed_checks")));
        }

        var figures = summary.GetProperty("figures").EnumerateArray().ToList();
        Assert.Equal(["center_hz", "insertion_loss_db", "bandwidth_3db_hz"], figures.Select(f => f.GetProperty("key").GetString()));
        Assert.All(figures, f => Assert.Equal(20, f.GetProperty("count").GetInt32()));
        Assert.All(figures, f => Assert.True(f.GetProperty("cpk").GetDouble() > 0));
    }

    [Fact]
    public void Batch_Text_ShowsEachVerdictAtOnceTheLotSoFarAndTheSummary()
    {
        using var dir = new TempDirectory();
        var serials = dir.Write("serials.txt", "# two boards\nPSF-24-0001\n\nPSF-24-0012\n");

        var run = CliRun.Of("batch", Plan, "--lot", "PSF-24-L07", "--bench", Bench, "--serials", serials, "--db", dir.PathOf("lot.db"));

        Assert.Equal(1, run.ExitCode);
        var lines = run.Out.Split('\n');
        var first = Array.FindIndex(lines, l => l.StartsWith("PSF-24-0001", StringComparison.Ordinal));
        Assert.Contains("PASS", lines[first]);
        Assert.Contains("1 board done, 1 passed, yield 100.0 %", lines[first + 1]);
        Assert.Contains(lines, l => l.StartsWith("PSF-24-0012", StringComparison.Ordinal) && l.Contains("FAIL", StringComparison.Ordinal));
        Assert.Contains("failed: center_hz of passband: 137.8", run.Out);
        Assert.Contains("2 boards done, 1 passed, yield 50.0 %", run.Out);
        Assert.Contains("yield 50.0 %, first-pass yield 50.0 %", run.Out);
        Assert.Contains("Cpk", run.Out);
        Assert.Contains("benchrunner report --lot PSF-24-L07", run.Out);
        Assert.Contains("Safety:", run.Error);
    }

    [Fact]
    public void Batch_Typed_AsksForEachSerialRefusesANonSerialAndEndsOnAnEmptyLine()
    {
        using var dir = new TempDirectory();

        var run = CliRun.WithInput("PSF-24-0001\nPSF 24 0003\nPSF-24-0003\n\n",
            "batch", Plan, "--lot", "PSF-24-L07", "--bench", Bench, "--db", dir.PathOf("lot.db"), "--json");

        Assert.Equal(0, run.ExitCode);
        Assert.Equal(4, run.Error.Split(SerialSource.Prompt).Length - 1);
        Assert.Contains("not a serial: a serial has no spaces", run.Error);
        Assert.Equal(["PSF-24-0001", "PSF-24-0003"],
            JsonDocument.Parse(run.Out).RootElement.GetProperty("boards").EnumerateArray().Select(b => b.GetProperty("serial").GetString()));
    }

    [Fact]
    public void Batch_SameBoardAgainFromStandardInput_IsARetestWithItsHistoryKept()
    {
        using var dir = new TempDirectory();

        var run = CliRun.WithInput("PSF-24-0002\nPSF-24-0002\n",
            "batch", Plan, "--lot", "PSF-24-L07", "--bench", Bench, "--serials", "-", "--db", dir.PathOf("lot.db"), "--json");

        Assert.Equal(1, run.ExitCode);
        Assert.DoesNotContain(SerialSource.Prompt, run.Error);
        var boards = JsonDocument.Parse(run.Out).RootElement.GetProperty("boards").EnumerateArray().ToList();
        Assert.Equal([false, true], boards.Select(b => b.GetProperty("retest").GetBoolean()));
        var summary = Summary(run);
        Assert.Equal(1, summary.GetProperty("boards").GetInt32());
        Assert.Equal(1, summary.GetProperty("retested").GetInt32());
        // Every test counts in the ranking: the mask failed twice.
        Assert.Equal(2, summary.GetProperty("failures_by_check")[0].GetProperty("failures").GetInt32());
    }

    [Fact]
    public void Batch_SerialTheVirtualLotDoesNotHold_LeavesTheBoardUntested()
    {
        using var dir = new TempDirectory();

        var run = CliRun.WithInput("PSF-24-0099\n", "batch", Plan, "--lot", "PSF-24-L07", "--bench", Bench, "--serials", "-", "--db", dir.PathOf("lot.db"));

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("PSF-24-0099    NOT TESTED: the virtual lot holds PSF-24-0001 to PSF-24-0020, not PSF-24-0099", run.Out);
        Assert.Contains("No board has a verdict yet.", run.Out);
    }

    [Fact]
    public void Batch_SerialsFileWithABadLine_IsBadInputNamingTheLine()
    {
        using var dir = new TempDirectory();
        var serials = dir.Write("serials.txt", "PSF-24-0001\n# comment\n  PSF 24 0002\n");

        var run = CliRun.Of("batch", Plan, "--lot", "PSF-24-L07", "--bench", Bench, "--serials", serials, "--db", dir.PathOf("lot.db"));

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("serials.txt:3:3", run.Error);
        Assert.Contains("a serial has no spaces", run.Error);
        Assert.False(File.Exists(dir.PathOf("lot.db")));
    }

    [Fact]
    public void Batch_WithoutALot_IsBadInput()
    {
        var run = CliRun.Of("batch", Plan);

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("--lot", run.Error);
    }

    [Fact]
    public void Batch_Help_DescribesTheSerialSources()
    {
        var run = CliRun.Of("batch", "--help");

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("--serials", run.Out);
        Assert.Contains("barcode", run.Out);
    }
}
