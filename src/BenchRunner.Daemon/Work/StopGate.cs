using BenchRunner.Execution.Running;

namespace BenchRunner.Daemon.Work;

/// <summary>
/// Stops a run gently: a stop asked for while a sweep (or an instrument setting) is in flight
/// takes effect when the next step begins, so the sweep is finished and committed; a stop asked
/// for during a wait or between steps takes effect at once. If the step in flight has not ended
/// within the bound, the run is cut short anyway (what was committed is kept either way).
/// Pass <see cref="Token"/> to the runner and this object as (part of) its observer.
/// </summary>
public sealed class StopGate : IRunObserver, IDisposable
{
    private readonly CancellationTokenSource _cancel = new();
    private readonly TimeProvider _time;
    private readonly Lock _lock = new();
    private ITimer? _deadline;
    private string? _stepKind;

    /// <summary>Creates the gate.</summary>
    /// <param name="time">The clock the bound is measured on.</param>
    public StopGate(TimeProvider time) => _time = time;

    /// <summary>The token to pass to the runner; it fires when the stop takes effect.</summary>
    public CancellationToken Token => _cancel.Token;

    /// <summary>Why the run is being stopped, once asked.</summary>
    public string? Reason { get; private set; }

    /// <summary>Asks for a stop, taking effect at the next step or after <paramref name="bound"/> at the latest. Only the first request counts.</summary>
    public void RequestStop(string reason, TimeSpan bound)
    {
        lock (_lock)
        {
            if (Reason is not null || _cancel.IsCancellationRequested)
            {
                return;
            }

            Reason = reason;
            // Only instrument work is waited for (the plan keywords of docs/plan-format.md); waits and checks end at once.
            if (_stepKind is not ("sweep" or "set-network-analyser" or "set-spectrum-analyser" or "set-generator"))
            {
                _cancel.Cancel();
                return;
            }

            _deadline = _time.CreateTimer(_ => Cancel(), null, bound, Timeout.InfiniteTimeSpan);
        }
    }

    /// <inheritdoc/>
    public void OnEvent(RunEvent runEvent)
    {
        if (runEvent is not StepStarted step)
        {
            return;
        }

        lock (_lock)
        {
            _stepKind = step.Kind;
            if (Reason is not null)
            {
                // The step in flight has ended; the new one starts with a stop already in force.
                _cancel.Cancel();
            }
        }
    }

    /// <inheritdoc/>
    public void Dispose()
    {
        _deadline?.Dispose();
        _cancel.Dispose();
    }

    private void Cancel()
    {
        lock (_lock)
        {
            if (!_cancel.IsCancellationRequested)
            {
                _cancel.Cancel();
            }
        }
    }
}
