using BenchRunner.Execution.Plans;

namespace BenchRunner.Daemon.Work;

/// <summary>A plan the daemon has accepted to run: from the inbox, or due on a schedule.</summary>
public sealed record PlanJob
{
    /// <summary>The daemon's id for it (<c>J1</c>, <c>J2</c>...).</summary>
    public required string Id { get; init; }

    /// <summary><c>inbox</c> or <c>schedule NAME</c>.</summary>
    public required string Origin { get; init; }

    /// <summary>The plan file (in the inbox while queued and running, for inbox plans).</summary>
    public required string PlanPath { get; init; }

    /// <summary>The plan file's text as read when accepted; recorded with the run.</summary>
    public required string PlanText { get; init; }

    /// <summary>The plan, checked against the bench.</summary>
    public required TestPlan Plan { get; init; }

    /// <summary>How long the run may take, or null for no limit.</summary>
    public TimeSpan? TimeLimit { get; init; }

    /// <summary>When it was accepted.</summary>
    public required DateTimeOffset QueuedAt { get; init; }

    /// <summary>True for a plan dropped in the inbox (moved to done when finished).</summary>
    public bool FromInbox => Origin == InboxOrigin;

    /// <summary>The bench instruments the plan uses (its roles), sorted.</summary>
    public IReadOnlyList<string> Instruments => [.. Plan.Roles.Select(r => r.Role).Distinct(StringComparer.Ordinal).Order(StringComparer.Ordinal)];

    /// <summary>The origin of inbox plans.</summary>
    public const string InboxOrigin = "inbox";
}
