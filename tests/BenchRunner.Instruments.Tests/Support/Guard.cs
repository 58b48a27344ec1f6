namespace BenchRunner.Instruments.Tests.Support;

/// <summary>Limits that keep a broken test from hanging the suite.</summary>
internal static class Guard
{
    /// <summary>The most any single await in a test may take.</summary>
    public static readonly TimeSpan Await = TimeSpan.FromSeconds(10);

    /// <summary>A generous reply timeout for exchanges expected to succeed.</summary>
    public static readonly TimeSpan Reply = TimeSpan.FromSeconds(5);
}
