using System.Text.Json;
using System.Text.RegularExpressions;
using BenchRunner.Cli.Tests.Support;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;
using BenchRunner.Core.Runs;

namespace BenchRunner.Cli.Tests.Commands;

public sealed partial class TuneCommandTests
{
    private static readonly string Bench = RepositoryFiles.Example("bench-virtual.yaml");
    private static readonly string Plan = RepositoryFiles.Example("plans/psf-137-tune.yaml");

    [GeneratedRegex(@"^sweep (\d+) \+[0-9.]+s (in|out|settled) ", RegexOptions.Multiline)]
    private static partial Regex SweepLine();

    [Fact]
    [Trait("Category", "Slow")]
    public void Tune_DemoWithoutATerminal_PrintsOneLinePerSweepSettlesAndStoresEverySweep()
    {
        using var dir = new TempDirectory();
        var db = dir.PathOf("tune.db");

        var run = CliRun.Of("tune", "--turn-time", "2", "--interval", "0.05", "--settle-time", "0.5", "--db", db);

        Assert.Equal(0, run.ExitCode);
        Assert.DoesNotContain("\u001b", run.Out);
        // The cautions come before the first sweep.
        Assert.Contains("Safety:", run.Out[..run.Out.IndexOf("sweep 1 ", StringComparison.Ordinal)]);
        var lines = SweepLine().Matches(run.Out).Select(m => int.Parse(m.Groups[1].Value)).ToList();
        Assert.Equal(Enumerable.Range(1, lines.Count), lines);
        var settled = Regex.Match(run.Out, @"settled at sweep (\d+):");
        Assert.True(settled.Success, run.Out);
        Assert.Equal(lines.Count, int.Parse(settled.Groups[1].Value));
        // Where the first sweep falls on the virtual hand's path depends on how long connecting took
        // on the real clock; the sweep-by-sweep course is checked on a fake clock in TuningSessionTests.

        using (var store = SqliteResultStore.Open(db))
        {
            var stored = Assert.Single(store.ListRuns());
            Assert.Equal(RunMode.Tuning, stored.Record.Mode);
            Assert.Equal("PSF-24-0002", stored.Record.DutSerial);
            Assert.Equal(lines.Count, store.GetSweeps(stored.Id).Count);
        }

        var results = CliRun.Of("results", "--db", db, "--run", "1");
        Assert.Equal(0, results.ExitCode);
        Assert.Contains($"Trajectory ({lines.Count} sweeps of the tuning session)", results.Out);
        Assert.Contains("Checks of the last sweep", results.Out);
    }

    [Fact]
    public void Tune_TunedBoardWithStopWhenSettled_SettlesAtTheThirdSweepAndReportsJson()
    {
        // The plain virtual bench holds the tuned board PSF-24-0001, still: inside from the first sweep.
        using var dir = new TempDirectory();
        var db = dir.PathOf("tune.db");

        var run = CliRun.Of("tune", Plan, "--bench", Bench, "--settle-sweeps", "3", "--settle-time", "0", "--interval", "0",
            "--stop-when-settled", "--db", db, "--json");

        Assert.Equal(0, run.ExitCode);
        using var doc = JsonDocument.Parse(run.Out);
        var root = doc.RootElement;
        Assert.True(root.GetProperty("settled").GetBoolean());
        Assert.Equal(3, root.GetProperty("first_settled_at_sweep").GetInt32());
        Assert.Equal(3, root.GetProperty("sweeps").GetInt32());
        Assert.Equal("passed", root.GetProperty("status").GetString());
        var centre = root.GetProperty("last_sweep").GetProperty("figures").EnumerateArray().Single(f => f.GetProperty("key").GetString() == "center_hz");
        Assert.Equal(137.5e6, centre.GetProperty("target").GetDouble());
        Assert.True(centre.GetProperty("inside").GetBoolean());
        // The log lines go to standard error with --json.
        Assert.Equal(3, SweepLine().Matches(run.Error).Count);
    }

    [Fact]
    public void Tune_TargetNeverMet_EndsAtTheSweepLimitWithExitCodeOne()
    {
        using var dir = new TempDirectory();
        var plan = TestPlans.WriteTight(dir, points: 201);

        var run = CliRun.Of("tune", plan, "--bench", Bench, "--max-sweeps", "2", "--interval", "0", "--db", dir.PathOf("tune.db"));

        Assert.Equal(1, run.ExitCode);
        Assert.Equal(2, SweepLine().Matches(run.Out).Count);
        Assert.Contains("insertion_loss_db=", run.Out);
        Assert.Contains("never settled", run.Out);
    }

    [Theory]
    [InlineData(new[] { "tune", "plan.yaml" }, "needs --bench")]
    [InlineData(new[] { "tune", "--bench", "bench.yaml" }, "--bench needs a PLAN")]
    [InlineData(new[] { "tune", "--settle-sweeps", "0" }, "at least 1 sweep")]
    [InlineData(new[] { "tune", "--interval", "-1" }, "--interval takes seconds")]
    public void Tune_BadArguments_AreBadInputWithOneLine(string[] args, string expected)
    {
        var run = CliRun.Of(args);

        Assert.Equal(2, run.ExitCode);
        Assert.Contains(expected, run.Error);
        Assert.Single(run.Error.Trim().Split('\n'));
    }

    [Fact]
    public void Tune_PlanWithoutASweep_IsBadInput()
    {
        using var dir = new TempDirectory();
        var plan = dir.Write("talk.yaml", """
            plan: talk
            roles:
              vna: network-analyser
            steps:
              - message: Nothing to measure here.
            """);

        var run = CliRun.Of("tune", plan, "--bench", Bench, "--db", dir.PathOf("tune.db"));

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("no sweep step", run.Error);
        Assert.False(File.Exists(dir.PathOf("tune.db")));
    }

    [Fact]
    public void Tune_OnATerminal_RedrawsAFramePerSweepWithTheFiguresAndThePlot()
    {
        using var dir = new TempDirectory();
        var output = new StringWriter();
        var console = new CliConsole(output, new StringWriter()) { IsTerminal = true };

        int code = CliApplication.Run(["tune", Plan, "--bench", Bench, "--max-sweeps", "2", "--settle-sweeps", "1", "--settle-time", "0",
            "--interval", "0", "--db", dir.PathOf("tune.db")], console);

        Assert.Equal(0, code);
        var frames = output.ToString().Split("\u001b[H").Skip(1).ToList();
        Assert.Equal(2, frames.Count);
        Assert.StartsWith("\u001b[2J", output.ToString());
        Assert.Contains("sweep 2", frames[1]);
        Assert.Contains("Centre frequency (-3 dB)", frames[1]);
        Assert.Contains("137.5 MHz ± 300 kHz", frames[1]);
        Assert.Contains("SETTLED", frames[1]);
        Assert.Contains("127.5 MHz", frames[1]);
        Assert.Contains("* trace", frames[1]);
        Assert.Contains("Caution:", frames[1]);
        // The screen the cautions stood on is gone: the summary repeats them.
        Assert.Contains("Safety:", frames[1]);
    }
}
