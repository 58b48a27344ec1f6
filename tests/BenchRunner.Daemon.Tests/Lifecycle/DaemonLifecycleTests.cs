using BenchRunner.Daemon.Status;
using BenchRunner.Daemon.Tests.Support;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;
using Microsoft.Data.Sqlite;
using BenchRunner.Core.Runs;

namespace BenchRunner.Daemon.Tests.Lifecycle;

/// <summary>The daemon as a real process: stopped by SIGTERM, and killed outright then started again.</summary>
[Trait("Category", "Slow")]
public sealed class DaemonLifecycleTests
{
    private const string SweepLogged = "sweep passband from vna stored";

    private static string LongPlan => TestPlans.Vna("overnight-drift", sweeps: 400, wait: "200 ms");

    [LinuxFact]
    public async Task Sigterm_InMidRun_FinishesTheSweepInFlight_MarksTheRunStopped_AndExitsCleanly()
    {
        using var home = new TempDirectory();
        Directory.CreateDirectory(home.PathOf("inbox"));
        File.WriteAllText(home.PathOf("inbox/overnight.yaml"), LongPlan);
        using var daemon = DaemonProcess.Start(home.Path, RepositoryFiles.Example("bench-virtual.yaml"));
        await daemon.WaitForLinesAsync(SweepLogged, count: 2);

        daemon.Terminate();
        var exitCode = await daemon.WaitForExitAsync();

        Assert.Equal(0, exitCode);
        Assert.Contains(daemon.Lines, l => l.Contains("stopped: the daemon is stopping", StringComparison.Ordinal));
        using var store = SqliteResultStore.Open(home.PathOf("results.db"));
        var run = Assert.Single(store.ListRuns());
        Assert.Equal(RunStatus.Stopped, run.Status);
        Assert.Equal("stopped: the daemon is stopping", run.ErrorMessage);
        // Every sweep logged as stored is in the file, and nothing was cut off half-way: the count matches the log.
        Assert.Equal(daemon.Count(SweepLogged), store.GetSweeps(run.Id).Count);
        Assert.Empty(store.InterruptedAtOpen);
        Assert.Equal("stopped", StatusFile.Read(home.PathOf("state/daemon-status.json"))!.State);
        Assert.True(File.Exists(home.PathOf("done/overnight.yaml.result.txt")));
    }

    [LinuxFact]
    public async Task KillMinus9_InMidRun_KeepsEveryCommittedSweep_AndTheNextStartMarksTheRunInterrupted()
    {
        using var home = new TempDirectory();
        Directory.CreateDirectory(home.PathOf("inbox"));
        File.WriteAllText(home.PathOf("inbox/overnight.yaml"), LongPlan);
        int logged;
        using (var daemon = DaemonProcess.Start(home.Path, RepositoryFiles.Example("bench-virtual.yaml")))
        {
            await daemon.WaitForLinesAsync(SweepLogged, count: 3);
            daemon.KillHard();
            await daemon.WaitForExitAsync();
            logged = daemon.Count(SweepLogged);
        }

        // The plan is still in the inbox (it would run again); it is taken out so the restart has nothing to run.
        Assert.True(File.Exists(home.PathOf("inbox/overnight.yaml")));
        File.Delete(home.PathOf("inbox/overnight.yaml"));
        using (var restarted = DaemonProcess.Start(home.Path, RepositoryFiles.Example("bench-virtual.yaml")))
        {
            await restarted.WaitForLinesAsync("marked interrupted");
            restarted.Terminate();
            Assert.Equal(0, await restarted.WaitForExitAsync());
        }

        using (var store = SqliteResultStore.Open(home.PathOf("results.db")))
        {
            var run = Assert.Single(store.ListRuns());
            Assert.Equal(RunStatus.Interrupted, run.Status);
            var sweeps = store.GetSweeps(run.Id);
            // A sweep may have been committed after the last line reached the log, never the other way round.
            Assert.True(sweeps.Count >= logged, $"{sweeps.Count} sweeps stored, {logged} logged");
            Assert.All(sweeps, s => Assert.Equal(201, s.Record.Trace.Count));
        }

        await using var connection = new SqliteConnection($"Data Source={home.PathOf("results.db")};Mode=ReadOnly;Pooling=False");
        await connection.OpenAsync();
        await using var check = connection.CreateCommand();
        check.CommandText = "PRAGMA integrity_check";
        Assert.Equal("ok", await check.ExecuteScalarAsync());
    }
}
