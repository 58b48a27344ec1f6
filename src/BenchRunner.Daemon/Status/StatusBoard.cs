using BenchRunner.Daemon.Work;

namespace BenchRunner.Daemon.Status;

/// <summary>
/// The daemon's live state, kept up to date by its parts and turned into a <see cref="DaemonStatus"/>
/// for the status file. Thread-safe; <see cref="Version"/> moves on at every change.
/// </summary>
public sealed class StatusBoard
{
    private const int RecentKept = 20;

    private readonly Lock _lock = new();
    private readonly Dictionary<string, JobStatus> _jobs = new(StringComparer.Ordinal);
    private readonly Dictionary<string, ScheduleStatus> _schedules = new(StringComparer.Ordinal);
    private readonly LinkedList<FinishedJobStatus> _recent = new();
    private string _state = "starting";
    private long _version;

    /// <summary>Moves on at every change.</summary>
    public long Version => Interlocked.Read(ref _version);

    /// <summary>Sets the daemon's state word.</summary>
    public void SetState(string state) => Change(() => _state = state);

    /// <summary>Adds or replaces a job's entry.</summary>
    public void SetJob(JobStatus job) => Change(() => _jobs[job.Job] = job);

    /// <summary>Changes a job's entry, if it is there.</summary>
    public void UpdateJob(string jobId, Func<JobStatus, JobStatus> change) => Change(() =>
    {
        if (_jobs.TryGetValue(jobId, out var job))
        {
            _jobs[jobId] = change(job);
        }
    });

    /// <summary>Removes a job that ended without finishing (the daemon stopped while it waited).</summary>
    public void RemoveJob(string jobId) => Change(() => _jobs.Remove(jobId));

    /// <summary>Moves a job to the recent list.</summary>
    public void Finish(FinishedJobStatus finished) => Change(() =>
    {
        _jobs.Remove(finished.Job);
        _recent.AddFirst(finished);
        while (_recent.Count > RecentKept)
        {
            _recent.RemoveLast();
        }
    });

    /// <summary>Adds or replaces a schedule's entry.</summary>
    public void SetSchedule(ScheduleStatus schedule) => Change(() => _schedules[schedule.Name] = schedule);

    /// <summary>Changes a schedule's entry, if it is there.</summary>
    public void UpdateSchedule(string name, Func<ScheduleStatus, ScheduleStatus> change) => Change(() =>
    {
        if (_schedules.TryGetValue(name, out var schedule))
        {
            _schedules[name] = change(schedule);
        }
    });

    /// <summary>Records that something outside the board (instrument health, leases) changed.</summary>
    public void Touch() => Interlocked.Increment(ref _version);

    /// <summary>The status as of now.</summary>
    public DaemonStatus Snapshot(DaemonStatus identity, IReadOnlyList<InstrumentHealth> health, IReadOnlyDictionary<string, string> holders, DateTimeOffset now)
    {
        lock (_lock)
        {
            var jobs = _jobs.Values.OrderBy(j => j.QueuedUtc).ThenBy(j => j.Job, StringComparer.Ordinal).ToList();
            return identity with
            {
                State = _state,
                UpdatedUtc = now,
                Queue = [.. jobs.Where(j => j.StartedUtc is null)],
                Running = [.. jobs.Where(j => j.StartedUtc is not null)],
                Instruments = [.. health.Select(h => new InstrumentStatus
                {
                    Name = h.Name,
                    Connection = h.Connection,
                    Health = h.State.ToString().ToLowerInvariant(),
                    InUseBy = holders.TryGetValue(h.Name, out var holder) ? holder : null,
                    LastFault = h.LastFault,
                    Faults = h.Faults,
                    NextTryUtc = h.NextTry,
                    SinceUtc = h.Since,
                })],
                Schedules = [.. _schedules.Values],
                Recent = [.. _recent],
            };
        }
    }

    private void Change(Action change)
    {
        lock (_lock)
        {
            change();
        }

        Interlocked.Increment(ref _version);
    }
}
