using BenchRunner.Storage.Sqlite;
using BenchRunner.Storage.Schema;
using BenchRunner.Storage.Tests.Support;
using BenchRunner.Core.Runs;

namespace BenchRunner.Storage.Tests.Schema;

/// <summary>Schema version 3: a board's verdict is its latest run that ended passed or failed.</summary>
public sealed class VerdictSchemaTests : IDisposable
{
    private readonly TempDirectory _dir = new();

    public void Dispose() => _dir.Dispose();

    [Fact]
    public void Open_VersionTwoFile_MigratesToVersionThreeKeepingItsRowsAndRecountingVerdicts()
    {
        var path = _dir.PathOf("results.db");
        var clock = new ManualTimeProvider();
        long passed, stopped, untested;
        using (var v2 = SqliteResultStore.Open(path, clock, SchemaMigrations.All.Take(2).ToList()))
        {
            passed = v2.StartRun(Samples.Run("PSF-24-0001"));
            v2.AddSweep(passed, new SweepRecord("passband", Samples.PassbandS21()));
            v2.AddCheck(passed, new CheckRecord("passband mask", CheckKind.Mask, true) { Margin = 1.2, MarginUnit = "dB" });
            v2.FinishRun(passed, RunStatus.Passed);
            clock.Advance(TimeSpan.FromMinutes(3));
            stopped = v2.StartRun(Samples.Run("PSF-24-0001", retest: true));
            v2.FinishRun(stopped, RunStatus.Stopped, "stopped by the operator");
            clock.Advance(TimeSpan.FromMinutes(3));
            untested = v2.StartRun(Samples.Run("PSF-24-0002"));
            v2.FinishRun(untested, RunStatus.Error, "analyser did not answer");
        }

        // Version 2 took the latest run whatever its status.
        Assert.Equal(new object?[] { "PSF-24-0001", stopped, "stopped", 2L },
            StoreFile.Query(path, "SELECT dut_serial, run_id, verdict, runs FROM latest_verdicts ORDER BY dut_serial")[0]);

        using (var v3 = SqliteResultStore.Open(path))
        {
            Assert.Equal([RunStatus.Passed, RunStatus.Stopped, RunStatus.Error], v3.ListRuns().OrderBy(r => r.Id).Select(r => r.Status));
            Assert.Equal("stopped by the operator", v3.GetRun(stopped)!.ErrorMessage);
            Assert.Single(v3.GetSweeps(passed));
            Assert.True(Assert.Single(v3.GetChecks(passed)).Record.Passed);
            var verdict = Assert.Single(v3.LatestVerdictPerSerial());
            Assert.Equal(("PSF-24-0001", passed, RunStatus.Passed, 2), (verdict.DutSerial, verdict.RunId, verdict.Verdict, verdict.Runs));
        }

        Assert.Equal(3L, StoreFile.Scalar(path, "PRAGMA user_version"));
        Assert.Equal("ok", StoreFile.Scalar(path, "PRAGMA integrity_check"));
        Assert.Equal(new object?[] { "L24-03", 2L, 1L, 0L, 1L, 100.0, 3L },
            StoreFile.Query(path, "SELECT lot, boards, passed, failed, other, yield_percent, runs FROM lot_summary").Single());
    }
}
