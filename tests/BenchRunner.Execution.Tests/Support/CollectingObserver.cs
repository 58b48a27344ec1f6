using System.Collections;
using BenchRunner.Core.Runs;
using BenchRunner.Execution.Running;

namespace BenchRunner.Execution.Tests.Support;

/// <summary>
/// A run listener that keeps every event it is told, in order. It is also its own subscription list
/// (lossless), so a test passes it wherever the runner takes listeners.
/// </summary>
internal sealed class CollectingObserver : IRunListener, IEnumerable<RunSubscription>
{
    private readonly List<RunEvent> _events = [];

    /// <summary>The events so far (a copy).</summary>
    public List<RunEvent> Events
    {
        get
        {
            lock (_events)
            {
                return [.. _events];
            }
        }
    }

    public ValueTask OnEventAsync(RunEvent runEvent, CancellationToken cancellationToken)
    {
        lock (_events)
        {
            _events.Add(runEvent);
        }

        return ValueTask.CompletedTask;
    }

    public IEnumerator<RunSubscription> GetEnumerator()
    {
        yield return RunSubscription.Lossless(this, "test collector");
    }

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();
}
