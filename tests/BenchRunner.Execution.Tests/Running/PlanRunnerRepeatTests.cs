using BenchRunner.Execution.Bench;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Running;
using BenchRunner.Instruments.Connections;
using BenchRunner.Simulator.Bench;
using BenchRunner.Simulator.Endpoints;
using BenchRunner.Storage;

namespace BenchRunner.Execution.Tests.Running;

public sealed class PlanRunnerRepeatTests
{
    private static readonly TimeSpan Limit = TimeSpan.FromSeconds(60);

    private sealed class Collector : IRunObserver
    {
        public List<RunEvent> Events { get; } = [];

        public void OnEvent(RunEvent runEvent) => Events.Add(runEvent);
    }

    [Fact]
    public async Task RunRepeatedly_StepsBeforeTheFirstSweepRunOnceTheRestEveryPass_AllInOneRun()
    {
        using var dir = new TempDirectory();
        using var store = ResultStore.Open(dir.PathOf("runs.db"));
        var transports = SimulatorConnections.Register(new TransportFactory(), new VirtualBenchServers(VirtualBench.CreateDemo(seed: 2)));
        var runner = new PlanRunner(BenchFile.Load(RepositoryFiles.Example("bench-virtual.yaml")), transports, store);
        var plan = PlanFile.Load(RepositoryFiles.Example("plans/psf-137-check.yaml"));
        var observer = new Collector();
        var passes = new List<int>();

        var outcome = await runner.RunRepeatedlyAsync(plan, new RunContext("plan text", null, "0.1.0", "test-host") { Mode = RunMode.Tuning }, observer,
            (pass, _) =>
            {
                passes.Add(pass);
                return ValueTask.FromResult(pass < 3);
            }, CancellationToken.None).WaitAsync(Limit);

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
        using var store = ResultStore.Open(dir.PathOf("runs.db"));
        var transports = SimulatorConnections.Register(new TransportFactory(), new VirtualBenchServers(VirtualBench.CreateDemo(seed: 2)));
        var runner = new PlanRunner(BenchFile.Load(RepositoryFiles.Example("bench-virtual.yaml")), transports, store);

        var outcome = await runner.RunAsync(PlanFile.Load(RepositoryFiles.Example("plans/psf-137-check.yaml")),
            new RunContext("plan text", null, "0.1.0", "test-host"), null, CancellationToken.None).WaitAsync(Limit);

        Assert.Equal(RunMode.Single, store.GetRun(outcome.RunId!.Value)!.Record.Mode);
    }
}
