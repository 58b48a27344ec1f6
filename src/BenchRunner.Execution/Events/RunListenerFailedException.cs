namespace BenchRunner.Execution.Events;

/// <summary>An essential listener (the run recorder) failed, so the run cannot go on.</summary>
public sealed class RunListenerFailedException : Exception
{
    /// <summary>Creates the exception.</summary>
    /// <param name="listener">The listener's name.</param>
    /// <param name="innerException">What it failed with.</param>
    public RunListenerFailedException(string listener, Exception innerException)
        : base($"the {listener} failed: {innerException.Message}", innerException)
    {
        Listener = listener;
    }

    /// <summary>The failed listener's name.</summary>
    public string Listener { get; }
}
