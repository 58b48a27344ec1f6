using System.Numerics;
using BenchRunner.Cli.Tests.Support;
using BenchRunner.Core.TraceFiles;
using BenchRunner.Core.Traces;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;
using BenchRunner.Core.Runs;

namespace BenchRunner.Cli.Tests.Commands;

public sealed class ExportCommandTests
{
    [Theory]
    [InlineData("touchstone")]
    [InlineData("csv")]
    public void Export_DemoRun_FilesReadBackToTheStoredSamples(string format)
    {
        using var dir = new TempDirectory();
        var db = dir.PathOf("demo.db");
        Assert.Equal(0, CliRun.Of("demo", "--db", db).ExitCode);
        var outDir = dir.PathOf("out");

        var run = CliRun.Of("export", "--run", "1", "--format", format, "-o", outDir, "--db", db);

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("wrote", run.Out);
        var written = Directory.GetFiles(outDir).Select(TraceFile.Read).ToList();
        using var store = SqliteResultStore.Open(db);
        foreach (var stored in store.GetSweeps(1))
        {
            var expected = (ComplexTrace)stored.Record.Trace;
            var actual = (ComplexTrace)written.Select(s => s.Find(expected.Quantity)).Single(t => t is not null)!;
            Assert.True(expected.Axis.SamePointsAs(actual.Axis));
            AssertSamplesEqual(expected.Samples, actual.Samples);
        }

        Assert.Contains(written, s => s.Find(TraceQuantity.S21) is not null);
    }

    [Fact]
    public void Export_Touchstone_WritesS11AsOnePortAndNotesWhyS21IsCsv()
    {
        using var dir = new TempDirectory();
        var db = dir.PathOf("demo.db");
        CliRun.Of("demo", "--db", db);

        var run = CliRun.Of("export", "--run", "1", "--format", "touchstone", "-o", dir.PathOf("out"), "--db", db);

        var names = Directory.GetFiles(dir.PathOf("out")).Select(Path.GetFileName).Order().ToList();
        Assert.Equal(["run1-001-passband-sweep-passband.csv", "run1-002-passband-sweep-match.s1p"], names);
        Assert.Contains("note: S21 without all four two-port parameters", run.Out);
    }

    [Fact]
    public void Export_FourParameters_GoIntoOneTwoPortFileThatRoundTrips()
    {
        using var dir = new TempDirectory();
        var db = dir.PathOf("four.db");
        var example = TraceFile.Read(RepositoryFiles.Example("psf-24-0001.s2p"));
        using (var store = SqliteResultStore.Open(db))
        {
            var id = store.StartRun(new RunRecord(RunMode.Single, "psf-137-check", "name: psf-137-check\n", "0.1.0", "bench-1") { DutSerial = "PSF-24-0001" });
            foreach (var trace in example.Traces)
            {
                store.AddSweep(id, new SweepRecord("full two-port", trace) { TraceName = trace.Quantity.ToString().ToLowerInvariant() });
            }

            store.FinishRun(id, RunStatus.Passed);
        }

        var run = CliRun.Of("export", "--run", "1", "--format", "touchstone", "-o", dir.PathOf("out"), "--db", db);

        Assert.Equal(0, run.ExitCode);
        var file = Assert.Single(Directory.GetFiles(dir.PathOf("out")));
        Assert.EndsWith(".s2p", file);
        Assert.StartsWith("run1-001-full-two-port-", Path.GetFileName(file));
        var back = TraceFile.Read(file);
        foreach (var quantity in new[] { TraceQuantity.S11, TraceQuantity.S21, TraceQuantity.S12, TraceQuantity.S22 })
        {
            AssertSamplesEqual(((ComplexTrace)example.Find(quantity)!).Samples, ((ComplexTrace)back.Find(quantity)!).Samples);
        }
    }

    [Fact]
    public void Export_ExistingFile_IsBadInputAndNothingIsOverwritten()
    {
        using var dir = new TempDirectory();
        var db = dir.PathOf("demo.db");
        CliRun.Of("demo", "--db", db);
        var outDir = dir.PathOf("out");
        Assert.Equal(0, CliRun.Of("export", "--run", "1", "--format", "csv", "-o", outDir, "--db", db).ExitCode);
        var before = Directory.GetFiles(outDir).ToDictionary(f => f, File.ReadAllText);

        var again = CliRun.Of("export", "--run", "1", "--format", "csv", "-o", outDir, "--db", db);

        Assert.Equal(2, again.ExitCode);
        Assert.Contains("never overwrites", again.Error);
        Assert.All(before, kv => Assert.Equal(kv.Value, File.ReadAllText(kv.Key)));
    }

    [Fact]
    public void Export_MissingDatabaseOrRun_IsBadInput()
    {
        using var dir = new TempDirectory();
        var missing = CliRun.Of("export", "--run", "1", "--format", "csv", "-o", dir.PathOf("out"), "--db", dir.PathOf("none.db"));
        Assert.Equal(2, missing.ExitCode);
        Assert.Contains("no result database", missing.Error);

        var db = dir.PathOf("demo.db");
        CliRun.Of("demo", "--db", db);
        var noRun = CliRun.Of("export", "--run", "99", "--format", "csv", "-o", dir.PathOf("out"), "--db", db);
        Assert.Equal(2, noRun.ExitCode);
        Assert.Contains("no run 99", noRun.Error);
    }

    [Fact]
    public void Export_UnknownFormat_IsBadInput()
    {
        using var dir = new TempDirectory();
        var run = CliRun.Of("export", "--run", "1", "--format", "mat", "-o", dir.PathOf("out"));
        Assert.Equal(2, run.ExitCode);
    }

    private static void AssertSamplesEqual(IReadOnlyList<Complex> expected, IReadOnlyList<Complex> actual)
    {
        Assert.Equal(expected.Count, actual.Count);
        for (int i = 0; i < expected.Count; i++)
        {
            // Exports promise round-trip precision (TouchstoneWriter, CsvTraceFile docs): 1e-12 relative.
            double scale = Math.Max(expected[i].Magnitude, double.Epsilon);
            Assert.True(Complex.Abs(expected[i] - actual[i]) <= 1e-12 * scale, $"point {i}: {expected[i]} vs {actual[i]}");
        }
    }
}
