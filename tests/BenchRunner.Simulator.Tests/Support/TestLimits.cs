namespace BenchRunner.Simulator.Tests.Support;

/// <summary>How long any await in a test may take before the test fails instead of hanging.</summary>
internal static class TestLimits
{
    public static readonly TimeSpan Await = TimeSpan.FromSeconds(10);
}
