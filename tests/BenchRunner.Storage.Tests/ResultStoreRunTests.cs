using BenchRunner.Storage.Sqlite;
using BenchRunner.Core.Quantities;
using BenchRunner.Storage.Tests.Support;
using Microsoft.Data.Sqlite;
using BenchRunner.Core.Runs;

namespace BenchRunner.Storage.Tests;

public sealed class ResultStoreRunTests : IDisposable
{
    private readonly TempDirectory _dir = new();
    private readonly ManualTimeProvider _clock = new();
    private readonly SqliteResultStore _store;

    public ResultStoreRunTests() => _store = SqliteResultStore.Open(_dir.PathOf("results.db"), _clock);

    public void Dispose()
    {
        _store.Dispose();
        _dir.Dispose();
    }

    [Fact]
    public void StartRun_Record_IsStoredWithThePlanHashAndStatusRunning()
    {
        var record = Samples.Run() with { Notes = "trimmer C3 replaced", ExtraJson = """{"fixture": "F2"}""", IsRetest = true };

        var run = _store.GetRun(_store.StartRun(record))!;

        Assert.Equal(record, run.Record);
        Assert.Equal(RunStatus.Running, run.Status);
        Assert.Equal(PlanHash.Sha256Hex(Samples.PlanText), run.PlanSha256);
        Assert.Equal(_clock.GetUtcNow(), run.StartedUtc);
        Assert.Null(run.EndedUtc);
    }

    [Fact]
    public void FinishRun_Status_IsStoredWithTheEndTimeAndMessage()
    {
        var runId = _store.StartRun(Samples.Run());
        _clock.Advance(TimeSpan.FromSeconds(42));

        _store.FinishRun(runId, RunStatus.Error, "network analyser did not answer \"sweep?\"");

        var run = _store.GetRun(runId)!;
        Assert.Equal(RunStatus.Error, run.Status);
        Assert.Equal(run.StartedUtc + TimeSpan.FromSeconds(42), run.EndedUtc);
        Assert.Equal("network analyser did not answer \"sweep?\"", run.ErrorMessage);
    }

    [Fact]
    public void FinishRun_TwiceOrAsRunningOrUnknown_IsRefused()
    {
        var runId = _store.StartRun(Samples.Run());

        Assert.Throws<ArgumentException>(() => _store.FinishRun(runId, RunStatus.Running));
        Assert.Throws<ArgumentException>(() => _store.FinishRun(runId + 1, RunStatus.Passed));
        _store.FinishRun(runId, RunStatus.Stopped);
        Assert.Throws<InvalidOperationException>(() => _store.FinishRun(runId, RunStatus.Passed));
        Assert.Equal(RunStatus.Stopped, _store.GetRun(runId)!.Status);
    }

    [Fact]
    public void StartRun_BlankOrInvalidFields_AreRefused()
    {
        Assert.Throws<ArgumentException>(() => _store.StartRun(Samples.Run() with { PlanName = "" }));
        Assert.Throws<ArgumentException>(() => _store.StartRun(Samples.Run() with { Host = " " }));
        Assert.Throws<ArgumentException>(() => _store.StartRun(Samples.Run(serial: "")));
        Assert.Throws<ArgumentException>(() => _store.StartRun(Samples.Run() with { ExtraJson = "{not json" }));
        Assert.Empty(_store.ListRuns());
    }

    [Fact]
    public void Timestamps_InTheFile_AreUtcEndingInZ()
    {
        var store = SqliteResultStore.Open(_dir.PathOf("offset.db"), new ManualTimeProvider(new DateTimeOffset(2025, 6, 1, 23, 59, 59, 999, TimeSpan.FromHours(-5))));
        using (store)
        {
            var runId = store.StartRun(Samples.Run());
            store.AddSweep(runId, new SweepRecord("passband", Samples.PassbandS21()));
            store.FinishRun(runId, RunStatus.Passed);
        }

        var row = StoreFile.Query(store.Path, "SELECT r.started_utc, r.ended_utc, s.acquired_utc FROM runs r JOIN sweeps s ON s.run_id = r.id").Single();

        // 23:59:59.999 at UTC-5 is 04:59:59.999 the next day in UTC. ISO 8601 / RFC 3339 §5.6.
        Assert.All(row, t => Assert.Equal("2025-06-02T04:59:59.999Z", t));
    }

    [Fact]
    public void StatusCheck_NonsenseWrittenByAnotherTool_IsRefusedByTheFile()
    {
        var runId = _store.StartRun(Samples.Run());

        var status = Assert.Throws<SqliteException>(() => StoreFile.Execute(_store.Path, $"UPDATE runs SET status = 'finished', ended_utc = '2025-03-14T10:00:00.000Z' WHERE id = {runId}"));
        var noEnd = Assert.Throws<SqliteException>(() => StoreFile.Execute(_store.Path, $"UPDATE runs SET status = 'passed' WHERE id = {runId}"));
        var localTime = Assert.Throws<SqliteException>(() => StoreFile.Execute(_store.Path, $"UPDATE runs SET started_utc = '2025-03-14 10:00:00+01:00' WHERE id = {runId}"));
        var mode = Assert.Throws<SqliteException>(() => StoreFile.Execute(_store.Path, $"UPDATE runs SET mode = 'nightly' WHERE id = {runId}"));

        // SQLite result code 19 is SQLITE_CONSTRAINT (SQLite docs, "Result and Error Codes").
        Assert.All(new[] { status, noEnd, localTime, mode }, e => Assert.Equal(19, e.SqliteErrorCode));
        Assert.Equal(RunStatus.Running, _store.GetRun(runId)!.Status);
    }

    [Fact]
    public void AddInstrument_PerRole_IsStoredAndARoleOnlyOnce()
    {
        var runId = _store.StartRun(Samples.Run());
        var vna = new InstrumentRecord("vna", "network_analyser", "Virtual Bench", "VNA-1", "SIM-0001", "1.0") { Connection = "tcp 127.0.0.1:5025", CompensationJson = """{"cable_loss_db": 0.4}""" };
        var sa = new InstrumentRecord("sa", "spectrum_analyser", "Virtual Bench", "SA-1", "0", "0");
        _store.AddInstrument(runId, vna);
        _store.AddInstrument(runId, sa);

        Assert.Throws<ArgumentException>(() => _store.AddInstrument(runId, vna with { Serial = "SIM-0002" }));
        Assert.Equal([vna, sa], _store.GetInstruments(runId));
    }

    [Fact]
    public void AddCheck_MaskAndFigureLimit_AreStoredAndTiedToTheirSweep()
    {
        var runId = _store.StartRun(Samples.Run());
        var sweepId = _store.AddSweep(runId, new SweepRecord("passband", Samples.PassbandS21()));
        var mask = new CheckRecord("passband mask", CheckKind.Mask, false)
        {
            SweepId = sweepId, Measured = -3.4, MeasuredUnit = "dB", LimitText = ">= -3 dB from 136.5 MHz to 138.5 MHz",
            Margin = -0.4, MarginUnit = "dB", WorstFrequency = Frequency.FromMegahertz(136.5), Message = "0.4 dB below the mask at 136.5 MHz",
        };
        var centre = new CheckRecord("centre", CheckKind.FigureLimit, true) { Measured = 137.49e6, MeasuredUnit = "Hz", LimitText = "137.2 MHz to 137.8 MHz", Margin = 0.29e6, MarginUnit = "Hz" };
        _store.AddCheck(runId, mask);
        _store.AddCheck(runId, centre);

        var checks = _store.GetChecks(runId);

        Assert.Equal([mask, centre], checks.Select(c => c.Record));
        Assert.All(checks, c => Assert.Equal(runId, c.RunId));
        Assert.Equal(new object?[] { "mask", 0L, sweepId }, StoreFile.Query(_store.Path, "SELECT kind, passed, sweep_id FROM checks ORDER BY id")[0]);
    }

    [Fact]
    public void AddCheck_SweepOfAnotherRun_IsRefused()
    {
        var other = _store.StartRun(Samples.Run("PSF-24-0002"));
        var foreignSweep = _store.AddSweep(other, new SweepRecord("passband", Samples.PassbandS21()));
        var runId = _store.StartRun(Samples.Run());

        var error = Assert.Throws<ArgumentException>(() => _store.AddCheck(runId, new CheckRecord("mask", CheckKind.Mask, true) { SweepId = foreignSweep }));

        Assert.Contains($"not part of run {runId}", error.Message);
        Assert.Empty(_store.GetChecks(runId));
    }

    [Fact]
    public void ListRuns_Filters_SelectAndOrderNewestFirst()
    {
        var a = _store.StartRun(Samples.Run("PSF-24-0001"));
        _store.FinishRun(a, RunStatus.Failed);
        _clock.Advance(TimeSpan.FromMinutes(5));
        var b = _store.StartRun(Samples.Run("PSF-24-0002"));
        _store.FinishRun(b, RunStatus.Passed);
        _clock.Advance(TimeSpan.FromMinutes(5));
        var c = _store.StartRun(Samples.Run("PSF-24-0001", retest: true));
        _store.FinishRun(c, RunStatus.Passed);
        _clock.Advance(TimeSpan.FromMinutes(5));
        var d = _store.StartRun(Samples.Run("PSF-24-0101", lot: "L24-04", mode: RunMode.Single));

        Assert.Equal([d, c, b, a], _store.ListRuns().Select(r => r.Id));
        Assert.Equal([c, a], _store.ListRuns(new RunFilter { DutSerial = "PSF-24-0001" }).Select(r => r.Id));
        Assert.Equal([d], _store.ListRuns(new RunFilter { Lot = "L24-04" }).Select(r => r.Id));
        Assert.Equal([c, b], _store.ListRuns(new RunFilter { Status = RunStatus.Passed }).Select(r => r.Id));
        Assert.Equal([d], _store.ListRuns(new RunFilter { Mode = RunMode.Single }).Select(r => r.Id));
        Assert.Equal([d, c], _store.ListRuns(new RunFilter { Since = _store.GetRun(c)!.StartedUtc }).Select(r => r.Id));
        Assert.Equal([d, c], _store.ListRuns(new RunFilter { Limit = 2 }).Select(r => r.Id));
        Assert.Equal([c], _store.ListRuns(new RunFilter { Lot = "L24-03", Status = RunStatus.Passed, Since = _store.GetRun(b)!.StartedUtc.AddMilliseconds(1), Limit = 5 }).Select(r => r.Id));
        Assert.Throws<ArgumentOutOfRangeException>(() => _store.ListRuns(new RunFilter { Limit = 0 }));
        Assert.Null(_store.GetRun(d + 1));
    }

    [Fact]
    public void ListRuns_FilterText_IsBoundNotSpliced()
    {
        var runId = _store.StartRun(Samples.Run("PSF-24-0001' OR '1'='1"));
        _store.StartRun(Samples.Run("PSF-24-0002"));

        Assert.Equal([runId], _store.ListRuns(new RunFilter { DutSerial = "PSF-24-0001' OR '1'='1" }).Select(r => r.Id));
        Assert.Empty(_store.ListRuns(new RunFilter { Lot = "x' OR 1=1 --" }));
    }
}
