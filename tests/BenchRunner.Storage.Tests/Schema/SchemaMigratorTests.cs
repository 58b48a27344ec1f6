using BenchRunner.Storage.Sqlite;
using BenchRunner.Storage.Schema;
using BenchRunner.Storage.Tests.Support;
using BenchRunner.Core.Runs;

namespace BenchRunner.Storage.Tests.Schema;

public sealed class SchemaMigratorTests : IDisposable
{
    private readonly TempDirectory _dir = new();

    public void Dispose() => _dir.Dispose();

    [Fact]
    public void All_ShippedMigrations_AreNumberedFromOneWithoutGaps()
    {
        var versions = SchemaMigrations.All.Select(m => m.Version).ToList();

        Assert.Equal(Enumerable.Range(1, versions.Count), versions);
        Assert.Equal("initial", SchemaMigrations.All[0].Name);
    }

    [Fact]
    public void Open_OlderFile_AppliesTheLaterStepsAndKeepsTheData()
    {
        var path = _dir.PathOf("results.db");
        long runId;
        using (var v1 = SqliteResultStore.Open(path, TimeProvider.System, SchemaMigrations.All.Take(1).ToList()))
        {
            runId = v1.StartRun(Samples.Run());
            v1.FinishRun(runId, RunStatus.Passed);
        }

        var steps = SchemaMigrations.All.Take(1)
            .Append(new Migration(2, "fixture", "ALTER TABLE runs ADD COLUMN fixture TEXT;"))
            .Append(new Migration(3, "fixture-index", "CREATE INDEX runs_by_fixture ON runs (fixture);"))
            .ToList();
        using (var v3 = SqliteResultStore.Open(path, TimeProvider.System, steps))
        {
            Assert.Equal(RunStatus.Passed, v3.GetRun(runId)!.Status);
        }

        Assert.Equal(3L, StoreFile.Scalar(path, "PRAGMA user_version"));
        Assert.Equal(1L, StoreFile.Scalar(path, "SELECT count(*) FROM pragma_table_info('runs') WHERE name = 'fixture'"));
        Assert.Equal(1L, StoreFile.Scalar(path, "SELECT count(*) FROM sqlite_schema WHERE name = 'runs_by_fixture'"));
    }

    [Fact]
    public void Open_FailingStep_RollsThatStepBackAndKeepsTheEarlierOnes()
    {
        var path = _dir.PathOf("results.db");
        var steps = SchemaMigrations.All.Take(1)
            .Append(new Migration(2, "good", "CREATE TABLE fixtures (name TEXT);"))
            .Append(new Migration(3, "broken", "CREATE TABLE half_done (x); CREATE TABLE runs (x);"))
            .ToList();

        var error = Assert.Throws<ResultStoreException>(() => SqliteResultStore.Open(path, TimeProvider.System, steps));

        Assert.Contains("migration 3 (broken) failed", error.Message);
        Assert.Equal(2L, StoreFile.Scalar(path, "PRAGMA user_version"));
        Assert.Equal(1L, StoreFile.Scalar(path, "SELECT count(*) FROM sqlite_schema WHERE name = 'fixtures'"));
        Assert.Equal(0L, StoreFile.Scalar(path, "SELECT count(*) FROM sqlite_schema WHERE name = 'half_done'"));

        // The file is still usable by a build that knows version 2.
        using var store = SqliteResultStore.Open(path, TimeProvider.System, steps.Take(2).ToList());
        Assert.Empty(store.ListRuns());
    }
}
