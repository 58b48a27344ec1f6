namespace BenchRunner.Instruments.Resilience;

/// <summary>
/// How hard BenchRunner tries with one instrument. Defaults: 5 s per setting or query, 60 s per
/// sweep, 2 retries of an idempotent operation after a transient failure (200 ms, then 400 ms,
/// reconnecting first), and a circuit breaker that stops asking for 30 s once, within 60 s,
/// at least 6 attempts were made and at least 80 % of them failed.
/// </summary>
public sealed class InstrumentResilienceOptions
{
    /// <summary>Time allowed for one setting or query, retries not included. Default 5 s (10 ms to 10 min).</summary>
    public TimeSpan OperationTimeout { get; init; } = TimeSpan.FromSeconds(5);

    /// <summary>Time allowed for one sweep including its data transfer. Default 60 s (10 ms to 1 h).</summary>
    public TimeSpan SweepTimeout { get; init; } = TimeSpan.FromSeconds(60);

    /// <summary>Retries of an idempotent operation after a transient failure. Default 2 (0 to 10).</summary>
    public int RetryAttempts { get; init; } = 2;

    /// <summary>The first retry's delay; each further retry doubles it. Default 200 ms (0 to 1 min).</summary>
    public TimeSpan RetryBaseDelay { get; init; } = TimeSpan.FromMilliseconds(200);

    /// <summary>The share of failed attempts within <see cref="BreakerSamplingDuration"/> that opens the breaker. Default 0.8 (0.1 to 1).</summary>
    public double BreakerFailureRatio { get; init; } = 0.8;

    /// <summary>The fewest attempts within <see cref="BreakerSamplingDuration"/> before the breaker may open. Default 6 (2 to 1000).</summary>
    public int BreakerMinimumThroughput { get; init; } = 6;

    /// <summary>The window in which failures are counted. Default 60 s (0.5 s to 1 day).</summary>
    public TimeSpan BreakerSamplingDuration { get; init; } = TimeSpan.FromSeconds(60);

    /// <summary>How long the breaker stays open before one trial operation is let through. Default 30 s (0.5 s to 1 day).</summary>
    public TimeSpan BreakDuration { get; init; } = TimeSpan.FromSeconds(30);

    /// <summary>Throws <see cref="ArgumentException"/> listing every setting out of range.</summary>
    public void Validate()
    {
        var problems = new List<string>();
        Check(OperationTimeout, TimeSpan.FromMilliseconds(10), TimeSpan.FromMinutes(10), nameof(OperationTimeout));
        Check(SweepTimeout, TimeSpan.FromMilliseconds(10), TimeSpan.FromHours(1), nameof(SweepTimeout));
        Check(RetryBaseDelay, TimeSpan.Zero, TimeSpan.FromMinutes(1), nameof(RetryBaseDelay));
        Check(BreakerSamplingDuration, TimeSpan.FromMilliseconds(500), TimeSpan.FromDays(1), nameof(BreakerSamplingDuration));
        Check(BreakDuration, TimeSpan.FromMilliseconds(500), TimeSpan.FromDays(1), nameof(BreakDuration));
        if (!(BreakerFailureRatio >= 0.1 && BreakerFailureRatio <= 1)) problems.Add($"{nameof(BreakerFailureRatio)} must be 0.1 to 1 (is {BreakerFailureRatio})");
        if (RetryAttempts is < 0 or > 10) problems.Add($"{nameof(RetryAttempts)} must be 0 to 10 (is {RetryAttempts})");
        if (BreakerMinimumThroughput is < 2 or > 1000) problems.Add($"{nameof(BreakerMinimumThroughput)} must be 2 to 1000 (is {BreakerMinimumThroughput})");
        if (problems.Count > 0)
        {
            throw new ArgumentException("Invalid resilience options: " + string.Join("; ", problems) + ".");
        }

        void Check(TimeSpan value, TimeSpan min, TimeSpan max, string name)
        {
            if (value < min || value > max) problems.Add($"{name} must be {min} to {max} (is {value})");
        }
    }
}
