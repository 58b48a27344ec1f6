namespace BenchRunner.Instruments.Errors;

/// <summary>
/// The instrument has failed so often in a row that it is not being asked for a while (its
/// circuit breaker is open). Transient: it is asked again after <see cref="RetryAfter"/>.
/// </summary>
public sealed class InstrumentUnavailableException(string message, TimeSpan retryAfter, Exception? inner = null)
    : InstrumentException(message, isTransient: true, inner)
{
    /// <summary>How long until the instrument is asked again.</summary>
    public TimeSpan RetryAfter { get; } = retryAfter;
}
