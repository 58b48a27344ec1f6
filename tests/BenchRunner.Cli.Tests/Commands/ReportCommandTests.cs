using System.Text.Json;
using System.Xml.Linq;
using BenchRunner.Cli.Tests.Support;
using BenchRunner.Core.TraceFiles;
using BenchRunner.Core.Traces;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;

namespace BenchRunner.Cli.Tests.Commands;

public sealed class ReportCommandTests
{
    private static readonly XNamespace H = "http://www.w3.org/1999/xhtml";
    private static readonly XNamespace S = "http://www.w3.org/2000/svg";

    private static string BatchOfThree(TempDirectory dir)
    {
        var db = dir.PathOf("lot.db");
        var serials = dir.Write("serials.txt", "PSF-24-0001\nPSF-24-0002\nPSF-24-0003\n");
        Assert.Equal(1, CliRun.Of("batch", RepositoryFiles.Example("plans/psf-137-check.yaml"), "--lot", "PSF-24-L07",
            "--serials", serials, "--db", db).ExitCode);
        return db;
    }

    [Fact]
    public void Report_LotAfterABatch_WritesOneWellFormedPageWithItsPlots()
    {
        using var dir = new TempDirectory();
        var db = BatchOfThree(dir);
        var file = dir.PathOf("reports/lot.html");

        var run = CliRun.Of("report", "--lot", "PSF-24-L07", "--db", db, "-o", file);

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("wrote", run.Out);
        var text = File.ReadAllText(file);
        Assert.StartsWith("<!DOCTYPE html>", text);
        var page = XDocument.Parse(text);
        Assert.Equal("Lot PSF-24-L07", page.Descendants(H + "h1").Single().Value);
        var svgs = page.Descendants(S + "svg").ToList();
        Assert.Contains(svgs, s => (string?)s.Attribute("id") == "yield");
        Assert.Equal(3, svgs.Count(s => ((string)s.Attribute("id")!).StartsWith("histogram", StringComparison.Ordinal)));
        Assert.Equal(3, svgs.Count(s => ((string)s.Attribute("id")!).StartsWith("board-", StringComparison.Ordinal)));
        Assert.Contains("SIM-VNA", page.Root!.Value);
        Assert.Empty(page.Descendants(H + "script"));
    }

    [Fact]
    public void Report_Run_HasItsPlanHashAndTheTraceAgainstTheMask()
    {
        using var dir = new TempDirectory();
        var db = BatchOfThree(dir);
        var file = dir.PathOf("run2.html");

        var run = CliRun.Of("report", "--run", "2", "--db", db, "-o", file, "--json");

        Assert.Equal(0, run.ExitCode);
        Assert.Equal("run 2", JsonDocument.Parse(run.Out).RootElement.GetProperty("report").GetString());
        var page = XDocument.Load(file);
        using var store = SqliteResultStore.Open(db);
        Assert.Contains(store.GetRun(2)!.PlanSha256, page.Root!.Value);
        // Board 0002 fails the mask: its plot shades where.
        Assert.Contains(page.Descendants(S + "rect"), r => (string?)r.Attribute("class") == "fail-span");
    }

    [Fact]
    public void Report_ExistingFile_IsLeftAloneUnlessReplaced()
    {
        using var dir = new TempDirectory();
        var db = BatchOfThree(dir);
        var file = dir.Write("lot.html", "keep me");

        var refused = CliRun.Of("report", "--lot", "PSF-24-L07", "--db", db, "-o", file);
        Assert.Equal(2, refused.ExitCode);
        Assert.Contains("already exists", refused.Error);
        Assert.Equal("keep me", File.ReadAllText(file));

        Assert.Equal(0, CliRun.Of("report", "--lot", "PSF-24-L07", "--db", db, "-o", file, "--replace").ExitCode);
        Assert.StartsWith("<!DOCTYPE html>", File.ReadAllText(file));
    }

    [Theory]
    [InlineData]
    [InlineData("--run", "1", "--lot", "PSF-24-L07")]
    public void Report_NeitherOrBothSubjects_IsBadInput(params string[] subject)
    {
        using var dir = new TempDirectory();

        var run = CliRun.Of(["report", .. subject, "-o", dir.PathOf("x.html")]);

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("either --run ID or --lot LOT", run.Error);
    }

    [Fact]
    public void Report_UnknownLot_IsBadInputAndWritesNothing()
    {
        using var dir = new TempDirectory();
        var db = BatchOfThree(dir);

        var run = CliRun.Of("report", "--lot", "PSF-24-L99", "--db", db, "-o", dir.PathOf("x.html"));

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("holds no run of lot \"PSF-24-L99\"", run.Error);
        Assert.False(File.Exists(dir.PathOf("x.html")));
    }

    [Fact]
    public void Export_BatchRun_ReadsBackToTheStoredSweeps()
    {
        using var dir = new TempDirectory();
        var db = BatchOfThree(dir);

        Assert.Equal(0, CliRun.Of("export", "--run", "3", "--format", "csv", "-o", dir.PathOf("out"), "--db", db).ExitCode);

        using var store = SqliteResultStore.Open(db);
        var written = Directory.GetFiles(dir.PathOf("out")).Select(TraceFile.Read).SelectMany(s => s.Traces).ToList();
        foreach (var stored in store.GetSweeps(3).Select(s => (ComplexTrace)s.Record.Trace))
        {
            var back = (ComplexTrace)written.Single(t => t.Quantity == stored.Quantity);
            Assert.True(stored.Axis.SamePointsAs(back.Axis));
            Assert.Equal(stored.Count, back.Count);
            for (int i = 0; i < stored.Count; i++)
            {
                // Exports promise round-trip precision (CsvTraceFile docs): 1e-12 relative.
                Assert.True(System.Numerics.Complex.Abs(stored.Samples[i] - back.Samples[i]) <= 1e-12 * stored.Samples[i].Magnitude, $"point {i}");
            }
        }
    }
}
