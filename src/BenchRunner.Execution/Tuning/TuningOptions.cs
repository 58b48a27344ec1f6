namespace BenchRunner.Execution.Tuning;

/// <summary>How a tuning session paces itself and when it ends. Defaults in each property's description.</summary>
public sealed record TuningOptions
{
    /// <summary>The default least time between the starts of two sweeps: 0.5 s.</summary>
    public static TimeSpan DefaultInterval { get; } = TimeSpan.FromMilliseconds(500);

    /// <summary>When the response counts as settled; <see cref="SettleOptions"/> defaults when not set.</summary>
    public SettleOptions Settle { get; init; } = new();

    /// <summary>
    /// The least time from the start of one sweep to the start of the next, zero or more (zero:
    /// as fast as the instrument sweeps); <see cref="DefaultInterval"/> by default.
    /// </summary>
    public TimeSpan Interval { get; init; } = DefaultInterval;

    /// <summary>Whether the session ends by itself once settled; false by default (it runs until stopped).</summary>
    public bool StopWhenSettled { get; init; }

    /// <summary>End after this many sweeps whatever happens, at least 1; null (the default) for no limit.</summary>
    public int? MaxSweeps { get; init; }

    /// <summary>Every way in which these options are out of range; empty when they are usable.</summary>
    public IReadOnlyList<string> Validate()
    {
        var problems = new List<string>(Settle?.Validate() ?? ["the settle options are missing"]);
        if (Interval < TimeSpan.Zero)
        {
            problems.Add($"the sweep interval must be zero or more, not {Interval.TotalSeconds} s");
        }

        if (MaxSweeps is < 1)
        {
            problems.Add($"the sweep limit must be at least 1, not {MaxSweeps}");
        }

        return problems;
    }
}
