namespace BenchRunner.Execution.Events;

/// <summary>How one listener is fed by the <see cref="RunEventPipeline"/>.</summary>
public sealed record RunListenerOptions
{
    /// <summary>The default queue length: 256 events.</summary>
    public const int DefaultCapacity = 256;

    /// <summary>The listener's name, for messages (e.g. <c>result recorder</c>).</summary>
    public string Name { get; init; } = "listener";

    /// <summary>How many events may wait for the listener; 1 to 1 000 000, <see cref="DefaultCapacity"/> by default.</summary>
    public int Capacity { get; init; } = DefaultCapacity;

    /// <summary>What happens when the queue is full; <see cref="WhenBehind.DropOldest"/> by default.</summary>
    public WhenBehind WhenBehind { get; init; } = WhenBehind.DropOldest;

    /// <summary>
    /// When true, the run cannot go on without this listener: if it fails, the next event the runner
    /// publishes raises <see cref="RunListenerFailedException"/> and the run ends in error. An
    /// essential listener is always fed with <see cref="WhenBehind.Wait"/>. False by default: a failing
    /// listener is detached, its failure noted, and the run goes on.
    /// </summary>
    public bool Essential { get; init; }

    /// <summary>Options for a view: drops the oldest events when behind, never essential.</summary>
    public static RunListenerOptions View(string name, int capacity = DefaultCapacity) =>
        new() { Name = name, Capacity = capacity, WhenBehind = WhenBehind.DropOldest };

    /// <summary>Options for a listener that must see every event and may slow the run down to do so (a log).</summary>
    public static RunListenerOptions Lossless(string name, int capacity = DefaultCapacity) =>
        new() { Name = name, Capacity = capacity, WhenBehind = WhenBehind.Wait };

    /// <summary>Options for the run recorder: every event, and the run ends in error if recording fails.</summary>
    public static RunListenerOptions Recorder(string name = "result recorder", int capacity = DefaultCapacity) =>
        new() { Name = name, Capacity = capacity, WhenBehind = WhenBehind.Wait, Essential = true };

    internal IReadOnlyList<string> Problems()
    {
        var problems = new List<string>();
        if (Capacity is < 1 or > 1_000_000)
        {
            problems.Add($"{Name}: the capacity must be 1 to 1000000 events, not {Capacity}");
        }

        if (string.IsNullOrWhiteSpace(Name))
        {
            problems.Add("a listener needs a name");
        }

        return problems;
    }
}
