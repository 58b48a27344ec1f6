using BenchRunner.Daemon.Work;

namespace BenchRunner.Daemon.Tests.Work;

public sealed class StopGateTests
{
    [Fact]
    public void RequestStop_StopsAtTheNextStepAtOnceAndCutsNothingYet()
    {
        var time = new ManualTimeProvider();
        using var gate = new StopGate(time);

        gate.RequestStop("the daemon is stopping", TimeSpan.FromSeconds(20));

        Assert.True(gate.AtNextStep.IsCancellationRequested);
        Assert.False(gate.Token.IsCancellationRequested);
        Assert.Equal("the daemon is stopping", gate.Reason);
    }

    [Fact]
    public void RequestStop_StepThatDoesNotEnd_IsCutShortAfterTheBound()
    {
        var time = new ManualTimeProvider();
        using var gate = new StopGate(time);
        gate.RequestStop("the daemon is stopping", TimeSpan.FromSeconds(20));

        time.Advance(TimeSpan.FromSeconds(19));
        Assert.False(gate.Token.IsCancellationRequested);
        time.Advance(TimeSpan.FromSeconds(1));
        Assert.True(gate.Token.IsCancellationRequested);
    }

    [Fact]
    public void RequestStop_Twice_KeepsTheFirstReasonAndBound()
    {
        var time = new ManualTimeProvider();
        using var gate = new StopGate(time);

        gate.RequestStop("time limit", TimeSpan.FromSeconds(20));
        gate.RequestStop("the daemon is stopping", TimeSpan.FromSeconds(5));
        time.Advance(TimeSpan.FromSeconds(5));

        Assert.Equal("time limit", gate.Reason);
        Assert.False(gate.Token.IsCancellationRequested);
    }

    [Fact]
    public void NoRequest_NothingFires()
    {
        var time = new ManualTimeProvider();
        using var gate = new StopGate(time);

        time.Advance(TimeSpan.FromHours(1));

        Assert.False(gate.AtNextStep.IsCancellationRequested);
        Assert.False(gate.Token.IsCancellationRequested);
        Assert.Null(gate.Reason);
    }
}
