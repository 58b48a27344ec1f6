namespace BenchRunner.Execution.Running;

/// <summary>An observer that ignores every event.</summary>
internal sealed class NullObserver : IRunObserver
{
    public static readonly NullObserver Instance = new();

    public void OnEvent(RunEvent runEvent)
    {
    }
}
