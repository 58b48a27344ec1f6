namespace BenchRunner.Execution.Events;

/// <summary>How one listener fared: what it was given, what it lost, and how it failed.</summary>
/// <param name="Name">The listener's name.</param>
/// <param name="Delivered">Events it handled.</param>
/// <param name="Dropped">Events dropped because it was behind (only with <see cref="WhenBehind.DropOldest"/>).</param>
/// <param name="Fault">What it failed with, or null.</param>
public sealed record ListenerReport(string Name, long Delivered, long Dropped, Exception? Fault);
