using BenchRunner.Core.Runs;
using BenchRunner.Execution.Events;
using BenchRunner.Execution.Plans;
using BenchRunner.Storage;
using BenchRunner.Storage.Recording;

namespace BenchRunner.Execution.Running;

/// <summary>
/// Runs a plan with its listeners: an event pipeline per run, the run recorder on it when there is a
/// result writer (essential: the run ends in error if recording fails), then the caller's views and
/// logs. Returns the outcome with the run's id in the store once every listener has caught up.
/// </summary>
/// <param name="runner">The runner, for one bench.</param>
/// <param name="results">Where runs are recorded, or null to record nothing.</param>
public sealed class RunLauncher(PlanRunner runner, IResultWriter? results)
{
    /// <summary>The runner.</summary>
    public PlanRunner Runner { get; } = runner ?? throw new ArgumentNullException(nameof(runner));

    /// <summary>Runs <paramref name="plan"/> once; see <see cref="PlanRunner.RunAsync"/>.</summary>
    public Task<RunOutcome> RunAsync(TestPlan plan, RunContext context, IEnumerable<RunSubscription>? listeners, CancellationToken cancellationToken) =>
        LaunchAsync(context, listeners, events => Runner.RunAsync(plan, context, events, cancellationToken));

    /// <summary>Runs <paramref name="plan"/> pass after pass; see <see cref="PlanRunner.RunRepeatedlyAsync"/>.</summary>
    public Task<RunOutcome> RunRepeatedlyAsync(TestPlan plan, RunContext context, IEnumerable<RunSubscription>? listeners,
        Func<RunPass, CancellationToken, ValueTask<bool>> again, CancellationToken cancellationToken) =>
        LaunchAsync(context, listeners, events => Runner.RunRepeatedlyAsync(plan, context, events, again, cancellationToken));

    private async Task<RunOutcome> LaunchAsync(RunContext context, IEnumerable<RunSubscription>? listeners, Func<RunEventPipeline, Task<RunOutcome>> run)
    {
        await using var events = new RunEventPipeline();
        RunRecorder? recorder = null;
        if (results is not null)
        {
            recorder = new RunRecorder(results);
            if (context.Recorded is { } told)
            {
                _ = recorder.RunId.ContinueWith(t => told(t.IsCompletedSuccessfully ? t.Result : null), CancellationToken.None,
                    TaskContinuationOptions.ExecuteSynchronously, TaskScheduler.Default);
            }

            events.Subscribe(recorder, RunListenerOptions.Recorder());
        }
        else
        {
            context.Recorded?.Invoke(null);
        }

        foreach (var subscription in listeners ?? [])
        {
            events.Subscribe(subscription.Listener, subscription.Options);
        }

        var outcome = await run(events).ConfigureAwait(false);
        try
        {
            await events.CompleteAsync().ConfigureAwait(false);
        }
        catch (RunListenerFailedException ex)
        {
            outcome = outcome with { Status = RunStatus.Error, Error = outcome.Error ?? ex.Message };
        }

        return outcome with { RunId = recorder?.RunIdIfKnown };
    }
}
