using BenchRunner.Instruments.Capture;

namespace BenchRunner.Instruments.Connections;

/// <summary>A recorded session to stand in for an instrument. Defaults: strict, fast.</summary>
public sealed record ReplaySettings
{
    /// <summary>The capture file, as written (relative paths are resolved by whoever opens it).</summary>
    public required string Path { get; init; }

    /// <summary>Whether commands must match the recording; default <see cref="ReplayMode.Strict"/>.</summary>
    public ReplayMode Mode { get; init; } = ReplayMode.Strict;

    /// <summary>How fast replies come; default <see cref="ReplayPace.AsFastAsPossible"/>.</summary>
    public ReplayPace Pace { get; init; } = ReplayPace.AsFastAsPossible;
}
