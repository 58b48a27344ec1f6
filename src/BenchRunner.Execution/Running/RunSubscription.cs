using BenchRunner.Core.Runs;
using BenchRunner.Execution.Events;

namespace BenchRunner.Execution.Running;

/// <summary>A listener and how the event pipeline feeds it.</summary>
/// <param name="Listener">The listener.</param>
/// <param name="Options">Its queue, what happens when it falls behind, whether it is essential.</param>
public sealed record RunSubscription(IRunListener Listener, RunListenerOptions Options)
{
    /// <summary>A view: fed on its own loop, the oldest events dropped when it falls behind; the run never waits for it.</summary>
    public static RunSubscription View(IRunListener listener, string name) => new(listener, RunListenerOptions.View(name));

    /// <summary>A listener that sees every event (a log); the run waits when it is a whole queue behind.</summary>
    public static RunSubscription Lossless(IRunListener listener, string name) => new(listener, RunListenerOptions.Lossless(name));
}
