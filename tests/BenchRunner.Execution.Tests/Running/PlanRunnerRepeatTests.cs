using BenchRunner.Execution.Running;
using BenchRunner.Execution.Tests.Support;
using BenchRunner.Simulator.Bench;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;
using BenchRunner.Core.Runs;

namespace BenchRunner.Execution.Tests.Running;

public sealed class PlanRunnerRepeatTests
{
    [Fact]
    public async Task RunRepeatedly_StepsBeforeTheFirstSweepRunOnceTheRestEveryPass_AllInOneRun()
    {
        using var dir = new TempDirectory();
        using var store = SqliteResultStore.Open(dir.PathOf("runs.db"));
        var runner = VirtualRuns.Runner(VirtualBench.CreateDemo(seed: 2), store);
        var plan = VirtualRuns.CheckPlan();
        var observer = new CollectingObserver();
        var passes = new List<int>();

        var outcome = await runner.RunRepeatedlyAsync(plan, VirtualRuns.Context() with { Mode = RunMode.Tuning }, observer,
            (pass, _) =>
            {
                passes.Add(pass.Number);
                Assert.Equal(2, pass.Traces.Count);
                Assert.Equal(4, pass.Checks.Count);
                return ValueTask.FromResult(pass.Number < 3);
            }, CancellationToken.None).WaitAsync(VirtualRuns.Limit);

        Assert.Equal([1, 2, 3], passes);
        Assert.Equal(RunStatus.Passed, outcome.Status);
        // The "connect" message and the analyser setup come before the first sweep: once.
        Assert.Single(observer.Events.OfType<OperatorMessage>());
        Assert.Single(observer.Events.OfType<StepStarted>(), s => s.Kind == "set-network-analyser");
        // Two traces per sweep step, three passes; four checks per pass.
        Assert.Equal(6, observer.Events.OfType<SweepAcquired>().Count());
        Assert.Equal(12, outcome.Checks.Count);
        var run = store.GetRun(outcome.RunId!.Value)!;
        Assert.Equal(RunMode.Tuning, run.Record.Mode);
        Assert.Equal(6, store.GetSweeps(run.Id).Count);
        Assert.Equal(12, store.GetChecks(run.Id).Count);
    }

    [Fact]
    public async Task Run_WithoutAMode_IsRecordedAsASingleRun()
    {
        using var dir = new TempDirectory();
        using var store = SqliteResultStore.Open(dir.PathOf("runs.db"));
        var runner = VirtualRuns.Runner(VirtualBench.CreateDemo(seed: 2), store);

        var outcome = await runner.RunAsync(VirtualRuns.CheckPlan(),
            VirtualRuns.Context(), null, CancellationToken.None).WaitAsync(VirtualRuns.Limit);

        Assert.Equal(RunMode.Single, store.GetRun(outcome.RunId!.Value)!.Record.Mode);
    }
}
