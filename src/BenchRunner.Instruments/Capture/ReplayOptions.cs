namespace BenchRunner.Instruments.Capture;

/// <summary>How a <see cref="ReplayTransport"/> serves a recording. Defaults: strict, as fast as possible, no callback.</summary>
public sealed class ReplayOptions
{
    /// <summary>Strict (default) or lenient comparison of host writes with the recording.</summary>
    public ReplayMode Mode { get; init; } = ReplayMode.Strict;

    /// <summary>As fast as possible (default) or at the recorded pace.</summary>
    public ReplayPace Pace { get; init; } = ReplayPace.AsFastAsPossible;

    /// <summary>
    /// Told of every differing write in lenient mode (including writes after the recording has
    /// ended); not called in strict mode, where the mismatch is thrown instead. Null by default.
    /// Called on the writing thread, outside the transport's lock.
    /// </summary>
    public Action<ReplayMismatch>? OnMismatch { get; init; }

    /// <summary>Throws <see cref="ArgumentException"/> naming every invalid setting.</summary>
    public void Validate()
    {
        var problems = new List<string>();
        if (!Enum.IsDefined(Mode)) problems.Add($"unknown replay mode {(int)Mode}");
        if (!Enum.IsDefined(Pace)) problems.Add($"unknown replay pace {(int)Pace}");
        if (problems.Count > 0)
        {
            throw new ArgumentException("Invalid replay options: " + string.Join("; ", problems) + ".");
        }
    }
}
