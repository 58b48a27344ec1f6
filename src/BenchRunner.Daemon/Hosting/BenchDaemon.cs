using System.Collections.Concurrent;
using BenchRunner.Core.Diagnostics;
using BenchRunner.Daemon.Inbox;
using BenchRunner.Daemon.Logging;
using BenchRunner.Daemon.Scheduling;
using BenchRunner.Daemon.Settings;
using BenchRunner.Daemon.Status;
using BenchRunner.Daemon.Work;
using BenchRunner.Execution.Bench;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Running;
using BenchRunner.Execution.Validation;
using BenchRunner.Instruments.Adapters;
using BenchRunner.Instruments.Connections;
using BenchRunner.Storage;
using Microsoft.Extensions.Logging;
using BenchRunner.Execution.Preparation;

namespace BenchRunner.Daemon.Hosting;

/// <summary>
/// The daemon itself, apart from its host: watches the inbox, runs the schedules, queues every
/// plan behind the leases of the instruments it needs, runs it through <see cref="PlanRunner"/>
/// into the one shared result store (whose calls are serialised, so parallel runs never compete
/// for SQLite's single writer), files it as done or rejected, keeps instrument health, and
/// publishes its status. <see cref="RunAsync"/> returns once everything in flight has ended after
/// the stopping token fires.
/// </summary>
public sealed partial class BenchDaemon
{
    /// <summary>How often the status file is rewritten even when nothing changed: 5 s.</summary>
    public static readonly TimeSpan Heartbeat = TimeSpan.FromSeconds(5);

    private readonly DaemonSettings _settings;
    private readonly BenchDefinition _bench;
    private readonly string _benchText;
    private readonly TransportFactory _transports;
    private readonly TimeProvider _time;
    private readonly ILogger _log;
    private readonly InstrumentHealthBoard _health;
    private readonly ConcurrentDictionary<string, byte> _taken = new(StringComparer.Ordinal);
    private readonly ConcurrentDictionary<string, Task> _jobs = new(StringComparer.Ordinal);
    private readonly ConcurrentDictionary<string, (StopGate Gate, RunLogListener Observer, PlanJob Job)> _running = new(StringComparer.Ordinal);
    private readonly string _softwareVersion;
    private readonly PreparedBench _preparedBench;
    private IResultStore? _store;
    private int _nextJob;

    /// <summary>Creates the daemon.</summary>
    /// <param name="settings">Checked settings (<see cref="DaemonSettingsLoader"/>).</param>
    /// <param name="transports">Creates the connections the bench names (with <c>sim:</c> registered for the virtual bench).</param>
    /// <param name="time">The clock.</param>
    /// <param name="logs">Where the daemon logs.</param>
    /// <param name="softwareVersion">BenchRunner's version, recorded with every run.</param>
    /// <exception cref="InputFormatException">The bench file has changed since the settings were checked and is no longer valid.</exception>
    public BenchDaemon(DaemonSettings settings, TransportFactory transports, TimeProvider time, ILoggerFactory logs, string softwareVersion)
    {
        _settings = settings ?? throw new ArgumentNullException(nameof(settings));
        _transports = transports ?? throw new ArgumentNullException(nameof(transports));
        _time = time ?? throw new ArgumentNullException(nameof(time));
        ArgumentNullException.ThrowIfNull(logs);
        _log = logs.CreateLogger("BenchRunner.Daemon");
        _softwareVersion = softwareVersion;
        _preparedBench = RunPreparation.LoadBench(settings.BenchPath);
        _benchText = _preparedBench.Text;
        _bench = _preparedBench.Definition;
        Leases = new InstrumentLeases(time);
        _health = new InstrumentHealthBoard(_bench, ProbeAsync, Leases, new Backoff(settings.RetryFirst, settings.RetryLongest), time, _log);
        Leases.Changed += _ => Status.Touch();
        Identity = new DaemonStatus
        {
            State = "starting",
            ProcessId = Environment.ProcessId,
            Host = Environment.MachineName,
            StartedUtc = time.GetUtcNow(),
            UpdatedUtc = time.GetUtcNow(),
            HeartbeatSeconds = Heartbeat.TotalSeconds,
            Bench = _bench.Name,
            Database = settings.DatabasePath,
            Inbox = settings.InboxFolder,
        };
    }

    /// <summary>The instrument leases; tests and the status watch their changes.</summary>
    public InstrumentLeases Leases { get; }

    /// <summary>The live status.</summary>
    public StatusBoard Status { get; } = new();

    /// <summary>Raised when a job has ended: run and filed, or rejected.</summary>
    public event Action<FinishedJobStatus>? JobFinished;

    /// <summary>Raised once the daemon is open for work (store open, inbox watched).</summary>
    public event Action? Started;

    private DaemonStatus Identity { get; }

    /// <summary>The status as of now.</summary>
    public DaemonStatus Snapshot() => Status.Snapshot(Identity, _health.Snapshot(), Leases.Holders, _time.GetUtcNow());

    /// <summary>Runs until <paramref name="stopping"/> fires, then stops every run gently and returns when all have ended.</summary>
    /// <exception cref="ResultStoreException">The result database cannot be opened.</exception>
    public async Task RunAsync(CancellationToken stopping)
    {
        DaemonLog.Starting(_log, _bench.Name, _settings.BenchPath, _settings.InboxFolder, _settings.DatabasePath, _settings.Schedules.Count);
        DaemonLog.SafetyCaution(_log, PlanRunner.InputCaution);
        using var store = ResultStores.Open(_settings.DatabasePath, _time);
        _store = store;
        if (store.InterruptedAtOpen.Count > 0)
        {
            DaemonLog.InterruptedRuns(_log, string.Join(", ", store.InterruptedAtOpen));
        }

        Status.SetState("running");
        var scanner = new InboxScanner(_settings.InboxFolder, _settings.Settle, _time);
        var schedules = _settings.Schedules
            .Select(s => new PlanScheduler(s, _time, _log, Status, StartScheduledAsync).RunAsync(stopping))
            .ToList();
        foreach (var name in _bench.Instruments.Keys)
        {
            Track("probe " + name, ProbeAtStartAsync(name, stopping));
        }

        long written = -1;
        var lastWrite = DateTimeOffset.MinValue;
        Started?.Invoke();
        while (!stopping.IsCancellationRequested)
        {
            try
            {
                foreach (var path in scanner.Scan(_taken.Keys.ToHashSet(StringComparer.Ordinal)))
                {
                    Accept(path, stopping);
                }
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                DaemonLog.InboxTrouble(_log, _settings.InboxFolder, e.Message);
            }

            (written, lastWrite) = WriteStatusIfDue(written, lastWrite);
            try
            {
                await Task.Delay(_settings.ScanEvery, _time, stopping).ConfigureAwait(false);
            }
            catch (OperationCanceledException)
            {
                break;
            }
        }

        Status.SetState("stopping");
        DaemonLog.Stopping(_log, _running.Count, _settings.StopWithin.TotalSeconds);
        WriteStatus();
        foreach (var (gate, observer, job) in _running.Values)
        {
            DaemonLog.StopRequested(_log, observer.RunId, string.Join(", ", job.Instruments), "the daemon is stopping");
            gate.RequestStop("the daemon is stopping", _settings.StopWithin);
        }

        await Task.WhenAll(schedules).ConfigureAwait(false);
        await Task.WhenAll(_jobs.Values).ConfigureAwait(false);
        await _health.DrainAsync().ConfigureAwait(false);
        Status.SetState("stopped");
        DaemonLog.Stopped(_log, _taken.Count);
        WriteStatus();
        _store = null;
    }

    private void Accept(string path, CancellationToken stopping)
    {
        if (!_taken.TryAdd(path, 0))
        {
            return;
        }

        string text;
        try
        {
            text = File.ReadAllText(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // Gone or locked again since the scan: looked at afresh next time.
            _taken.TryRemove(path, out _);
            return;
        }

        TestPlan plan;
        try
        {
            plan = RunPreparation.FromText(text, path, _settings.InboxFolder, _preparedBench).Plan;
        }
        catch (InputFormatException e)
        {
            Reject(path, e.Problems);
            return;
        }

        var job = new PlanJob
        {
            Id = NextJobId(),
            Origin = PlanJob.InboxOrigin,
            PlanPath = path,
            PlanText = text,
            Plan = plan,
            QueuedAt = _time.GetUtcNow(),
        };
        Submit(job, stopping);
    }

    private void Reject(string path, IReadOnlyList<InputProblem> problems)
    {
        var id = NextJobId();
        try
        {
            var target = PlanFiler.FileAsRejected(path, _settings.RejectedFolder, problems);
            DaemonLog.Rejected(_log, path, problems.Count, problems[0].ToString(), target);
            var finished = new FinishedJobStatus
            {
                Job = id, Plan = Path.GetFileName(path), Origin = PlanJob.InboxOrigin, Status = "rejected",
                EndedUtc = _time.GetUtcNow(), Summary = problems[0].ToString(), FiledAs = target,
            };
            Status.Finish(finished);
            JobFinished?.Invoke(finished);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            DaemonLog.InboxTrouble(_log, _settings.InboxFolder, e.Message);
        }
        finally
        {
            _taken.TryRemove(path, out _);
        }
    }

    private async Task<ScheduledRun?> StartScheduledAsync(ScheduleSettings schedule, DateTimeOffset due, CancellationToken stopping)
    {
        await Task.Yield();
        TestPlan plan;
        string text;
        try
        {
            text = InputFile.ReadAllText(schedule.PlanPath);
            plan = RunPreparation.FromText(text, schedule.PlanPath, Path.GetDirectoryName(schedule.PlanPath) ?? ".", _preparedBench).Plan;
        }
        catch (InputFormatException e)
        {
            DaemonLog.ScheduleInvalid(_log, schedule.Name, e.Message.Replace('\n', ' '));
            return null;
        }

        var job = new PlanJob
        {
            Id = NextJobId(),
            Origin = "schedule " + schedule.Name,
            PlanPath = schedule.PlanPath,
            PlanText = text,
            Plan = plan,
            TimeLimit = schedule.TimeLimit,
            QueuedAt = _time.GetUtcNow(),
        };
        Status.UpdateSchedule(schedule.Name, s => s with { LastStartedUtc = _time.GetUtcNow(), LastStatus = null, LastRunId = null });
        var task = Submit(job, stopping);
        return new ScheduledRun(job.Id, task);
    }

    private Task Submit(PlanJob job, CancellationToken stopping)
    {
        Status.SetJob(new JobStatus
        {
            Job = job.Id, Plan = job.Plan.Name, Origin = job.Origin, PlanFile = job.PlanPath,
            Instruments = job.Instruments, QueuedUtc = job.QueuedAt,
        });
        DaemonLog.Queued(_log, job.Id, job.Plan.Name, job.Origin, string.Join(", ", job.Instruments));
        var task = Task.Run(() => RunJobAsync(job, stopping), CancellationToken.None);
        Track(job.Id, task);
        return task;
    }

    private void Track(string key, Task task)
    {
        _jobs[key] = task;
        _ = task.ContinueWith(t => _jobs.TryRemove(new KeyValuePair<string, Task>(key, t)), CancellationToken.None,
            TaskContinuationOptions.ExecuteSynchronously, TaskScheduler.Default);
    }

    private string NextJobId() => "J" + Interlocked.Increment(ref _nextJob);
}
