namespace BenchRunner.Core.Runs;

/// <summary>
/// Receives a run's events in order, on its own loop (the run recorder, a terminal view, a log, a
/// live page). The runner never waits for a listener to finish handling an event; what happens when
/// a listener falls behind is chosen when it subscribes to the event pipeline.
/// </summary>
public interface IRunListener
{
    /// <summary>Handles one event. Events arrive one at a time, in the order they happened.</summary>
    ValueTask OnEventAsync(RunEvent runEvent, CancellationToken cancellationToken);
}
