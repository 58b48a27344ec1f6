using BenchRunner.Daemon.Scheduling;
using BenchRunner.Daemon.Settings;
using BenchRunner.Daemon.Status;
using BenchRunner.Daemon.Tests.Support;
using BenchRunner.Core.Diagnostics;
using Microsoft.Extensions.Logging;

namespace BenchRunner.Daemon.Tests.Scheduling;

public sealed class PlanSchedulerTests
{
    private static readonly ScheduleSettings Hourly = new("reference", "reference.yaml", TimeSpan.FromHours(1), TimeSpan.FromMinutes(10), SourceLocation.OfFile("daemon.yaml"));

    private sealed class Rig
    {
        public ManualTimeProvider Time { get; } = new();

        public CollectingLoggerProvider Log { get; } = new();

        public StatusBoard Status { get; } = new();

        public List<(DateTimeOffset Due, TaskCompletionSource Run)> Started { get; } = [];

        public PlanScheduler Create() => new(Hourly, Time, new LoggerFactory([Log]).CreateLogger("test"), Status, (_, due, _) =>
        {
            var run = new TaskCompletionSource(TaskCreationOptions.RunContinuationsAsynchronously);
            lock (Started)
            {
                Started.Add((due, run));
            }

            return Task.FromResult<ScheduledRun?>(new ScheduledRun("J" + Started.Count, run.Task));
        });

        public async Task WaitForStartsAsync(int count)
        {
            var deadline = DateTime.UtcNow + TimeSpan.FromSeconds(30);
            while (true)
            {
                lock (Started)
                {
                    if (Started.Count >= count)
                    {
                        return;
                    }
                }

                Assert.True(DateTime.UtcNow < deadline, $"expected {count} starts");
                await Task.Delay(5);
            }
        }
    }

    [Fact]
    public async Task Run_KeepsAFixedRhythm_FirstRunAtStart()
    {
        var rig = new Rig();
        using var stop = new CancellationTokenSource();
        var running = rig.Create().RunAsync(stop.Token);

        await rig.WaitForStartsAsync(1);
        rig.Started[0].Run.SetResult();
        await rig.Time.WaitForTimersAsync(1);
        rig.Time.Advance(TimeSpan.FromHours(1));
        await rig.WaitForStartsAsync(2);

        Assert.Equal(TimeSpan.FromHours(1), rig.Started[1].Due - rig.Started[0].Due);
        await stop.CancelAsync();
        await running.WaitAsync(TimeSpan.FromSeconds(30));
    }

    [Fact]
    public async Task Run_PreviousRunStillGoing_SkipsAndLogsTheDueRunInsteadOfPilingUp()
    {
        var rig = new Rig();
        using var stop = new CancellationTokenSource();
        var running = rig.Create().RunAsync(stop.Token);
        await rig.WaitForStartsAsync(1);

        // The first run is still going an hour later: that due run is skipped.
        await rig.Time.WaitForTimersAsync(1);
        rig.Time.Advance(TimeSpan.FromHours(1));
        await rig.Time.WaitForTimersAsync(1);
        Assert.Single(rig.Started);
        var skipped = Assert.Single(rig.Log.Named("ScheduleSkipped"));
        Assert.Equal("J1", skipped.Values["JobId"]);
        Assert.Equal(1, rig.Status.Snapshot(Identity, [], new Dictionary<string, string>(), rig.Time.GetUtcNow()).Schedules.Single().Skipped);

        // Once it has finished, the next due run starts on the rhythm.
        rig.Started[0].Run.SetResult();
        rig.Time.Advance(TimeSpan.FromHours(1));
        await rig.WaitForStartsAsync(2);
        Assert.Equal(TimeSpan.FromHours(2), rig.Started[1].Due - rig.Started[0].Due);
        await stop.CancelAsync();
        await running.WaitAsync(TimeSpan.FromSeconds(30));
    }

    private static readonly DaemonStatus Identity = new()
    {
        State = "running", ProcessId = 1, Host = "bench-pc", StartedUtc = DateTimeOffset.UnixEpoch, UpdatedUtc = DateTimeOffset.UnixEpoch,
        HeartbeatSeconds = 5, Bench = "virtual-bench", Database = "results.db", Inbox = "inbox",
    };
}
