using BenchRunner.Storage.Sqlite;
using BenchRunner.Core.Quantities;
using BenchRunner.Storage.Schema;
using BenchRunner.Storage.Tests.Support;
using BenchRunner.Core.Runs;

namespace BenchRunner.Storage.Tests.Schema;

/// <summary>Schema version 2: sweep compensation, overload checks, check flags and detail.</summary>
public sealed class ValiditySchemaTests : IDisposable
{
    private readonly TempDirectory _dir = new();

    public void Dispose() => _dir.Dispose();

    [Fact]
    public void Open_VersionOneFileWithChecks_MigratesToVersionTwoKeepingEveryCheck()
    {
        var path = _dir.PathOf("results.db");
        long runId;
        using (var v1 = SqliteResultStore.Open(path, TimeProvider.System, SchemaMigrations.All.Take(1).ToList()))
        {
            runId = v1.StartRun(Samples.Run());
        }

        // This build writes version 2 columns, so the version 1 rows are written as SQL.
        StoreFile.Execute(path, $"""
            INSERT INTO sweeps (id, run_id, seq, step_name, quantity, unit, point_count, axis_kind, start_hz, stop_hz, samples, acquired_utc)
            VALUES (5, {runId}, 1, 'output sweep', 'power', 'dBm', 2, 'linear', 1e8, 2e8, zeroblob(16), '2025-03-14T09:30:00.000Z');
            INSERT INTO checks (run_id, sweep_id, name, kind, passed, margin, margin_unit, worst_hz, message)
            VALUES ({runId}, 5, 'output mask', 'mask', 0, -0.4, 'dB', 136.5e6, '0.4 dB below');
            UPDATE runs SET status = 'failed', ended_utc = '2025-03-14T09:31:00.000Z';
            """);
        var mask = new CheckRecord("output mask", CheckKind.Mask, false)
        {
            SweepId = 5, Margin = -0.4, MarginUnit = "dB", WorstFrequency = Frequency.FromMegahertz(136.5), Message = "0.4 dB below",
        };

        using (var v2 = SqliteResultStore.Open(path, TimeProvider.System, SchemaMigrations.All.Take(2).ToList()))
        {
            var check = Assert.Single(v2.GetChecks(runId));
            Assert.Equal(mask, check.Record);
            Assert.Equal(CheckFlags.None, check.Record.Flags);
            Assert.Null(Assert.Single(v2.GetSweeps(runId)).Record.Compensation);
        }

        Assert.Equal(2L, StoreFile.Scalar(path, "PRAGMA user_version"));
        Assert.Equal("ok", StoreFile.Scalar(path, "PRAGMA integrity_check"));
        Assert.Empty(StoreFile.Query(path, "PRAGMA foreign_key_check"));
        Assert.Equal(2L, StoreFile.Scalar(path, "SELECT count(*) FROM sqlite_schema WHERE name IN ('checks_by_run', 'checks_by_sweep')"));
    }

    [Fact]
    public void AddSweepAndCheck_CompensationOverloadFlagsAndDetail_RoundTrip()
    {
        var path = _dir.PathOf("results.db");
        using var store = SqliteResultStore.Open(path);
        var runId = store.StartRun(Samples.Run());
        var sweep = new SweepRecord("output sweep", Samples.Spectrum())
        {
            Figures = [BenchRunner.Core.Figures.NamedFigure.Of(BenchRunner.Core.Figures.FigureKeys.PeakPower, -20)],
            Compensation = "compensated: probe 4.7 kOhm into 50 Ohm (39.554 dB)",
            Flags = SweepFlags.Overloaded,
        };
        var sweepId = store.AddSweep(runId, sweep);
        var overload = new CheckRecord("overload of output", CheckKind.Overload, false)
        {
            SweepId = sweepId,
            Message = "275 MHz analyser-made",
            DetailJson = """{"lines":[{"frequency_hz":275000000,"class":"analyser_second_order","change_db":-10.0}]}""",
        };
        var flagged = new CheckRecord("peak_dbm of output", CheckKind.FigureLimit, true) { SweepId = sweepId, Flags = CheckFlags.TraceOverloaded };
        store.AddCheck(runId, overload);
        store.AddCheck(runId, flagged);

        Assert.Equal([overload, flagged], store.GetChecks(runId).Select(c => c.Record));
        Assert.Equal(sweep.Compensation, Assert.Single(store.GetSweeps(runId)).Record.Compensation);
        Assert.Equal(new object?[] { "overload", 0L, 1L }, StoreFile.Query(path, "SELECT kind, on_overloaded_trace, sweep_overloaded FROM run_checks ORDER BY check_id")[0]);
        Assert.Equal(new object?[] { "figure_limit", 1L, 1L }, StoreFile.Query(path, "SELECT kind, on_overloaded_trace, sweep_overloaded FROM run_checks ORDER BY check_id")[1]);
        Assert.Equal(sweep.Compensation, StoreFile.Scalar(path, "SELECT compensation FROM run_sweeps"));
        Assert.Equal(new object?[] { sweep.Compensation, 1L }, StoreFile.Query(path, "SELECT compensation, sweep_overloaded FROM run_figures WHERE key = 'peak_dbm'").Single());
    }

    [Fact]
    public void AddCheck_UndefinedFlagsOrBadDetail_AreRefused()
    {
        using var store = SqliteResultStore.Open(_dir.PathOf("results.db"));
        var runId = store.StartRun(Samples.Run());

        Assert.Throws<ArgumentException>(() => store.AddCheck(runId, new CheckRecord("x", CheckKind.Overload, true) { Flags = (CheckFlags)8 }));
        Assert.Throws<ArgumentException>(() => store.AddCheck(runId, new CheckRecord("x", CheckKind.Overload, true) { DetailJson = "{not json" }));
        Assert.Empty(store.GetChecks(runId));
    }
}
