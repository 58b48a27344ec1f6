namespace BenchRunner.Execution.Tuning;

/// <summary>
/// When a tuning session counts as settled: every check of the pass inside its limits for at
/// least <see cref="Sweeps"/> consecutive sweeps, held for at least <see cref="MinimumTime"/>.
/// Defaults in each property's description.
/// </summary>
public sealed record SettleOptions
{
    /// <summary>The default number of consecutive sweeps inside the target: 5.</summary>
    public const int DefaultSweeps = 5;

    /// <summary>The default least time the response must stay inside: 3 s.</summary>
    public static TimeSpan DefaultMinimumTime { get; } = TimeSpan.FromSeconds(3);

    /// <summary>How many consecutive sweeps must be inside, at least 1; <see cref="DefaultSweeps"/> by default.</summary>
    public int Sweeps { get; init; } = DefaultSweeps;

    /// <summary>
    /// The least time from the first sweep of the inside streak to the current sweep, zero or more;
    /// <see cref="DefaultMinimumTime"/> by default.
    /// </summary>
    public TimeSpan MinimumTime { get; init; } = DefaultMinimumTime;

    /// <summary>Every way in which these options are out of range; empty when they are usable.</summary>
    public IReadOnlyList<string> Validate()
    {
        var problems = new List<string>();
        if (Sweeps < 1)
        {
            problems.Add($"the settle count must be at least 1 sweep, not {Sweeps}");
        }

        if (MinimumTime < TimeSpan.Zero)
        {
            problems.Add($"the settle time must be zero or more, not {MinimumTime.TotalSeconds} s");
        }

        return problems;
    }
}
