using System.Text.Json;
using BenchRunner.Cli.Tests.Support;
using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.TraceFiles;
using BenchRunner.Core.Traces;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;
using BenchRunner.Core.Runs;

namespace BenchRunner.Cli.Tests.Commands;

public sealed class ResultsCommandTests
{
    private static string MakeDatabase(TempDirectory dir)
    {
        var path = dir.PathOf("results.db");
        var s21 = TraceFile.Read(RepositoryFiles.Example("psf-24-0001.s2p")).Find(TraceQuantity.S21)!;
        using var store = SqliteResultStore.Open(path);
        var first = store.StartRun(new RunRecord(RunMode.Single, "psf-137-check", "name: psf-137-check\n", "0.1.0", "bench-1")
        {
            DutSerial = "PSF-24-0001", Lot = "PSF-24-L07", Operator = "tech",
        });
        store.AddInstrument(first, new InstrumentRecord("vna", "network-analyser", "BenchRunner", "SIM-VNA", "SV-0001", "1.0") { Connection = "sim:vna" });
        var sweep = store.AddSweep(first, new SweepRecord("sweep", s21) { TraceName = "s21", InstrumentRole = "vna", Figures = FigureSummary.ForFilter(s21) });
        store.AddCheck(first, new CheckRecord("passband mask", CheckKind.Mask, true) { SweepId = sweep, Margin = 0.66, MarginUnit = "dB", LimitText = "psf-137-passband" });
        store.FinishRun(first, RunStatus.Passed);
        var second = store.StartRun(new RunRecord(RunMode.Single, "psf-137-check", "name: psf-137-check\n", "0.1.0", "bench-1") { DutSerial = "PSF-24-0002", Lot = "PSF-24-L07" });
        store.FinishRun(second, RunStatus.Failed);
        return path;
    }

    [Fact]
    public void Results_List_ShowsEveryRunWithItsVerdict()
    {
        using var dir = new TempDirectory();
        var db = MakeDatabase(dir);

        var run = CliRun.Of("results", "--db", db);

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("PSF-24-0001", run.Out);
        Assert.Contains("PSF-24-0002", run.Out);
        Assert.Contains("FAILED", run.Out);
        Assert.Contains("passed", run.Out);
    }

    [Fact]
    public void Results_FilterBySerial_ShowsOnlyThatBoard()
    {
        using var dir = new TempDirectory();
        var db = MakeDatabase(dir);

        using var doc = JsonDocument.Parse(CliRun.Of("results", "--db", db, "--dut", "PSF-24-0002", "--json").Out);

        var runs = doc.RootElement.GetProperty("runs");
        Assert.Equal(1, runs.GetArrayLength());
        Assert.Equal("failed", runs[0].GetProperty("status").GetString());
    }

    [Fact]
    public void Results_OneRun_ShowsInstrumentsChecksAndTheFiguresOfEachSweep()
    {
        using var dir = new TempDirectory();
        var db = MakeDatabase(dir);

        var text = CliRun.Of("results", "--db", db, "--run", "1");
        using var doc = JsonDocument.Parse(CliRun.Of("results", "--db", db, "--run", "1", "--json").Out);

        Assert.Equal(0, text.ExitCode);
        Assert.Contains("SIM-VNA", text.Out);
        Assert.Contains("pass  passband mask", text.Out);
        Assert.Contains("137.5606 MHz", text.Out);
        var sweep = doc.RootElement.GetProperty("sweeps")[0];
        Assert.Equal(401, sweep.GetProperty("points").GetInt32());
        Assert.InRange(sweep.GetProperty("figures").GetProperty("center_hz").GetDouble(), 137.5e6, 137.6e6);
        Assert.Equal(64, doc.RootElement.GetProperty("plan_sha256").GetString()!.Length);
    }

    [Fact]
    public void Results_Last_ShowsTheNewestRunOrTheNewestOfTheBoardGiven()
    {
        using var dir = new TempDirectory();
        var db = MakeDatabase(dir);

        using var newest = JsonDocument.Parse(CliRun.Of("results", "--db", db, "--last", "--json").Out);
        using var ofBoard = JsonDocument.Parse(CliRun.Of("results", "--db", db, "--last", "--dut", "PSF-24-0001", "--json").Out);

        Assert.Equal(2, newest.RootElement.GetProperty("id").GetInt64());
        Assert.Equal(1, ofBoard.RootElement.GetProperty("id").GetInt64());
    }

    [Fact]
    public void Results_LastWithRunOrWithNoMatch_IsBadInput()
    {
        using var dir = new TempDirectory();
        var db = MakeDatabase(dir);

        var both = CliRun.Of("results", "--db", db, "--last", "--run", "1");
        var none = CliRun.Of("results", "--db", db, "--last", "--dut", "PSF-24-0099");

        Assert.Equal(2, both.ExitCode);
        Assert.Contains("not both", both.Error);
        Assert.Equal(2, none.ExitCode);
        Assert.Contains("no run of that board or lot", none.Error);
    }

    [Fact]
    public void Results_OneRun_KeepsTheSweepTableAlignedWithALongTraceName()
    {
        using var dir = new TempDirectory();
        var db = dir.PathOf("long.db");
        var s21 = TraceFile.Read(RepositoryFiles.Example("psf-24-0001.s2p")).Find(TraceQuantity.S21)!;
        using (var store = SqliteResultStore.Open(db))
        {
            var id = store.StartRun(new RunRecord(RunMode.Single, "p", "plan: p\n", "0.1.0", "bench-1"));
            store.AddSweep(id, new SweepRecord("sweep", s21) { TraceName = "s21", Figures = FigureSummary.ForFilter(s21) });
            store.AddSweep(id, new SweepRecord("sweep", s21) { TraceName = "passband-after-rework", Figures = FigureSummary.ForFilter(s21) });
            store.FinishRun(id, RunStatus.Passed);
        }

        var lines = CliRun.Of("results", "--db", db, "--run", "1").Out.Split('\n');

        // The first figure column starts at the same place in both rows, whatever the trace name's length.
        var rows = lines.Where(l => l.Contains(" s21 ", StringComparison.Ordinal) || l.Contains("passband-after-rework", StringComparison.Ordinal)).ToList();
        Assert.Equal(2, rows.Count);
        static int AfterName(string row, string name)
        {
            int i = row.IndexOf(name, StringComparison.Ordinal) + name.Length;
            while (i < row.Length && row[i] == ' ') i++;
            return i;
        }

        Assert.Equal(AfterName(rows[0], " s21"), AfterName(rows[1], "passband-after-rework"));
        Assert.True(AfterName(rows[1], "passband-after-rework") < rows[1].Length, "the row holds figures after the trace name");
    }

    [Fact]
    public void Results_MissingDatabase_IsBadInputAndCreatesNothing()
    {
        using var dir = new TempDirectory();
        var db = dir.PathOf("none.db");

        var run = CliRun.Of("results", "--db", db);

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("no result database", run.Error);
        Assert.False(File.Exists(db));
    }

    [Fact]
    public void Results_UnknownRun_IsBadInput()
    {
        using var dir = new TempDirectory();
        var db = MakeDatabase(dir);

        var run = CliRun.Of("results", "--db", db, "--run", "99");

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("no run 99", run.Error);
    }
}
