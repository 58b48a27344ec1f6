namespace BenchRunner.Execution.Running;

/// <summary>Receives a run's events as they happen (a log, a live view, a test's collector).</summary>
public interface IRunObserver
{
    /// <summary>Called for each event, in order, on the runner's thread; keep it quick.</summary>
    void OnEvent(RunEvent runEvent);
}
