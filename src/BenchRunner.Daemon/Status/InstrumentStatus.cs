namespace BenchRunner.Daemon.Status;

/// <summary>One bench instrument, as the status file shows it.</summary>
public sealed record InstrumentStatus
{
    /// <summary>Its name on the bench.</summary>
    public required string Name { get; init; }

    /// <summary>Where it is reached.</summary>
    public required string Connection { get; init; }

    /// <summary><c>healthy</c>, <c>faulty</c> or <c>unknown</c> (not tried yet).</summary>
    public required string Health { get; init; }

    /// <summary>The job (or <c>probe</c>) using it now, or null when free.</summary>
    public string? InUseBy { get; init; }

    /// <summary>What went wrong the last time it failed.</summary>
    public string? LastFault { get; init; }

    /// <summary>How many tries in a row have failed.</summary>
    public int Faults { get; init; }

    /// <summary>When a faulty instrument is tried next.</summary>
    public DateTimeOffset? NextTryUtc { get; init; }

    /// <summary>Since when it has been in its present health.</summary>
    public DateTimeOffset? SinceUtc { get; init; }
}
