using BenchRunner.Execution.Running;

namespace BenchRunner.Daemon.Work;

/// <summary>Passes every run event to several observers, in order.</summary>
public sealed class FanOutObserver(params IRunObserver[] observers) : IRunObserver
{
    /// <inheritdoc/>
    public void OnEvent(RunEvent runEvent)
    {
        foreach (var observer in observers)
        {
            observer.OnEvent(runEvent);
        }
    }
}
