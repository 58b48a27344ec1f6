namespace BenchRunner.Core.Runs;

/// <summary>The run began; its instruments are about to be connected.</summary>
/// <param name="At">When.</param>
/// <param name="Run">What the run is.</param>
public sealed record RunStarted(DateTimeOffset At, RunHeader Run) : RunEvent(At)
{
    /// <summary>The plan's name.</summary>
    public string PlanName => Run.PlanName;
}
