using BenchRunner.Core.Runs;
namespace BenchRunner.Storage;

/// <summary>Which runs <see cref="IResultReader.ListRunsAsync"/> returns; every condition given must hold. The default matches all runs.</summary>
public sealed record RunFilter
{
    /// <summary>Only runs of this device serial (exact match).</summary>
    public string? DutSerial { get; init; }

    /// <summary>Only runs of this lot (exact match).</summary>
    public string? Lot { get; init; }

    /// <summary>Only runs with this status.</summary>
    public RunStatus? Status { get; init; }

    /// <summary>Only runs of this mode.</summary>
    public RunMode? Mode { get; init; }

    /// <summary>Only runs started at or after this time (inclusive, compared in whole milliseconds as stored).</summary>
    public DateTimeOffset? Since { get; init; }

    /// <summary>At most this many runs, newest first; null for no limit (the default). Must be positive.</summary>
    public int? Limit { get; init; }
}
