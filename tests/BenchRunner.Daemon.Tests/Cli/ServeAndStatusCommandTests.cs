using BenchRunner.Cli;
using BenchRunner.Cli.Commands;
using BenchRunner.Daemon.Status;

namespace BenchRunner.Daemon.Tests.Cli;

public sealed class ServeAndStatusCommandTests
{
    private static (int ExitCode, string Out, string Error) Run(params string[] args)
    {
        var (output, error) = (new StringWriter(), new StringWriter());
        var code = CliApplication.Run(args, new CliConsole(output, error));
        return (code, output.ToString(), error.ToString());
    }

    [Fact]
    public void Serve_Check_ValidSettings_ListsWhatWouldRunAndExits0()
    {
        using var dir = new TempDirectory();
        var plan = dir.Write("reference.yaml", Support.TestPlans.Vna("reference"));

        var run = Run("serve", "--check", "--home", dir.Path, "--bench", RepositoryFiles.Example("bench-virtual.yaml"), "--schedule", $"1h={plan}");

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("Settings are valid.", run.Out, StringComparison.Ordinal);
        Assert.Contains(Path.Combine(dir.Path, "inbox"), run.Out, StringComparison.Ordinal);
        Assert.Contains("schedule       reference", run.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Serve_BadSettings_ListsEveryProblemOnItsOwnLineAndExits2()
    {
        using var dir = new TempDirectory();
        var settings = dir.Write("daemon.yaml", "bench: no-such-bench.yaml\ntiming:\n  scan-every: 1 fortnight\n");

        var run = Run("serve", "--settings", settings, "--log-level", "loud");

        Assert.Equal(2, run.ExitCode);
        var lines = run.Error.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Contains(lines, l => l.Contains($"{settings}:3:15: ", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.Contains("command line --log-level: unknown log level \"loud\"", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.Contains("no-such-bench.yaml: no such file", StringComparison.Ordinal));
    }

    [Fact]
    public void Status_NoStatusFile_SaysSoAndExits3()
    {
        using var dir = new TempDirectory();

        var run = Run("status", "--state", dir.Path);

        Assert.Equal(3, run.ExitCode);
        Assert.Contains("no status file", run.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Status_RunningDaemon_ShowsQueueRunningAndInstrumentHealth()
    {
        using var dir = new TempDirectory();
        var now = DateTimeOffset.UtcNow;
        StatusFile.Write(Path.Combine(dir.Path, "daemon-status.json"), Sample(now));

        var text = Run("status", "--state", dir.Path);
        var json = Run("status", "--state", dir.Path, "--json");

        Assert.Equal(0, text.ExitCode);
        Assert.Contains("Daemon   running", text.Out, StringComparison.Ordinal);
        Assert.Contains("J4    psf-137-check (inbox) run 12 on vna, step passband sweep", text.Out, StringComparison.Ordinal);
        Assert.Contains("J5    psf-137-check (inbox) needs vna; waiting for instruments in use", text.Out, StringComparison.Ordinal);
        Assert.Contains("sa       faulty", text.Out, StringComparison.Ordinal);
        Assert.Equal(0, json.ExitCode);
        var document = System.Text.Json.JsonDocument.Parse(json.Out).RootElement;
        Assert.True(document.GetProperty("alive").GetBoolean());
        Assert.Equal(12, document.GetProperty("running")[0].GetProperty("run_id").GetInt64());
        Assert.Equal("faulty", document.GetProperty("instruments")[1].GetProperty("health").GetString());
    }

    [Fact]
    public void Status_DaemonSilentForThreeHeartbeats_IsReportedNotRunning()
    {
        var now = DateTimeOffset.UtcNow;

        var (alive, verdict) = StatusCommand.Judge(Sample(now - TimeSpan.FromSeconds(16)), now);

        Assert.False(alive);
        Assert.Contains("not responding", verdict, StringComparison.Ordinal);
        Assert.True(StatusCommand.Judge(Sample(now - TimeSpan.FromSeconds(4)), now).Alive);
    }

    private static DaemonStatus Sample(DateTimeOffset updated) => new()
    {
        State = "running", ProcessId = 4242, Host = "bench-pc", StartedUtc = updated.AddHours(-3), UpdatedUtc = updated,
        HeartbeatSeconds = 5, Bench = "virtual-bench", Database = "/srv/bench/results.db", Inbox = "/srv/bench/inbox",
        Running = [new JobStatus { Job = "J4", Plan = "psf-137-check", Origin = "inbox", PlanFile = "/srv/bench/inbox/psf-24-0007.yaml", Instruments = ["vna"], QueuedUtc = updated.AddSeconds(-20), StartedUtc = updated.AddSeconds(-15), RunId = 12, Step = "passband sweep" }],
        Queue = [new JobStatus { Job = "J5", Plan = "psf-137-check", Origin = "inbox", PlanFile = "/srv/bench/inbox/psf-24-0008.yaml", Instruments = ["vna"], QueuedUtc = updated.AddSeconds(-5), WaitingFor = "instruments in use" }],
        Instruments =
        [
            new InstrumentStatus { Name = "vna", Connection = "sim:vna", Health = "healthy", InUseBy = "J4" },
            new InstrumentStatus { Name = "sa", Connection = "sim:sa", Health = "faulty", LastFault = "sa: no answer within 15 s", Faults = 3, NextTryUtc = updated.AddSeconds(20) },
        ],
    };
}
