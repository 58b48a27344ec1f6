using BenchRunner.Daemon.Logging;
using BenchRunner.Daemon.Tests.Support;

namespace BenchRunner.Daemon.Tests.Logging;

public sealed class DaemonLogTests
{
    private readonly CollectingLoggerProvider _provider = new();

    [Theory]
    [InlineData(1, "Plan file inbox/typo.yaml rejected (1 problem, first: typo.yaml:6:13: unknown role \"vnx\"); moved to rejected/typo.yaml")]
    [InlineData(3, "Plan file inbox/typo.yaml rejected (3 problems, first: typo.yaml:6:13: unknown role \"vnx\"); moved to rejected/typo.yaml")]
    public void Rejected_ProblemCount_NounAgreesAndTheCountStaysAProperty(int problems, string expected)
    {
        DaemonLog.Rejected(_provider.CreateLogger("daemon"), "inbox/typo.yaml", problems, "typo.yaml:6:13: unknown role \"vnx\"", "rejected/typo.yaml");

        var logged = Assert.Single(_provider.Named("Rejected"));
        Assert.Equal(expected, logged.Message);
        Assert.Equal(11, logged.Id.Id);
        Assert.Equal(problems, logged.Values["ProblemCount"]);
    }

    [Fact]
    public void RunFinished_OneCheck_SaysCheckNotChecks()
    {
        DaemonLog.RunFinished(_provider.CreateLogger("daemon"), 7, "reference-drift", "vna", "passed", 1, 1, "");

        Assert.Equal("Run 7 finished: plan reference-drift on vna passed, 1 of 1 check passed", Assert.Single(_provider.Named("RunFinished")).Message);
    }

    [Theory]
    [InlineData(new[] { "vna" }, "once vna answers")]
    [InlineData(new[] { "vna", "sa" }, "once vna, sa answer")]
    public void WillRetry_Instruments_VerbAgrees(string[] instruments, string expected)
    {
        DaemonLog.WillRetry(_provider.CreateLogger("daemon"), "job-1", "reference-drift", instruments, 2, 3);

        Assert.Contains(expected + " (attempt 2 of 3)", Assert.Single(_provider.Named("WillRetry")).Message, StringComparison.Ordinal);
    }

    [Fact]
    public void StoppingAndStopped_OneRunAndOnePlan_AreSingular()
    {
        var log = _provider.CreateLogger("daemon");
        DaemonLog.Stopping(log, 1, 30);
        DaemonLog.Stopped(log, 1);

        Assert.Equal("Daemon stopping: 1 run in progress, each finishing its sweep in flight (at most 30 s)", Assert.Single(_provider.Named("Stopping")).Message);
        Assert.Equal("Daemon stopped; 1 queued plan left in the inbox for the next start", Assert.Single(_provider.Named("Stopped")).Message);
    }
}
