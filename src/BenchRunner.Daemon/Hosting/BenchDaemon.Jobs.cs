using BenchRunner.Daemon.Inbox;
using BenchRunner.Daemon.Logging;
using BenchRunner.Daemon.Status;
using BenchRunner.Daemon.Work;
using BenchRunner.Execution.Running;
using BenchRunner.Instruments.Adapters;
using BenchRunner.Storage;
using BenchRunner.Core.Runs;

namespace BenchRunner.Daemon.Hosting;

public sealed partial class BenchDaemon
{
    /// <summary>How long one try of an instrument may take: 15 s.</summary>
    private static readonly TimeSpan ProbeTimeout = TimeSpan.FromSeconds(15);

    private async Task RunJobAsync(PlanJob job, CancellationToken stopping)
    {
        var instruments = job.Instruments;
        var names = string.Join(", ", instruments);
        try
        {
            for (int attempt = 1; ; attempt++)
            {
                InstrumentLease lease;
                while (true)
                {
                    Status.UpdateJob(job.Id, j => j with { WaitingFor = _health.AnyFaulty(instruments) ? "faulty instruments" : "instruments in use" });
                    await _health.WaitUntilUsableAsync(instruments, stopping).ConfigureAwait(false);
                    lease = await Leases.AcquireAsync(instruments, job.Id, stopping).ConfigureAwait(false);
                    if (!_health.AnyFaulty(instruments))
                    {
                        break;
                    }

                    // One of them failed while this job waited for its turn: wait again.
                    lease.Dispose();
                }

                using (lease)
                {
                    stopping.ThrowIfCancellationRequested();
                    var started = _time.GetUtcNow();
                    var (outcome, stopReason) = await ExecuteAsync(job, attempt, stopping).ConfigureAwait(false);
                    if (outcome.Status == RunStatus.Error && !stopping.IsCancellationRequested)
                    {
                        DaemonLog.RunFault(_log, outcome.RunId, names, outcome.Error ?? "unknown error");
                        var faulty = await _health.CheckNowAsync(instruments, stopping).ConfigureAwait(false);
                        if (faulty.Count > 0 && attempt < _settings.RunAttempts)
                        {
                            DaemonLog.WillRetry(_log, job.Id, job.Plan.Name, faulty, attempt + 1, _settings.RunAttempts);
                            Status.UpdateJob(job.Id, j => j with { StartedUtc = null, RunId = null, Step = null, Attempt = attempt + 1 });
                            continue;
                        }
                    }
                    else if (outcome.Status is RunStatus.Passed or RunStatus.Failed)
                    {
                        _health.ReportHealthy(instruments);
                    }

                    lease.Dispose();
                    Complete(job, outcome, started, attempt, stopReason);
                    return;
                }
            }
        }
        catch (OperationCanceledException) when (stopping.IsCancellationRequested)
        {
            // Stopped while waiting its turn: an inbox plan stays in the inbox for the next start.
            Status.RemoveJob(job.Id);
        }
        catch (Exception e)
        {
            // A fault of the daemon itself (the result file refused a write, say). The plan file is
            // left where it is and not taken again before the next start.
            DaemonLog.JobFailed(_log, job.Id, job.Plan.Name, e.Message, e);
            var finished = new FinishedJobStatus
            {
                Job = job.Id, Plan = job.Plan.Name, Origin = job.Origin, Status = "error",
                EndedUtc = _time.GetUtcNow(), Summary = e.Message,
            };
            Status.Finish(finished);
            JobFinished?.Invoke(finished);
        }
    }

    private async Task<(RunOutcome Outcome, string? StopReason)> ExecuteAsync(PlanJob job, int attempt, CancellationToken stopping)
    {
        using var gate = new StopGate(_time);
        var observer = new RunLogListener(_log, job, attempt, Status, _time);
        var names = string.Join(", ", job.Instruments);
        // Every event of the run carries the job, plan and instruments as properties in the log files.
        using var scope = _log.BeginScope(new Dictionary<string, object> { ["JobId"] = job.Id, ["Plan"] = job.Plan.Name, ["Instruments"] = names, ["Origin"] = job.Origin });
        _running[job.Id] = (gate, observer, job);
        using var stopRegistration = stopping.Register(() => gate.RequestStop("the daemon is stopping", _settings.StopWithin));
        using var limit = job.TimeLimit is { } timeLimit
            ? _time.CreateTimer(_ =>
            {
                DaemonLog.TimeLimit(_log, observer.RunId, names, timeLimit.TotalSeconds);
                gate.RequestStop($"the time limit of {timeLimit.TotalSeconds:0.###} s was reached", _settings.StopWithin);
            }, null, timeLimit, Timeout.InfiniteTimeSpan)
            : null;
        try
        {
            var runner = new RunLauncher(new PlanRunner(_bench, _transports, _time), _store);
            var context = new RunContext(job.PlanText, _benchText, _softwareVersion, Environment.MachineName)
            {
                Operator = "daemon",
                // The run records why it was stopped: the time limit or the daemon stopping, not an operator.
                StopReason = () => gate.Reason is { } reason ? $"stopped: {reason}" : null,
                StopAtNextStep = gate.AtNextStep,
                Recorded = observer.Recorded,
            };
            var outcome = await runner.RunAsync(job.Plan, context, [RunSubscription.Lossless(observer, "daemon log")], gate.Token).ConfigureAwait(false);
            return (outcome, gate.Reason);
        }
        finally
        {
            _running.TryRemove(job.Id, out _);
        }
    }

    private void Complete(PlanJob job, RunOutcome outcome, DateTimeOffset started, int attempt, string? stopReason)
    {
        var names = string.Join(", ", job.Instruments);
        var passed = outcome.Checks.Count(c => c.Passed);
        var errorText = outcome.Status == RunStatus.Stopped && stopReason is not null ? $"; stopped: {stopReason}"
            : outcome.Error is null ? "" : $"; {outcome.Error}";
        DaemonLog.RunFinished(_log, outcome.RunId, job.Plan.Name, names, RunSummary.StatusWord(outcome.Status), passed, outcome.Checks.Count, errorText);
        string? filedAs = null;
        if (job.FromInbox)
        {
            try
            {
                var summary = RunSummary.Text(job, outcome, _settings.DatabasePath, started, _time.GetUtcNow(), attempt, stopReason);
                filedAs = PlanFiler.FileAsDone(job.PlanPath, _settings.DoneFolder, summary);
                DaemonLog.Filed(_log, job.PlanPath, filedAs);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                DaemonLog.InboxTrouble(_log, _settings.InboxFolder, e.Message);
            }
            finally
            {
                // Free again: a plan dropped later under the same name is a new plan.
                _taken.TryRemove(job.PlanPath, out _);
            }
        }
        else if (job.Origin.StartsWith("schedule ", StringComparison.Ordinal))
        {
            Status.UpdateSchedule(job.Origin["schedule ".Length..], s => s with { LastStatus = RunSummary.StatusWord(outcome.Status), LastRunId = outcome.RunId });
        }

        var finished = new FinishedJobStatus
        {
            Job = job.Id, Plan = job.Plan.Name, Origin = job.Origin, RunId = outcome.RunId,
            Status = RunSummary.StatusWord(outcome.Status), EndedUtc = _time.GetUtcNow(),
            Summary = RunSummary.OneLine(outcome, stopReason), FiledAs = filedAs,
        };
        Status.Finish(finished);
        JobFinished?.Invoke(finished);
    }

    private async Task ProbeAsync(string name, CancellationToken stopping)
    {
        var declared = _bench.Instruments[name];
        using var timeout = CancellationTokenSource.CreateLinkedTokenSource(stopping);
        timeout.CancelAfter(ProbeTimeout);
        await using var instrument = InstrumentAdapterFactory.Create(name, declared.Profile, declared.Connection, _transports, time: _time);
        try
        {
            await instrument.ConnectAsync(timeout.Token).ConfigureAwait(false);
        }
        catch (OperationCanceledException) when (!stopping.IsCancellationRequested)
        {
            throw new BenchRunner.Instruments.Errors.InstrumentException($"{name}: no answer within {ProbeTimeout.TotalSeconds:0} s", isTransient: true) { Instrument = name };
        }
    }

    private async Task ProbeAtStartAsync(string name, CancellationToken stopping)
    {
        try
        {
            using var lease = await Leases.AcquireAsync([name], "probe", stopping).ConfigureAwait(false);
            await _health.CheckNowAsync([name], stopping).ConfigureAwait(false);
        }
        catch (OperationCanceledException) when (stopping.IsCancellationRequested)
        {
            // Stopping before the first try.
        }
    }

    private (long Version, DateTimeOffset At) WriteStatusIfDue(long written, DateTimeOffset lastWrite)
    {
        var version = Status.Version;
        var now = _time.GetUtcNow();
        if (version == written && now - lastWrite < Heartbeat)
        {
            return (written, lastWrite);
        }

        WriteStatus();
        return (version, now);
    }

    private void WriteStatus()
    {
        try
        {
            StatusFile.Write(_settings.StatusFile, Snapshot());
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            DaemonLog.StatusUnwritable(_log, _settings.StatusFile, e.Message);
        }
    }
}
