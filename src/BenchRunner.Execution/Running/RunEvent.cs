namespace BenchRunner.Execution.Running;

/// <summary>Something that happened during a run, for logs and live views. Subtypes say what.</summary>
/// <param name="At">When it happened (the runner's clock).</param>
public abstract record RunEvent(DateTimeOffset At);
