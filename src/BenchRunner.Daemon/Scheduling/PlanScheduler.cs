using BenchRunner.Daemon.Logging;
using BenchRunner.Daemon.Settings;
using BenchRunner.Daemon.Status;
using Microsoft.Extensions.Logging;

namespace BenchRunner.Daemon.Scheduling;

/// <summary>
/// Runs one schedule: the first run is due at start-up, then one every <see cref="ScheduleSettings.Every"/>
/// on a fixed rhythm (a late start does not push the next due time). A due run whose predecessor
/// has not finished is skipped and logged, never piled up; due times missed altogether (the
/// computer was asleep) are skipped in the same way. Each start is logged with how late it was.
/// </summary>
internal sealed class PlanScheduler
{
    private readonly ScheduleSettings _schedule;
    private readonly TimeProvider _time;
    private readonly ILogger _log;
    private readonly StatusBoard _status;
    private readonly Func<ScheduleSettings, DateTimeOffset, CancellationToken, Task<ScheduledRun?>> _start;

    /// <summary>Creates the scheduler.</summary>
    /// <param name="schedule">What to run and how often.</param>
    /// <param name="time">The clock.</param>
    /// <param name="log">Where starts and skips are logged.</param>
    /// <param name="status">Where the schedule's status is kept.</param>
    /// <param name="start">Starts a run due at the given time (with the stopping token), returning it, or null when the plan cannot run now (already logged).</param>
    public PlanScheduler(ScheduleSettings schedule, TimeProvider time, ILogger log, StatusBoard status,
        Func<ScheduleSettings, DateTimeOffset, CancellationToken, Task<ScheduledRun?>> start)
    {
        _schedule = schedule;
        _time = time;
        _log = log;
        _status = status;
        _start = start;
    }

    /// <summary>Runs the schedule until <paramref name="stopping"/> fires; does not wait for the run in progress.</summary>
    public async Task RunAsync(CancellationToken stopping)
    {
        var due = _time.GetUtcNow();
        ScheduledRun? previous = null;
        _status.SetSchedule(new ScheduleStatus
        {
            Name = _schedule.Name,
            PlanFile = _schedule.PlanPath,
            EverySeconds = _schedule.Every.TotalSeconds,
            TimeLimitSeconds = _schedule.TimeLimit.TotalSeconds,
            NextDueUtc = due,
        });
        try
        {
            while (!stopping.IsCancellationRequested)
            {
                var wait = due - _time.GetUtcNow();
                if (wait > TimeSpan.Zero)
                {
                    await Task.Delay(wait, _time, stopping).ConfigureAwait(false);
                }

                if (previous is { Completion.IsCompleted: false })
                {
                    DaemonLog.ScheduleSkipped(_log, _schedule.Name, due, previous.JobId);
                    _status.UpdateSchedule(_schedule.Name, s => s with { Skipped = s.Skipped + 1 });
                }
                else
                {
                    DaemonLog.ScheduleDue(_log, _schedule.Name, due, Math.Round(Math.Max(0, (_time.GetUtcNow() - due).TotalSeconds), 3));
                    previous = await _start(_schedule, due, stopping).ConfigureAwait(false);
                }

                due += _schedule.Every;
                var now = _time.GetUtcNow();
                while (due <= now)
                {
                    // Missed altogether (asleep, or a run took far longer than the rhythm): skipped, not caught up.
                    DaemonLog.ScheduleSkipped(_log, _schedule.Name, due, previous?.JobId ?? "none");
                    _status.UpdateSchedule(_schedule.Name, s => s with { Skipped = s.Skipped + 1 });
                    due += _schedule.Every;
                }

                _status.UpdateSchedule(_schedule.Name, s => s with { NextDueUtc = due });
            }
        }
        catch (OperationCanceledException) when (stopping.IsCancellationRequested)
        {
            // Stopping: the run in progress, if any, is stopped by the daemon.
        }
    }
}
