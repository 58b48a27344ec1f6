namespace BenchRunner.Execution.Tuning;

/// <summary>Receives each sweep of a tuning session as it completes (a live view, a log, a test).</summary>
public interface ITuningObserver
{
    /// <summary>Called once per sweep, in order, on the session's thread; keep it quick.</summary>
    void OnPass(TuningPass pass);
}
