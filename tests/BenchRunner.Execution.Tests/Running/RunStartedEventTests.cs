using BenchRunner.Execution.Running;
using BenchRunner.Execution.Tests.Support;
using BenchRunner.Simulator.Bench;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;
using BenchRunner.Core.Runs;

namespace BenchRunner.Execution.Tests.Running;

public sealed class RunStartedEventTests
{
    [Fact]
    public async Task Run_FirstEvent_IsRunStartedWithWhatTheRecorderStores()
    {
        using var dir = new TempDirectory();
        using var store = SqliteResultStore.Open(dir.PathOf("runs.db"));
        var runner = VirtualRuns.Runner(VirtualBench.CreateDemo(seed: 3), store);
        var plan = VirtualRuns.CheckPlan();
        var observer = new CollectingObserver();

        var outcome = await runner.RunAsync(plan, VirtualRuns.Context(), observer, CancellationToken.None)
            .WaitAsync(VirtualRuns.Limit);

        var started = Assert.IsType<RunStarted>(observer.Events[0]);
        Assert.Equal("psf-137-check", started.PlanName);
        Assert.Single(observer.Events.OfType<RunStarted>());
        Assert.IsType<RunEnded>(observer.Events[^1]);
        var stored = store.GetRun(outcome.RunId!.Value)!;
        Assert.Equal(started.Run.PlanText, stored.Record.PlanText);
        Assert.Equal(started.Run.LimitsJson, stored.Record.ExtraJson);
        Assert.Equal(RunStatus.Passed, stored.Status);
    }
}
