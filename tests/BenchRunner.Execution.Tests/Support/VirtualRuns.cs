using BenchRunner.Execution.Bench;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Running;
using BenchRunner.Instruments.Connections;
using BenchRunner.Simulator.Bench;
using BenchRunner.Simulator.Endpoints;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;

namespace BenchRunner.Execution.Tests.Support;

/// <summary>Plan runs on a virtual bench, set up alike in every runner test.</summary>
internal static class VirtualRuns
{
    /// <summary>How long a run on the virtual bench may take before the test gives up (generous: the machine may be busy).</summary>
    public static readonly TimeSpan Limit = TimeSpan.FromSeconds(60);

    /// <summary>A runner for <paramref name="definition"/> (default: the example virtual bench file) whose <c>sim:</c> connections reach <paramref name="bench"/>.</summary>
    public static RunLauncher Runner(VirtualBench bench, IResultWriter? store, BenchDefinition? definition = null)
    {
        var transports = SimulatorConnections.Register(new TransportFactory(), new VirtualBenchServers(bench));
        return new RunLauncher(new PlanRunner(definition ?? BenchFile.Load(RepositoryFiles.Example("bench-virtual.yaml")), transports), store);
    }

    /// <summary>The example check plan of the 137 MHz preselector.</summary>
    public static TestPlan CheckPlan() => PlanFile.Load(RepositoryFiles.Example("plans/psf-137-check.yaml"));

    /// <summary>A run context with placeholder plan text, version and host.</summary>
    public static RunContext Context() => new("plan text", null, "0.1.0", "test-host");
}
