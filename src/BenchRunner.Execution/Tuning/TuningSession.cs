using BenchRunner.Core.Figures;
using BenchRunner.Core.Traces;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Running;
using BenchRunner.Storage;
using BenchRunner.Core.Runs;

namespace BenchRunner.Execution.Tuning;

/// <summary>
/// An unattended tuning session: runs a plan's sweep and check steps again and again as one
/// <see cref="RunMode.Tuning"/> run (every sweep committed with its figures and checks), and after
/// each sweep tells the observer the figures that matter, how they moved, and whether the response
/// has settled (<see cref="SettleDetector"/>). Ends when settled (if asked), after a sweep limit
/// (if given), or when cancelled; cancelling keeps everything and marks the run stopped.
/// </summary>
public sealed class TuningSession
{
    private readonly RunLauncher _runner;
    private readonly TimeProvider _time;
    private readonly TuningOptions _options;

    /// <summary>Creates a session that sweeps through <paramref name="runner"/>.</summary>
    /// <param name="runner">The runner with its result writer.</param>
    /// <param name="options">Pacing, settling and ending; defaults when null.</param>
    /// <param name="time">The clock for pacing and settling: the runner's own clock. The system clock when null.</param>
    /// <exception cref="ArgumentException">Options out of range (every problem named).</exception>
    public TuningSession(RunLauncher runner, TuningOptions? options = null, TimeProvider? time = null)
    {
        _runner = runner ?? throw new ArgumentNullException(nameof(runner));
        _options = options ?? new TuningOptions();
        var problems = _options.Validate();
        if (problems.Count > 0)
        {
            throw new ArgumentException(string.Join("; ", problems), nameof(options));
        }

        _time = time ?? TimeProvider.System;
    }

    /// <summary>Runs the session until it ends; see the class description.</summary>
    /// <param name="plan">The plan: its steps up to the first sweep run once, the rest every sweep.</param>
    /// <param name="context">What is recorded with the run; its mode is set to <see cref="RunMode.Tuning"/>.</param>
    /// <param name="observer">Told of every sweep.</param>
    /// <param name="listeners">Told of the runner's own events (steps, sweeps, checks), or null.</param>
    /// <param name="cancellationToken">Stops the session.</param>
    public async Task<TuningOutcome> RunAsync(TestPlan plan, RunContext context, ITuningObserver observer,
        IEnumerable<RunSubscription>? listeners, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(context);
        ArgumentNullException.ThrowIfNull(observer);
        var targets = TuningTargets.From(plan);
        var detector = new SettleDetector(_options.Settle, _time);
        long started = _time.GetTimestamp();
        long passStarted = started;
        TuningPass? last = null;

        async ValueTask<bool> Again(RunPass pass, CancellationToken token)
        {
            int sweep = pass.Number;
            var traces = pass.Traces;
            var failed = pass.Checks.Where(c => !c.Passed).Select(c => c.Name).ToList();
            Trace? trace = targets.Trace is { } name && traces.TryGetValue(name, out var t) ? t.Trace : null;
            var mask = trace is not null ? targets.MaskStep?.Mask.Evaluate(trace) : null;
            var figures = targets.Figures(traces.ToDictionary(kv => kv.Key, kv => kv.Value.Figures), mask, last?.Figures);
            var settle = detector.Observe(failed.Count == 0);
            last = new TuningPass(sweep, _time.GetUtcNow(), _time.GetElapsedTime(started), trace, mask, figures, failed, settle);
            observer.OnPass(last);
            if ((_options.StopWhenSettled && settle.Settled) || sweep >= _options.MaxSweeps)
            {
                return false;
            }

            var wait = _options.Interval - _time.GetElapsedTime(passStarted);
            if (wait > TimeSpan.Zero)
            {
                await Task.Delay(wait, _time, token).ConfigureAwait(false);
            }

            passStarted = _time.GetTimestamp();
            return true;
        }

        var run = await _runner.RunRepeatedlyAsync(plan, context with { Mode = RunMode.Tuning }, listeners, Again, cancellationToken)
            .ConfigureAwait(false);
        return new TuningOutcome(run, last?.Sweep ?? 0, detector.FirstSettledAt, last?.Settle.Settled ?? false, last);
    }
}
