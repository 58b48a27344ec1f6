using BenchRunner.Storage.Sqlite;
using System.Text.Json;
using BenchRunner.Core.Figures;
using BenchRunner.Storage.Tests.Support;
using BenchRunner.Core.Runs;

namespace BenchRunner.Storage.Tests;

public sealed class ResultStoreViewTests : IDisposable
{
    private readonly TempDirectory _dir = new();
    private readonly ManualTimeProvider _clock = new();
    private readonly SqliteResultStore _store;

    public ResultStoreViewTests() => _store = SqliteResultStore.Open(_dir.PathOf("results.db"), _clock);

    public void Dispose()
    {
        _store.Dispose();
        _dir.Dispose();
    }

    [Fact]
    public void LatestVerdictPerSerial_RetestedBoards_CountOnlyTheirLatestVerdictRun()
    {
        var runs = BuildLot();

        var verdicts = _store.LatestVerdictPerSerial("L24-03");

        // 0006 passed and was then stopped: still passed, both runs counted. 0007 was only ever
        // stopped: it has no verdict and no row.
        Assert.Equal(
            [
                ("PSF-24-0001", RunStatus.Passed, runs["0001 retest"], 2),
                ("PSF-24-0002", RunStatus.Passed, runs["0002"], 1),
                ("PSF-24-0003", RunStatus.Failed, runs["0003"], 1),
                ("PSF-24-0004", RunStatus.Failed, runs["0004 retest"], 2),
                ("PSF-24-0005", RunStatus.Failed, runs["0005 second"], 2),
                ("PSF-24-0006", RunStatus.Passed, runs["0006"], 2),
            ],
            verdicts.Select(v => (v.DutSerial, v.Verdict, v.RunId, v.Runs)));
        Assert.All(verdicts, v => Assert.Equal("L24-03", v.Lot));
        Assert.Equal(7, _store.LatestVerdictPerSerial().Count);
    }

    [Theory]
    [InlineData(RunStatus.Stopped)]
    [InlineData(RunStatus.Error)]
    [InlineData(RunStatus.Interrupted)]
    [InlineData(RunStatus.Running)]
    public void LatestVerdictPerSerial_PassedThenNoVerdict_StaysPassed(RunStatus later)
    {
        var passed = _store.StartRun(Samples.Run("PSF-24-0001", "L24-03", RunMode.Batch));
        _store.FinishRun(passed, RunStatus.Passed);
        _clock.Advance(TimeSpan.FromMinutes(3));
        var next = _store.StartRun(Samples.Run("PSF-24-0001", "L24-03", RunMode.Batch, retest: true));
        if (later != RunStatus.Running)
        {
            _store.FinishRun(next, later);
        }

        var verdict = Assert.Single(_store.LatestVerdictPerSerial());

        Assert.Equal((RunStatus.Passed, passed, 2), (verdict.Verdict, verdict.RunId, verdict.Runs));
    }

    [Fact]
    public void LatestVerdictPerSerial_OnlyStopped_HasNoRow()
    {
        var id = _store.StartRun(Samples.Run("PSF-24-0001", "L24-03", RunMode.Batch));
        _store.FinishRun(id, RunStatus.Stopped);

        Assert.Empty(_store.LatestVerdictPerSerial());
        Assert.Equal(new object?[] { "L24-03", 1L, 0L, 0L, 1L, null, 1L },
            StoreFile.Query(_store.Path, "SELECT lot, boards, passed, failed, other, yield_percent, runs FROM lot_summary").Single());
    }

    [Fact]
    public void LotSummary_PerLot_CountsBoardsByTheirLatestVerdict()
    {
        BuildLot();

        var rows = StoreFile.Query(_store.Path, "SELECT lot, boards, passed, failed, other, yield_percent, runs FROM lot_summary ORDER BY lot");

        Assert.Equal(2, rows.Count);
        // Boards 0001-0006 have verdicts (3 passed, 3 failed); 0007 has none and counts in other.
        // The yield is over the boards with a verdict; runs counts every single and batch run.
        Assert.Equal(new object?[] { "L24-03", 7L, 3L, 3L, 1L, 50.0, 11L }, rows[0]);
        Assert.Equal(new object?[] { "L24-04", 1L, 1L, 0L, 0L, 100.0, 1L }, rows[1]);
    }

    [Fact]
    public void RunFigures_View_FlattensEveryFigureOfARun()
    {
        var trace = Samples.PassbandS21();
        var figures = FigureSummary.ForFilter(trace);
        var runId = _store.StartRun(Samples.Run());
        _store.AddSweep(runId, new SweepRecord("passband", trace) { Figures = figures });
        _store.AddSweep(runId, new SweepRecord("again", trace) { Figures = figures });

        var rows = StoreFile.Query(_store.Path, "SELECT seq, step_name, dut_serial, key, value, unit, reason FROM run_figures WHERE run_id = $run ORDER BY seq, key", ("$run", runId));

        Assert.Equal(2 * figures.Count, rows.Count);
        var centre = rows.Single(r => (long)r[0]! == 2 && (string)r[3]! == "center_hz");
        var expected = figures.Single(f => f.Key == FigureKeys.CentreFrequency);
        Assert.Equal(new object?[] { 2L, "again", "PSF-24-0001", "center_hz", expected.Value!.Value.Value, "Hz", null }, centre);

        // The resonator is centred on 137.5 MHz (its -3 dB edges are geometrically symmetric about f0,
        // so their arithmetic mean sits a little above it). Pozar, Microwave Engineering, ch. 6.
        Assert.Equal(137.5e6, expected.Value!.Value.Value, 137.5e6 * 1e-3);
    }

    [Fact]
    public void RunSweeps_View_GathersEachSweepsFiguresAsJson()
    {
        var runId = _store.StartRun(Samples.Run());
        _store.AddSweep(runId, new SweepRecord("passband", Samples.PassbandS21())
        {
            Figures =
            [
                NamedFigure.Of(FigureKeys.CentreFrequency, 137.52e6),
                NamedFigure.Unavailable(FigureKeys.ShapeFactor60To3, "never 60 dB down"),
            ],
            Flags = SweepFlags.Overloaded,
        });
        _store.AddSweep(runId, new SweepRecord("spectrum", Samples.Spectrum()));

        var rows = StoreFile.Query(_store.Path, "SELECT seq, quantity, unit, point_count, flags, figures FROM run_sweeps WHERE run_id = $run ORDER BY seq", ("$run", runId));

        Assert.Equal(new object?[] { 1L, "S21", "dB", 401L, 1L }, rows[0][..5]);
        using var json = JsonDocument.Parse((string)rows[0][5]!);
        Assert.Equal(137.52e6, json.RootElement.GetProperty("center_hz").GetDouble());
        Assert.Equal(JsonValueKind.Null, json.RootElement.GetProperty("shape_factor_60_3").ValueKind);
        Assert.Equal(new object?[] { 2L, "power", "dBm", 201L, 0L, "{}" }, rows[1]);
    }

    /// <summary>
    /// Lot L24-03: 0001 fails then passes on retest; 0002 passes; 0003 fails, then has a tuning
    /// session (not a verdict); 0004 passes, then fails on retest; 0005 has two runs started in the
    /// same millisecond, the later id (failed) counting; 0006 passes, then is stopped on retest (no
    /// verdict); 0007 is only ever stopped. Lot L24-04: 0101 passes.
    /// </summary>
    private Dictionary<string, long> BuildLot()
    {
        var runs = new Dictionary<string, long>();
        void Run(string name, string serial, RunStatus status, string lot = "L24-03", RunMode mode = RunMode.Batch, bool advance = true)
        {
            var id = _store.StartRun(Samples.Run("PSF-24-" + serial, lot, mode, retest: name.EndsWith("retest", StringComparison.Ordinal)));
            _store.FinishRun(id, status);
            runs[name] = id;
            if (advance)
            {
                _clock.Advance(TimeSpan.FromMinutes(3));
            }
        }

        Run("0001", "0001", RunStatus.Failed);
        Run("0002", "0002", RunStatus.Passed);
        Run("0003", "0003", RunStatus.Failed);
        Run("0004", "0004", RunStatus.Passed);
        Run("0101", "0101", RunStatus.Passed, lot: "L24-04");
        Run("0001 retest", "0001", RunStatus.Passed);
        Run("0003 tuning", "0003", RunStatus.Stopped, mode: RunMode.Tuning);
        Run("0004 retest", "0004", RunStatus.Failed);
        Run("0005 first", "0005", RunStatus.Passed, advance: false);
        Run("0005 second", "0005", RunStatus.Failed);
        Run("0006", "0006", RunStatus.Passed);
        Run("0006 retest", "0006", RunStatus.Stopped);
        Run("0007", "0007", RunStatus.Stopped);
        return runs;
    }
}
