using BenchRunner.Execution.Running;
using BenchRunner.Core.Runs;

namespace BenchRunner.Execution.Tests.Support;

/// <summary>A run observer that keeps every event it is told, in order.</summary>
internal sealed class CollectingObserver : IRunObserver
{
    public List<RunEvent> Events { get; } = [];

    public void OnEvent(RunEvent runEvent) => Events.Add(runEvent);
}
