using BenchRunner.Core.Diagnostics;
using BenchRunner.Daemon.Settings;
using BenchRunner.Daemon.Tests.Support;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;
using BenchRunner.Core.Runs;

namespace BenchRunner.Daemon.Tests.Hosting;

public sealed class BenchDaemonScheduleTests
{
    [Fact]
    public async Task Schedule_RunLongerThanItsRhythm_IsHeldToItsTimeLimit_AndOverlappingRunsAreSkipped()
    {
        using var plans = new TempDirectory();
        var plan = plans.Write("drift.yaml", TestPlans.Vna("reference-drift", sweeps: 500, wait: "100 ms"));
        var schedule = new ScheduleSettings("drift", plan, TimeSpan.FromSeconds(1), TimeSpan.FromSeconds(3), SourceLocation.OfFile("test"));
        await using var rig = new DaemonRig(adjust: s => s with { Schedules = [schedule] });
        rig.Start();

        var first = await rig.WaitForFinishedAsync("reference-drift");

        Assert.Equal("schedule drift", first.Origin);
        Assert.Equal("stopped", first.Status);
        Assert.Contains("time limit of 3 s", first.Summary, StringComparison.Ordinal);
        // Due every second while the first run took three: those due runs were skipped, not queued.
        Assert.NotEmpty(rig.Log.Named("ScheduleSkipped"));
        Assert.DoesNotContain(rig.Daemon.Snapshot().Queue, j => j.Origin == "schedule drift");
        Assert.True(rig.Daemon.Snapshot().Schedules.Single().Skipped >= 1);
        Assert.NotEmpty(rig.Log.Named("TimeLimit"));

        await rig.StopAsync();
        using var store = SqliteResultStore.Open(rig.Settings.DatabasePath);
        var run = store.GetRun(first.RunId!.Value)!;
        Assert.Equal(RunStatus.Stopped, run.Status);
        // The run records that its time limit stopped it, not an operator.
        Assert.Equal("stopped: the time limit of 3 s was reached", run.ErrorMessage);
        Assert.NotEmpty(store.GetSweeps(run.Id));
    }
}
