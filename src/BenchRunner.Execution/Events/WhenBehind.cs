namespace BenchRunner.Execution.Events;

/// <summary>What the event pipeline does when a listener's queue is full.</summary>
public enum WhenBehind
{
    /// <summary>The runner waits until the listener has taken an event: nothing is lost (the recorder).</summary>
    Wait,

    /// <summary>The oldest queued event is dropped and counted: the runner never waits (views, which show the newest).</summary>
    DropOldest,
}
