using BenchRunner.Core.Quantities;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Running;
using BenchRunner.Execution.Tests.Support;
using BenchRunner.Simulator.Bench;
using BenchRunner.Simulator.Devices;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;
using BenchRunner.Core.Runs;

namespace BenchRunner.Execution.Tests.Running;

public sealed class PlanRunnerTests
{
    private static (RunLauncher Runner, VirtualBench Bench) Create(SqliteResultStore? store)
    {
        var bench = VirtualBench.CreateDemo(seed: 3);
        return (VirtualRuns.Runner(bench, store), bench);
    }

    private static RunContext Context(string serial) => new("plan text", null, "0.1.0", "test-host") { DutSerial = serial, Lot = "PSF-24-L07" };

    /// <summary>Runs the example check plan with a token cancelled before it starts.</summary>
    private static async Task<RunOutcome> RunCancelledAsync(SqliteResultStore? store, RunContext context)
    {
        var (runner, _) = Create(store);
        using var cts = new CancellationTokenSource();
        await cts.CancelAsync();
        return await runner.RunAsync(VirtualRuns.CheckPlan(), context, null, cts.Token).WaitAsync(VirtualRuns.Limit);
    }

    [Fact]
    public async Task Run_TunedBoard_PassesAndCommitsEverySweepAndCheck()
    {
        using var dir = new TempDirectory();
        using var store = SqliteResultStore.Open(dir.PathOf("runs.db"));
        var (runner, _) = Create(store);
        var plan = VirtualRuns.CheckPlan();
        var observer = new CollectingObserver();

        var outcome = await runner.RunAsync(plan, Context("PSF-24-0001"), observer, CancellationToken.None).WaitAsync(VirtualRuns.Limit);

        Assert.Equal(RunStatus.Passed, outcome.Status);
        Assert.All(outcome.Checks, c => Assert.True(c.Passed, c.Name + ": " + c.Detail));
        Assert.Equal(4, outcome.Checks.Count);
        var stored = store.GetRun(outcome.RunId!.Value)!;
        Assert.Equal(RunStatus.Passed, stored.Status);
        Assert.Equal(2, store.GetSweeps(stored.Id).Count);
        Assert.Equal(4, store.GetChecks(stored.Id).Count);
        Assert.Equal("SIM-VNA", Assert.Single(store.GetInstruments(stored.Id)).Model);
        Assert.Contains(observer.Events, e => e is OperatorMessage);
        Assert.Equal(2, observer.Events.OfType<SweepAcquired>().Count());
    }

    [Fact]
    public async Task Run_DetunedBoard_FailsNamingTheFailingChecks()
    {
        var (runner, bench) = Create(store: null);
        bench.NetworkAnalyser.DeviceUnderTest = Preselector137.DetunedBoard();
        var plan = VirtualRuns.CheckPlan();

        var outcome = await runner.RunAsync(plan, Context("PSF-24-0002"), null, CancellationToken.None).WaitAsync(VirtualRuns.Limit);

        Assert.Equal(RunStatus.Failed, outcome.Status);
        Assert.Contains(outcome.Checks, c => !c.Passed && c.Name.StartsWith("mask psf-137-passband", StringComparison.Ordinal));
        Assert.Contains(outcome.Checks, c => !c.Passed && c.Name == "center_hz of passband");
        Assert.Null(outcome.RunId);
    }

    [Fact]
    public async Task Run_GeneratorLevelThatWouldOverdriveTheAnalyser_IsRefusedBeforeAnythingIsSent()
    {
        var (runner, bench) = Create(store: null);
        var plan = PlanFile.Parse("""
            plan: overdrive
            roles:
              gen: signal-generator
            steps:
              - set-generator:
                  role: gen
                  frequency: 137.5 MHz
                  level: +5 dBm
                  output: on
            """, "overdrive.yaml", RepositoryFiles.PathOf("docs/examples/plans"));

        var outcome = await runner.RunAsync(plan, Context("PSF-24-0003"), null, CancellationToken.None).WaitAsync(VirtualRuns.Limit);

        Assert.Equal(RunStatus.Error, outcome.Status);
        Assert.Contains("gen level 5 dBm through gen -> sa (-1 dB) reaches 4 dBm at sa, above its declared maximum input of 0 dBm", outcome.Error);
        Assert.Contains("Never exceed", outcome.Error);
        Assert.False(bench.Generator.OutputOn);
        Assert.NotEqual(Level.FromDbm(5), bench.Generator.Level);
    }

    [Fact]
    public async Task Run_CancelledByTheOperator_IsStoppedAndKeepsTheRun()
    {
        using var dir = new TempDirectory();
        using var store = SqliteResultStore.Open(dir.PathOf("runs.db"));

        var outcome = await RunCancelledAsync(store, Context("PSF-24-0001"));

        Assert.Equal(RunStatus.Stopped, outcome.Status);
        var run = store.GetRun(outcome.RunId!.Value)!;
        Assert.Equal(RunStatus.Stopped, run.Status);
        Assert.Equal("stopped by the operator", run.ErrorMessage);
        Assert.Equal("stopped by the operator", outcome.Error);
    }

    [Fact]
    public async Task Run_CancelledWithAStopReason_RecordsThatReason()
    {
        using var dir = new TempDirectory();
        using var store = SqliteResultStore.Open(dir.PathOf("runs.db"));
        var asked = 0;
        var context = Context("PSF-24-0001") with { StopReason = () => { asked++; return "stopped: the time limit of 600 s was reached"; } };

        var outcome = await RunCancelledAsync(store, context);

        Assert.Equal(RunStatus.Stopped, outcome.Status);
        Assert.Equal("stopped: the time limit of 600 s was reached", store.GetRun(outcome.RunId!.Value)!.ErrorMessage);
        Assert.Equal("stopped: the time limit of 600 s was reached", outcome.Error);
        Assert.Equal(1, asked);
    }

    [Fact]
    public async Task Run_CompletedWithAStopReason_NeverAsksForIt()
    {
        var (runner, _) = Create(store: null);
        var plan = VirtualRuns.CheckPlan();
        var context = Context("PSF-24-0001") with { StopReason = () => throw new InvalidOperationException("asked without a stop") };

        var outcome = await runner.RunAsync(plan, context, null, CancellationToken.None).WaitAsync(VirtualRuns.Limit);

        Assert.NotEqual(RunStatus.Stopped, outcome.Status);
        Assert.Null(outcome.Error);
    }

    [Theory]
    [InlineData(null)]
    [InlineData("  ")]
    public async Task Run_CancelledWithABlankStopReason_RecordsTheOperator(string? reason)
    {
        var outcome = await RunCancelledAsync(store: null, Context("PSF-24-0001") with { StopReason = () => reason });

        Assert.Equal(PlanRunner.StoppedByOperator, outcome.Error);
    }

    [Theory]
    [InlineData("times: 3", 3, RunStatus.Passed)]
    [InlineData("until: { trace: passband, figures: { center_hz: { target: 137.5 MHz, tolerance: 0.3 MHz } } }\n      at-most: 4", 1, RunStatus.Passed)]
    [InlineData("until: { trace: passband, figures: { center_hz: { target: 140 MHz, tolerance: 0.1 MHz } } }\n      at-most: 2", 2, RunStatus.Failed)]
    public async Task Run_RepeatBlock_SweepsAsOftenAsItSays(string repeatHow, int sweeps, RunStatus expected)
    {
        using var dir = new TempDirectory();
        using var store = SqliteResultStore.Open(dir.PathOf("runs.db"));
        var (runner, _) = Create(store);
        var plan = PlanFile.Parse($$"""
            plan: repeat
            roles:
              vna: network-analyser
            steps:
              - set-network-analyser: { role: vna, start: 127.5 MHz, stop: 147.5 MHz, points: 201 }
              - repeat:
                  {{repeatHow}}
                  steps:
                    - sweep: { role: vna, traces: { S21: passband } }
            """, "repeat.yaml", dir.Path);

        var outcome = await runner.RunAsync(plan, Context("PSF-24-0001"), null, CancellationToken.None).WaitAsync(VirtualRuns.Limit);

        Assert.Equal(expected, outcome.Status);
        Assert.Equal(sweeps, store.GetSweeps(outcome.RunId!.Value).Count);
    }
}
