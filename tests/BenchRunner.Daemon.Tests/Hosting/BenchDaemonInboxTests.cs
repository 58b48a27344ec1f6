using BenchRunner.Daemon.Inbox;
using BenchRunner.Daemon.Status;
using BenchRunner.Daemon.Tests.Support;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;
using BenchRunner.Core.Runs;

namespace BenchRunner.Daemon.Tests.Hosting;

public sealed class BenchDaemonInboxTests
{
    [Fact]
    public async Task DroppedPlan_IsRunAgainstTheVirtualBench_AndFiledAsDoneWithASummary()
    {
        await using var rig = new DaemonRig();
        rig.Start();
        var dropped = rig.Drop("psf-check.yaml", TestPlans.Vna("psf-check", sweeps: 2));

        var finished = await rig.WaitForFinishedAsync("psf-check");

        Assert.Equal("passed", finished.Status);
        Assert.False(File.Exists(dropped));
        var filed = Path.Combine(rig.Settings.DoneFolder, "psf-check.yaml");
        Assert.Equal(filed, finished.FiledAs);
        Assert.True(File.Exists(filed));
        var summary = await File.ReadAllTextAsync(filed + PlanFiler.ResultSuffix);
        Assert.Contains("status: passed", summary, StringComparison.Ordinal);
        Assert.Contains($"run: {finished.RunId}", summary, StringComparison.Ordinal);
        Assert.Contains("checks: 1 of 1 passed", summary, StringComparison.Ordinal);

        await rig.StopAsync();
        using var store = SqliteResultStore.Open(rig.Settings.DatabasePath);
        var run = store.GetRun(finished.RunId!.Value)!;
        Assert.Equal(RunStatus.Passed, run.Status);
        Assert.Equal(2, store.GetSweeps(run.Id).Count);
        Assert.Equal("vna", Assert.Single(store.GetInstruments(run.Id)).Role);

        // Every sweep and verdict is logged with its run id and instrument.
        var sweeps = rig.Log.Named("SweepStored");
        Assert.Equal(2, sweeps.Count);
        Assert.All(sweeps, e => Assert.Equal(finished.RunId, (long?)e.Values["RunId"]));
        Assert.All(sweeps, e => Assert.Equal("vna", e.Values["Instrument"]));
        var verdict = Assert.Single(rig.Log.Named("CheckVerdict"));
        Assert.Equal(finished.RunId, (long?)verdict.Values["RunId"]);
        Assert.Equal("vna", verdict.Values["Instruments"]);
        // The start is logged first, with the id the recorder gave the run, though recording runs on its own loop.
        var events = rig.Log.Events.ToList();
        var started = Assert.Single(events, e => e.Id.Name == "RunStarted");
        Assert.Equal(finished.RunId, (long?)started.Values["RunId"]);
        Assert.True(events.IndexOf(started) < events.FindIndex(e => e.Id.Name == "SweepStored"));
    }

    [Fact]
    public async Task InvalidPlan_IsMovedToRejected_WithAnErrorFileNamingLineAndColumn()
    {
        await using var rig = new DaemonRig();
        rig.Start();
        rig.Drop("typo.yaml", "plan: typo\nroles:\n  vna: network-analyser\nsteps:\n  - sweep:\n      role: vnx\n      traces:\n        S21: passband\n");

        var finished = await rig.WaitForFinishedAsync("typo.yaml");

        Assert.Equal("rejected", finished.Status);
        var rejected = Path.Combine(rig.Settings.RejectedFolder, "typo.yaml");
        Assert.True(File.Exists(rejected));
        var errors = await File.ReadAllLinesAsync(rejected + PlanFiler.ErrorsSuffix);
        // The role is misspelt on line 6, column 13, of the file as it now lies in the rejected folder.
        Assert.Contains(errors, l => l.StartsWith(rejected + ":6:13: ", StringComparison.Ordinal) && l.Contains("vnx", StringComparison.Ordinal));
        Assert.Empty(Directory.GetFiles(rig.Settings.InboxFolder));
    }

    [Fact]
    public async Task PlanStillBeingWritten_IsNotTakenUntilItStopsChanging()
    {
        await using var rig = new DaemonRig(adjust: s => s with { Settle = TimeSpan.FromSeconds(1) });
        rig.Start();
        var path = Path.Combine(rig.Settings.InboxFolder, "slow.yaml");
        var text = TestPlans.Vna("slow-copy");
        var half = text.Length / 2;

        // The first half is written and held open exclusively, as a copy in progress would.
        await using (var writer = new FileStream(path, FileMode.CreateNew, FileAccess.Write, FileShare.None))
        {
            await writer.WriteAsync(System.Text.Encoding.UTF8.GetBytes(text[..half]));
            await writer.FlushAsync();
            // Several scans and more than the settle time pass while the file is held.
            await Task.Delay(TimeSpan.FromSeconds(2));
            Assert.Empty(rig.Finished);
            Assert.True(File.Exists(path));
            await writer.WriteAsync(System.Text.Encoding.UTF8.GetBytes(text[half..]));
        }

        var finished = await rig.WaitForFinishedAsync("slow-copy");
        Assert.Equal("passed", finished.Status);
        Assert.DoesNotContain(rig.Finished, f => f.Status == "rejected");
    }

    [Fact]
    public async Task StatusFile_ShowsTheRunningPlanAndInstrumentHealth_AndEndsStopped()
    {
        await using var rig = new DaemonRig();
        rig.Start();
        rig.Drop("long.yaml", TestPlans.Vna("long-run", sweeps: 200, wait: "200 ms"));

        await rig.WaitUntilAsync(() => StatusFile.Read(rig.Settings.StatusFile) is { Running: [{ RunId: not null }] }, "the status file to show the run");
        var status = StatusFile.Read(rig.Settings.StatusFile)!;
        Assert.Equal("running", status.State);
        var job = Assert.Single(status.Running);
        Assert.Equal("long-run", job.Plan);
        Assert.Equal(["vna"], job.Instruments);
        Assert.Equal(["vna", "sa", "gen"], status.Instruments.Select(i => i.Name));

        await rig.StopAsync();
        var final = StatusFile.Read(rig.Settings.StatusFile)!;
        Assert.Equal("stopped", final.State);
        Assert.Empty(final.Running);
        var recent = Assert.Single(final.Recent);
        Assert.Equal("stopped", recent.Status);
        using var store = SqliteResultStore.Open(rig.Settings.DatabasePath);
        Assert.Equal("stopped: the daemon is stopping", store.GetRun(recent.RunId!.Value)!.ErrorMessage);
    }

    [Fact]
    public async Task PlanThatWouldOverdriveAnAnalyser_IsRejectedOnArrival_BeforeAnythingIsSent()
    {
        await using var rig = new DaemonRig();
        rig.Start();
        // +10 dBm through the bench's -1 dB cable reaches the analyser at +9 dBm, above its declared 0 dBm maximum.
        rig.Drop("hot.yaml", """
            plan: hot-carrier
            roles:
              gen: signal-generator
              sa: spectrum-analyser
            steps:
              - set-generator:
                  role: gen
                  frequency: 137.5 MHz
                  level: +10 dBm
                  output: on
            """);

        var finished = await rig.WaitForFinishedAsync("hot.yaml");

        Assert.Equal("rejected", finished.Status);
        var errors = await File.ReadAllTextAsync(finished.FiledAs + PlanFiler.ErrorsSuffix);
        Assert.Contains("never exceed", errors, StringComparison.OrdinalIgnoreCase);
        Assert.Empty(rig.Log.Named("RunStarted"));
    }
}
