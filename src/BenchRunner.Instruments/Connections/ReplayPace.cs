namespace BenchRunner.Instruments.Connections;

/// <summary>How fast a replayed session hands out its recorded replies.</summary>
public enum ReplayPace
{
    /// <summary>Each reply as soon as it is asked for. The default.</summary>
    Fast,

    /// <summary>With the delays seen when the session was recorded.</summary>
    Recorded,
}
