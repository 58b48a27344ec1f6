namespace BenchRunner.Core.Runs;

/// <summary>
/// Something that happened during a run. The runner emits these and writes nothing itself: the run
/// recorder turns them into stored rows, views and logs show them. Subtypes say what happened.
/// </summary>
/// <param name="At">When it happened (the runner's clock).</param>
public abstract record RunEvent(DateTimeOffset At);
