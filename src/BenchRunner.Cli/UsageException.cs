namespace BenchRunner.Cli;

/// <summary>
/// A mistake in how a verb was called that the argument parser cannot see (for example
/// two options that contradict each other). Reported in one line with exit code 2.
/// </summary>
public sealed class UsageException(string message) : Exception(message);
