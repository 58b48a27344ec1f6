using BenchRunner.Daemon.Logging;
using BenchRunner.Daemon.Status;
using BenchRunner.Execution.Running;
using Microsoft.Extensions.Logging;

namespace BenchRunner.Daemon.Work;

/// <summary>Logs a run's events (with its run id and instruments) and keeps the job's status entry current.</summary>
internal sealed class RunLogObserver(ILogger log, PlanJob job, int attempt, StatusBoard status, TimeProvider time) : IRunObserver
{
    private readonly string _instruments = string.Join(", ", job.Instruments);

    /// <summary>The run's id, once it has started (null when nothing is recorded).</summary>
    public long? RunId { get; private set; }

    public void OnEvent(RunEvent runEvent)
    {
        switch (runEvent)
        {
            case RunStarted started:
                RunId = started.RunId;
                DaemonLog.RunStarted(log, started.RunId, job.Id, job.Plan.Name, _instruments, attempt);
                status.UpdateJob(job.Id, j => j with { StartedUtc = time.GetUtcNow(), RunId = started.RunId, Attempt = attempt, WaitingFor = null });
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
