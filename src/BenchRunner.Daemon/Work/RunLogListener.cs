using BenchRunner.Core.Runs;
using BenchRunner.Daemon.Logging;
using BenchRunner.Daemon.Status;
using Microsoft.Extensions.Logging;

namespace BenchRunner.Daemon.Work;

/// <summary>Logs a run's events (with its run id and instruments) and keeps the job's status entry current.</summary>
internal sealed class RunLogListener(ILogger log, PlanJob job, int attempt, StatusBoard status, TimeProvider time) : IRunListener
{
    private readonly string _instruments = string.Join(", ", job.Instruments);
    private readonly TaskCompletionSource<long?> _recorded = new(TaskCreationOptions.RunContinuationsAsynchronously);

    /// <summary>The run's id in the store, once its start is recorded.</summary>
    public long? RunId => _recorded.Task.IsCompletedSuccessfully ? _recorded.Task.Result : null;

    /// <summary>Told once whether (and as what) the run's start is stored; the log's lines wait for it, so each carries the id.</summary>
    public void Recorded(long? runId) => _recorded.TrySetResult(runId);

    /// <inheritdoc/>
    public async ValueTask OnEventAsync(RunEvent runEvent, CancellationToken cancellationToken)
    {
        var runId = await _recorded.Task.WaitAsync(cancellationToken).ConfigureAwait(false);
        switch (runEvent)
        {
            case RunStarted:
                DaemonLog.RunStarted(log, runId, job.Id, job.Plan.Name, _instruments, attempt);
                status.UpdateJob(job.Id, j => j with { StartedUtc = time.GetUtcNow(), RunId = runId, Attempt = attempt, WaitingFor = null });
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
    }
}
