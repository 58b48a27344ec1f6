using BenchRunner.Daemon.Work;
using BenchRunner.Execution.Running;
using BenchRunner.Core.Runs;

namespace BenchRunner.Daemon.Tests.Work;

public sealed class StopGateTests
{
    private static StepStarted Step(string kind) => new(DateTimeOffset.UnixEpoch, kind, kind);

    [Fact]
    public void RequestStop_DuringASweep_TakesEffectWhenTheNextStepBegins()
    {
        var time = new ManualTimeProvider();
        using var gate = new StopGate(time);
        gate.OnEvent(Step("sweep"));

        gate.RequestStop("the daemon is stopping", TimeSpan.FromSeconds(20));
        Assert.False(gate.Token.IsCancellationRequested);

        gate.OnEvent(Step("check-figures"));
        Assert.True(gate.Token.IsCancellationRequested);
        Assert.Equal("the daemon is stopping", gate.Reason);
    }

    [Fact]
    public void RequestStop_DuringAnOverloadCheck_LetsItsSweepsFinish()
    {
        var time = new ManualTimeProvider();
        using var gate = new StopGate(time);
        gate.OnEvent(Step("check-overload"));

        gate.RequestStop("the daemon is stopping", TimeSpan.FromSeconds(20));
        Assert.False(gate.Token.IsCancellationRequested);

        gate.OnEvent(Step("check-figures"));
        Assert.True(gate.Token.IsCancellationRequested);
    }

    [Fact]
    public void RequestStop_DuringAWait_TakesEffectAtOnce()
    {
        using var gate = new StopGate(new ManualTimeProvider());
        gate.OnEvent(Step("wait"));

        gate.RequestStop("time limit", TimeSpan.FromSeconds(20));

        Assert.True(gate.Token.IsCancellationRequested);
    }

    [Fact]
    public void RequestStop_SweepThatDoesNotEnd_IsCutShortAfterTheBound()
    {
        var time = new ManualTimeProvider();
        using var gate = new StopGate(time);
        gate.OnEvent(Step("sweep"));
        gate.RequestStop("the daemon is stopping", TimeSpan.FromSeconds(20));

        time.Advance(TimeSpan.FromSeconds(19));
        Assert.False(gate.Token.IsCancellationRequested);
        time.Advance(TimeSpan.FromSeconds(1));
        Assert.True(gate.Token.IsCancellationRequested);
    }

    [Fact]
    public void RequestStop_Twice_KeepsTheFirstReason()
    {
        using var gate = new StopGate(new ManualTimeProvider());
        gate.OnEvent(Step("sweep"));

        gate.RequestStop("time limit", TimeSpan.FromSeconds(20));
        gate.RequestStop("the daemon is stopping", TimeSpan.FromSeconds(20));

        Assert.Equal("time limit", gate.Reason);
    }
}
