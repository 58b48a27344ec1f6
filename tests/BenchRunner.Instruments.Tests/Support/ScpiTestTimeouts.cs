namespace BenchRunner.Instruments.Tests.Support;

/// <summary>Bounds every await in the SCPI tests, so that a broken test fails instead of hanging.</summary>
internal static class ScpiTestTimeouts
{
    /// <summary>The most any awaited step may take.</summary>
    public static readonly TimeSpan Limit = TimeSpan.FromSeconds(10);

    public static Task Bounded(this Task task) => task.WaitAsync(Limit);

    public static Task<T> Bounded<T>(this Task<T> task) => task.WaitAsync(Limit);
}
