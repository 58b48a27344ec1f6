namespace BenchRunner.Daemon.Work;

/// <summary>
/// Stops a run gently: a stop takes effect when the next step begins, so a step that drives an
/// instrument (a sweep, a setting, an overload check) is finished and committed, while a wait or
/// any other step ends at once — the runner decides which by the step's kind. If the step in flight
/// has not ended within the bound, the run is cut short anyway (what was committed is kept).
/// Pass <see cref="Token"/> to the runner and <see cref="AtNextStep"/> as the run's
/// <c>RunContext.StopAtNextStep</c>.
/// </summary>
public sealed class StopGate : IDisposable
{
    private readonly CancellationTokenSource _gentle = new();
    private readonly CancellationTokenSource _cut = new();
    private readonly TimeProvider _time;
    private readonly Lock _lock = new();
    private ITimer? _deadline;

    /// <summary>Creates the gate.</summary>
    /// <param name="time">The clock the bound is measured on.</param>
    public StopGate(TimeProvider time) => _time = time;

    /// <summary>The token to pass to the runner: it fires when the bound of a requested stop has passed.</summary>
    public CancellationToken Token => _cut.Token;

    /// <summary>Fires as soon as a stop is requested: the run stops at its next step.</summary>
    public CancellationToken AtNextStep => _gentle.Token;

    /// <summary>Why the run is being stopped, once asked.</summary>
    public string? Reason { get; private set; }

    /// <summary>Asks for a stop, taking effect at the next step or after <paramref name="bound"/> at the latest. Only the first request counts.</summary>
    public void RequestStop(string reason, TimeSpan bound)
    {
        lock (_lock)
        {
            if (Reason is not null)
            {
                return;
            }

            Reason = reason;
            _deadline = _time.CreateTimer(_ => Cut(), null, bound, Timeout.InfiniteTimeSpan);
        }

        _gentle.Cancel();
    }

    /// <inheritdoc/>
    public void Dispose()
    {
        lock (_lock)
        {
            _deadline?.Dispose();
        }

        _gentle.Dispose();
        _cut.Dispose();
    }

    private void Cut()
    {
        lock (_lock)
        {
            if (!_cut.IsCancellationRequested)
            {
                _cut.Cancel();
            }
        }
    }
}
