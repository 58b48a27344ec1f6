using BenchRunner.Execution.Bench;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Running;
using BenchRunner.Instruments.Connections;
using BenchRunner.Simulator.Endpoints;
using BenchRunner.Storage;

namespace BenchRunner.Execution.Tests.Running;

public sealed class RunStartedEventTests
{
    private sealed class Collector : IRunObserver
    {
        public List<RunEvent> Events { get; } = [];

        public void OnEvent(RunEvent runEvent) => Events.Add(runEvent);
    }

    [Fact]
    public async Task Run_FirstEvent_IsRunStartedWithTheStoredRunsId()
    {
        using var dir = new TempDirectory();
        using var store = ResultStore.Open(dir.PathOf("runs.db"));
        var transports = SimulatorConnections.Register(new TransportFactory(), new VirtualBenchServers(seed: 3));
        var runner = new PlanRunner(BenchFile.Load(RepositoryFiles.Example("bench-virtual.yaml")), transports, store);
        var plan = PlanFile.Load(RepositoryFiles.Example("plans/psf-137-check.yaml"));
        var observer = new Collector();

        var outcome = await runner.RunAsync(plan, new RunContext("plan text", null, "0.1.0", "test-host"), observer, CancellationToken.None)
            .WaitAsync(TimeSpan.FromSeconds(60));

        var started = Assert.IsType<RunStarted>(observer.Events[0]);
        Assert.Equal(outcome.RunId, started.RunId);
        Assert.Equal("psf-137-check", started.PlanName);
        Assert.Single(observer.Events.OfType<RunStarted>());
    }
}
