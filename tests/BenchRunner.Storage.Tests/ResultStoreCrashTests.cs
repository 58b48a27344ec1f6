using BenchRunner.Storage.Sqlite;
using BenchRunner.Core.Traces;
using BenchRunner.Storage.Tests.Support;
using BenchRunner.Core.Runs;

namespace BenchRunner.Storage.Tests;

/// <summary>
/// What survives a program that stops mid-run. SQLite docs, "Write-Ahead Logging": a commit is
/// a frame appended to the WAL file; on the next open the WAL is replayed up to the last valid
/// commit frame, and frames after it are ignored.
/// </summary>
public sealed class ResultStoreCrashTests : IDisposable
{
    private readonly TempDirectory _dir = new();
    private readonly ManualTimeProvider _clock = new();

    public void Dispose() => _dir.Dispose();

    [Fact]
    public void Open_AfterAStoreWasDroppedMidRun_MarksTheRunInterruptedAndKeepsEverySweep()
    {
        var path = _dir.PathOf("results.db");
        var (runId, traces) = StartRunWithSweeps(path, count: 5, out var store);
        store.Dispose();
        _clock.Advance(TimeSpan.FromMinutes(10));

        using var reopened = SqliteResultStore.Open(path, _clock);

        Assert.Equal([runId], reopened.InterruptedAtOpen);
        var run = reopened.GetRun(runId)!;
        Assert.Equal(RunStatus.Interrupted, run.Status);
        Assert.Equal(_clock.GetUtcNow(), run.EndedUtc);
        Assert.Equal(SqliteResultStore.InterruptedMessage, run.ErrorMessage);
        AssertSweeps(traces, reopened.GetSweeps(runId));
        Assert.Equal("ok", StoreFile.Scalar(path, "PRAGMA integrity_check"));
    }

    [Fact]
    public void Open_CopyOfTheFilesTakenMidRun_HasEveryCommittedSweepAndAnInterruptedRun()
    {
        var path = _dir.PathOf("results.db");
        var (runId, traces) = StartRunWithSweeps(path, count: 5, out var store);
        using (store)
        {
            // What a killed process leaves on disk: the database and its WAL, no shared-memory index.
            var crashed = CopyFiles(path, "crashed");
            Assert.True(new FileInfo(crashed + "-wal").Length > 0, "the committed sweeps are still in the WAL");
            store.AddSweep(runId, new SweepRecord("after the copy", Samples.Spectrum()));

            using var recovered = SqliteResultStore.Open(crashed, _clock);

            Assert.Equal([runId], recovered.InterruptedAtOpen);
            Assert.Equal(RunStatus.Interrupted, recovered.GetRun(runId)!.Status);
            AssertSweeps(traces, recovered.GetSweeps(runId));
            Assert.Equal("ok", StoreFile.Scalar(crashed, "PRAGMA integrity_check"));
        }
    }

    [Fact]
    public void Open_CopyWithATornWriteAtTheEndOfTheWal_IgnoresTheTornPart()
    {
        var path = _dir.PathOf("results.db");
        var (runId, traces) = StartRunWithSweeps(path, count: 3, out var store);
        using (store)
        {
            var crashed = CopyFiles(path, "torn");
            using (var wal = new FileStream(crashed + "-wal", FileMode.Append))
            {
                // Half a frame of garbage: a write cut off by the crash.
                var garbage = new byte[2100];
                new Random(137).NextBytes(garbage);
                wal.Write(garbage);
            }

            using var recovered = SqliteResultStore.Open(crashed, _clock);

            Assert.Equal([runId], recovered.InterruptedAtOpen);
            AssertSweeps(traces, recovered.GetSweeps(runId));
            Assert.Equal("ok", StoreFile.Scalar(crashed, "PRAGMA integrity_check"));
        }
    }

    [Fact]
    public void Open_WhileAnotherStoreHasTheFileOpen_LeavesItsRunningRunAlone()
    {
        var path = _dir.PathOf("results.db");
        using var daemon = SqliteResultStore.Open(path, _clock);
        var runId = daemon.StartRun(Samples.Run());

        using (var query = SqliteResultStore.Open(path, _clock))
        {
            Assert.Empty(query.InterruptedAtOpen);
            Assert.Equal(RunStatus.Running, query.GetRun(runId)!.Status);
        }

        daemon.AddSweep(runId, new SweepRecord("passband", Samples.PassbandS21()));
        daemon.FinishRun(runId, RunStatus.Passed);
        Assert.Equal(RunStatus.Passed, daemon.GetRun(runId)!.Status);
    }

    [Fact]
    public void Open_AfterTheOtherStoreClosed_MarksItsLeftoverRunInterrupted()
    {
        var path = _dir.PathOf("results.db");
        var first = SqliteResultStore.Open(path, _clock);
        var runId = first.StartRun(Samples.Run());
        using var second = SqliteResultStore.Open(path, _clock);
        first.Dispose();

        using var third = SqliteResultStore.Open(path, _clock);

        Assert.Empty(third.InterruptedAtOpen);
        Assert.Equal(RunStatus.Running, third.GetRun(runId)!.Status);
        second.Dispose();
        third.Dispose();
        using var last = SqliteResultStore.Open(path, _clock);
        Assert.Equal([runId], last.InterruptedAtOpen);
    }

    [Fact]
    public void Open_TwoStoresWritingInTurn_BothCommit()
    {
        var path = _dir.PathOf("results.db");
        using var a = SqliteResultStore.Open(path, _clock);
        using var b = SqliteResultStore.Open(path, _clock);
        var runA = a.StartRun(Samples.Run("PSF-24-0001"));
        var runB = b.StartRun(Samples.Run("PSF-24-0002"));
        for (int i = 0; i < 3; i++)
        {
            a.AddSweep(runA, new SweepRecord("passband", Samples.PassbandS21()));
            b.AddSweep(runB, new SweepRecord("passband", Samples.PassbandS21()));
        }

        Assert.Equal([1, 2, 3], b.GetSweeps(runA).Select(s => s.Sequence));
        Assert.Equal([1, 2, 3], a.GetSweeps(runB).Select(s => s.Sequence));
    }

    private (long RunId, List<Trace> Traces) StartRunWithSweeps(string path, int count, out SqliteResultStore store)
    {
        store = SqliteResultStore.Open(path, _clock);
        var runId = store.StartRun(Samples.Run());
        var traces = new List<Trace>();
        for (int i = 0; i < count; i++)
        {
            Trace trace = i % 2 == 0 ? Samples.PassbandS21() : Samples.Spectrum();
            store.AddSweep(runId, new SweepRecord($"step {i + 1}", trace));
            traces.Add(trace);
            _clock.Advance(TimeSpan.FromSeconds(1));
        }

        return (runId, traces);
    }

    private string CopyFiles(string path, string folder)
    {
        var target = _dir.PathOf(folder);
        Directory.CreateDirectory(target);
        var copy = Path.Combine(target, Path.GetFileName(path));
        File.Copy(path, copy);
        File.Copy(path + "-wal", copy + "-wal");
        return copy;
    }

    private static void AssertSweeps(List<Trace> expected, IReadOnlyList<StoredSweep> stored)
    {
        Assert.Equal(expected.Count, stored.Count);
        for (int i = 0; i < expected.Count; i++)
        {
            Assert.Equal(i + 1, stored[i].Sequence);
            Assert.Equal(expected[i].GetType(), stored[i].Record.Trace.GetType());
            Assert.Equal(expected[i].Axis.Hertz.Select(BitConverter.DoubleToInt64Bits), stored[i].Record.Trace.Axis.Hertz.Select(BitConverter.DoubleToInt64Bits));
            Assert.Equal(expected[i].LevelsDb.Select(BitConverter.DoubleToInt64Bits), stored[i].Record.Trace.LevelsDb.Select(BitConverter.DoubleToInt64Bits));
            if (expected[i] is ComplexTrace complex)
            {
                var samples = ((ComplexTrace)stored[i].Record.Trace).Samples;
                Assert.Equal(complex.Samples.Select(c => BitConverter.DoubleToInt64Bits(c.Real)), samples.Select(c => BitConverter.DoubleToInt64Bits(c.Real)));
                Assert.Equal(complex.Samples.Select(c => BitConverter.DoubleToInt64Bits(c.Imaginary)), samples.Select(c => BitConverter.DoubleToInt64Bits(c.Imaginary)));
            }
        }
    }
}
