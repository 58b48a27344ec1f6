using BenchRunner.Core.Runs;
using BenchRunner.Daemon.Logging;
using BenchRunner.Daemon.Status;
using Microsoft.Extensions.Logging;

namespace BenchRunner.Daemon.Work;

/// <summary>Logs a run's events (with its run id and instruments) and keeps the job's status entry current.</summary>
internal sealed class RunLogListener(ILogger log, PlanJob job, int attempt, StatusBoard status, TimeProvider time) : IRunListener
{
    private readonly string _instruments = string.Join(", ", job.Instruments);
    private long _runId = -1;

    /// <summary>The run's id in the store, once its start is recorded.</summary>
    public long? RunId => Interlocked.Read(ref _runId) is >= 0 and var id ? id : null;

    /// <summary>Told by the recorder that the run's start is stored: logs the start with its id.</summary>
    public void Recorded(long runId)
    {
        Interlocked.Exchange(ref _runId, runId);
        DaemonLog.RunStarted(log, runId, job.Id, job.Plan.Name, _instruments, attempt);
        status.UpdateJob(job.Id, j => j with { RunId = runId });
    }

    /// <inheritdoc/>
    public ValueTask OnEventAsync(RunEvent runEvent, CancellationToken cancellationToken)
    {
        switch (runEvent)
        {
            case RunStarted:
                status.UpdateJob(job.Id, j => j with { StartedUtc = time.GetUtcNow(), Attempt = attempt, WaitingFor = null });
                break;
            case StepStarted step:
                status.UpdateJob(job.Id, j => j with { Step = step.Step });
                break;
            case SweepAcquired sweep:
                DaemonLog.SweepStored(log, RunId, _instruments, sweep.TraceName, sweep.Role, sweep.Trace.Quantity.ToString(), sweep.Trace.Count);
                break;
            case CheckCompleted check:
                DaemonLog.CheckVerdict(log, RunId, _instruments, check.Result.Name, check.Result.Passed ? "passed" : "FAILED", check.Result.Detail);
                break;
            case OperatorMessage message:
                DaemonLog.OperatorMessage(log, RunId, _instruments, message.Text);
                break;
        }

        return ValueTask.CompletedTask;
    }
}
