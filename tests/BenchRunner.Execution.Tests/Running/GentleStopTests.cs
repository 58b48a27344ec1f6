using BenchRunner.Core.Runs;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Running;
using BenchRunner.Execution.Tests.Support;
using BenchRunner.Simulator.Bench;
using BenchRunner.Storage.Sqlite;

namespace BenchRunner.Execution.Tests.Running;

/// <summary>A gentle stop (the daemon stopping, a time limit) lets a step that drives an instrument finish.</summary>
public sealed class GentleStopTests
{
    private static TestPlan Plan(string folder) => PlanFile.Parse("""
        plan: stop-during-overload
        roles: { sa: spectrum-analyser }
        steps:
          - set-spectrum-analyser: { role: sa, centre: 137.5 MHz, span: 4 MHz, attenuation: 0 dB }
          - name: overload check
            check-overload: { role: sa, trace: spectrum, threshold: -85 dBm }
          - name: after
            sweep: { role: sa, traces: { power: after } }
        """, "stop.yaml", folder);

    [Fact]
    public async Task StopAtNextStep_AskedDuringAnOverloadCheck_FinishesBothItsSweepsAndItsCheck()
    {
        using var dir = new TempDirectory();
        using var store = SqliteResultStore.Open(dir.PathOf("runs.db"));
        var runner = VirtualRuns.Runner(VirtualBench.CreateDemo(seed: 4), store);
        using var stop = new CancellationTokenSource();
        // Asks for the stop the moment the overload check begins, as the daemon does when it is told to stop.
        var asker = new StopAsker("check-overload", stop);
        var context = VirtualRuns.Context() with { StopAtNextStep = stop.Token, StopReason = () => "stopped: the daemon is stopping" };

        var outcome = await runner.RunAsync(Plan(dir.Path), context, [RunSubscription.Lossless(asker, "stop asker")], CancellationToken.None)
            .WaitAsync(VirtualRuns.Limit);

        Assert.Equal(RunStatus.Stopped, outcome.Status);
        Assert.Equal("stopped: the daemon is stopping", outcome.Error);
        var sweeps = store.GetSweeps(outcome.RunId!.Value);
        Assert.Equal(["spectrum", "spectrum-raised"], sweeps.Select(s => s.Record.TraceName));
        var check = Assert.Single(store.GetChecks(outcome.RunId!.Value));
        Assert.Equal(CheckKind.Overload, check.Record.Kind);
        Assert.DoesNotContain(sweeps, s => s.Record.TraceName == "after");
    }

    [Fact]
    public async Task StopAtNextStep_AskedDuringAWait_EndsItAtOnce()
    {
        using var dir = new TempDirectory();
        var runner = VirtualRuns.Runner(VirtualBench.CreateDemo(seed: 4), store: null);
        var plan = PlanFile.Parse("""
            plan: long-wait
            roles: { sa: spectrum-analyser }
            steps:
              - wait: 1 h
              - sweep: { role: sa, traces: { power: never } }
            """, "wait.yaml", dir.Path);
        using var stop = new CancellationTokenSource();
        var asker = new StopAsker("wait", stop);

        var outcome = await runner.RunAsync(plan, VirtualRuns.Context() with { StopAtNextStep = stop.Token },
            [RunSubscription.Lossless(asker, "stop asker")], CancellationToken.None).WaitAsync(VirtualRuns.Limit);

        Assert.Equal(RunStatus.Stopped, outcome.Status);
        Assert.Equal(PlanRunner.StoppedByOperator, outcome.Error);
    }

    [Theory]
    [InlineData("set-network-analyser", true)]
    [InlineData("set-spectrum-analyser", true)]
    [InlineData("set-generator", true)]
    [InlineData("sweep", true)]
    [InlineData("check-overload", true)]
    [InlineData("check-mask", false)]
    [InlineData("check-figures", false)]
    [InlineData("wait", false)]
    [InlineData("message", false)]
    [InlineData("repeat", false)]
    public void StepKinds_SayWhetherTheyDriveAnInstrument(string word, bool drives)
    {
        var kind = StepKinds.Find(word);

        Assert.NotNull(kind);
        Assert.Equal(drives, kind.DrivesInstrument);
    }

    private sealed class StopAsker(string kind, CancellationTokenSource stop) : IRunListener
    {
        public ValueTask OnEventAsync(RunEvent runEvent, CancellationToken cancellationToken)
        {
            if (runEvent is StepStarted step && step.Kind == kind)
            {
                stop.Cancel();
            }

            return ValueTask.CompletedTask;
        }
    }
}
