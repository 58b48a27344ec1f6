using BenchRunner.Execution.Bench;
using BenchRunner.Instruments.Errors;
using Microsoft.Extensions.Logging;
using BenchRunner.Daemon.Logging;

namespace BenchRunner.Daemon.Work;

/// <summary>
/// Keeps each bench instrument's health. An instrument that fails to answer is marked faulty and
/// tried again in the background (holding its lease for the try) with growing waits
/// (<see cref="Backoff"/>) until it answers; plans that need it wait meanwhile, while plans on
/// the other instruments carry on.
/// </summary>
public sealed class InstrumentHealthBoard
{
    private readonly Lock _lock = new();
    private readonly Dictionary<string, InstrumentHealth> _health = new(StringComparer.Ordinal);
    private readonly Dictionary<string, Task> _tries = new(StringComparer.Ordinal);
    private readonly Func<string, CancellationToken, Task> _probe;
    private readonly InstrumentLeases _leases;
    private readonly Backoff _backoff;
    private readonly TimeProvider _time;
    private readonly ILogger _log;
    private TaskCompletionSource _changed = new(TaskCreationOptions.RunContinuationsAsynchronously);

    /// <summary>Creates the board for the instruments of <paramref name="bench"/>.</summary>
    /// <param name="bench">The bench.</param>
    /// <param name="probe">Connects to the named instrument and identifies it, throwing when it does not answer; the caller holds its lease.</param>
    /// <param name="leases">The leases a background try takes.</param>
    /// <param name="backoff">The waits between tries.</param>
    /// <param name="time">The clock.</param>
    /// <param name="log">Where faults and recoveries are logged.</param>
    public InstrumentHealthBoard(BenchDefinition bench, Func<string, CancellationToken, Task> probe, InstrumentLeases leases,
        Backoff backoff, TimeProvider time, ILogger log)
    {
        ArgumentNullException.ThrowIfNull(bench);
        _probe = probe;
        _leases = leases;
        _backoff = backoff;
        _time = time;
        _log = log;
        foreach (var (name, instrument) in bench.Instruments)
        {
            _health[name] = new InstrumentHealth(name, instrument.Connection.ToString(), HealthState.Unknown, null, 0, null, null);
        }
    }

    /// <summary>Every instrument's health, in bench order.</summary>
    public IReadOnlyList<InstrumentHealth> Snapshot()
    {
        lock (_lock)
        {
            return [.. _health.Values];
        }
    }

    /// <summary>Records that <paramref name="names"/> answered (a run connected to them).</summary>
    public void ReportHealthy(IEnumerable<string> names)
    {
        foreach (var name in names)
        {
            Set(name, h => h.State == HealthState.Healthy ? h : h with { State = HealthState.Healthy, LastFault = h.LastFault, Faults = 0, NextTry = null, Since = _time.GetUtcNow() });
        }
    }

    /// <summary>
    /// Tries each of <paramref name="names"/> now (the caller holds their leases) and returns those
    /// that do not answer; these are marked faulty and tried again in the background.
    /// </summary>
    public async Task<IReadOnlyList<string>> CheckNowAsync(IReadOnlyList<string> names, CancellationToken stopping)
    {
        var failed = new List<string>();
        foreach (var name in names)
        {
            if (await TryAsync(name, stopping).ConfigureAwait(false) is { } fault)
            {
                failed.Add(name);
                MarkFaulty(name, fault, stopping);
            }
        }

        return failed;
    }

    /// <summary>Waits until none of <paramref name="names"/> is faulty.</summary>
    public async Task WaitUntilUsableAsync(IReadOnlyList<string> names, CancellationToken cancellationToken)
    {
        while (true)
        {
            Task changed;
            lock (_lock)
            {
                if (names.All(n => !_health.TryGetValue(n, out var h) || h.State != HealthState.Faulty))
                {
                    return;
                }

                changed = _changed.Task;
            }

            await changed.WaitAsync(cancellationToken).ConfigureAwait(false);
        }
    }

    /// <summary>True when any of <paramref name="names"/> is faulty now.</summary>
    public bool AnyFaulty(IEnumerable<string> names)
    {
        lock (_lock)
        {
            return names.Any(n => _health.TryGetValue(n, out var h) && h.State == HealthState.Faulty);
        }
    }

    /// <summary>Waits for the background tries to end (once the daemon's stopping token has fired).</summary>
    public Task DrainAsync()
    {
        lock (_lock)
        {
            return Task.WhenAll(_tries.Values);
        }
    }

    private void MarkFaulty(string name, string fault, CancellationToken stopping)
    {
        lock (_lock)
        {
            var before = _health[name];
            var faults = before.Faults + 1;
            var wait = _backoff.After(faults);
            _health[name] = before with
            {
                State = HealthState.Faulty, LastFault = fault, Faults = faults, NextTry = _time.GetUtcNow() + wait,
                Since = before.State == HealthState.Faulty ? before.Since : _time.GetUtcNow(),
            };
            DaemonLog.InstrumentFaulty(_log, name, fault, faults, wait.TotalSeconds);
            if (!_tries.ContainsKey(name))
            {
                _tries[name] = Task.Run(() => RetryUntilHealthyAsync(name, stopping), CancellationToken.None);
            }

            Signal();
        }
    }

    private async Task RetryUntilHealthyAsync(string name, CancellationToken stopping)
    {
        try
        {
            while (!stopping.IsCancellationRequested)
            {
                DateTimeOffset next;
                lock (_lock)
                {
                    if (_health[name].State != HealthState.Faulty)
                    {
                        return;
                    }

                    next = _health[name].NextTry ?? _time.GetUtcNow();
                }

                var wait = next - _time.GetUtcNow();
                if (wait > TimeSpan.Zero)
                {
                    await Task.Delay(wait, _time, stopping).ConfigureAwait(false);
                }

                string? fault;
                using (await _leases.AcquireAsync([name], "probe", stopping).ConfigureAwait(false))
                {
                    fault = await TryAsync(name, stopping).ConfigureAwait(false);
                }

                if (fault is null)
                {
                    DaemonLog.InstrumentBack(_log, name);
                    return;
                }

                MarkFaultyAgain(name, fault);
            }
        }
        catch (OperationCanceledException) when (stopping.IsCancellationRequested)
        {
            // The daemon is stopping; the instrument stays faulty in the last status written.
        }
        finally
        {
            lock (_lock)
            {
                _tries.Remove(name);
            }
        }
    }

    private void MarkFaultyAgain(string name, string fault)
    {
        lock (_lock)
        {
            var before = _health[name];
            var faults = before.Faults + 1;
            var wait = _backoff.After(faults);
            _health[name] = before with { LastFault = fault, Faults = faults, NextTry = _time.GetUtcNow() + wait };
            DaemonLog.InstrumentStillFaulty(_log, name, fault, faults, wait.TotalSeconds);
            Signal();
        }
    }

    private async Task<string?> TryAsync(string name, CancellationToken stopping)
    {
        try
        {
            await _probe(name, stopping).ConfigureAwait(false);
            ReportHealthy([name]);
            return null;
        }
        catch (InstrumentException e)
        {
            return e.Message;
        }
        catch (IOException e)
        {
            return e.Message;
        }
    }

    private void Set(string name, Func<InstrumentHealth, InstrumentHealth> change)
    {
        lock (_lock)
        {
            if (_health.TryGetValue(name, out var before))
            {
                _health[name] = change(before);
                Signal();
            }
        }
    }

    private void Signal()
    {
        _changed.TrySetResult();
        _changed = new TaskCompletionSource(TaskCreationOptions.RunContinuationsAsynchronously);
    }
}
