namespace BenchRunner.Core.Statistics;

/// <summary>How often one check failed across a lot.</summary>
/// <param name="CheckName">The check's name.</param>
/// <param name="Failures">How many tests it failed in (retests count again).</param>
public sealed record CheckFailureCount(string CheckName, int Failures);
