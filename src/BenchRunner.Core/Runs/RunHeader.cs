namespace BenchRunner.Core.Runs;

/// <summary>What is known of a run when it starts: what it runs, where, for whom.</summary>
/// <param name="Mode">Single, tuning or batch.</param>
/// <param name="PlanName">The plan's name.</param>
/// <param name="PlanText">The exact plan text that was parsed and run.</param>
/// <param name="SoftwareVersion">BenchRunner's version.</param>
/// <param name="Host">The computer's name.</param>
public sealed record RunHeader(RunMode Mode, string PlanName, string PlanText, string SoftwareVersion, string Host)
{
    /// <summary>The bench's name.</summary>
    public string? BenchName { get; init; }

    /// <summary>The exact bench text that was parsed.</summary>
    public string? BenchText { get; init; }

    /// <summary>Who ran it.</summary>
    public string? Operator { get; init; }

    /// <summary>The board's serial number.</summary>
    public string? DutSerial { get; init; }

    /// <summary>The lot the board belongs to.</summary>
    public string? Lot { get; init; }

    /// <summary>Whether the board was tested before.</summary>
    public bool IsRetest { get; init; }

    /// <summary>The plan's limits (figure limits and masks as judged) as JSON, or null.</summary>
    public string? LimitsJson { get; init; }
}
