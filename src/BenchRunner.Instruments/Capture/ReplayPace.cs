namespace BenchRunner.Instruments.Capture;

/// <summary>When a <see cref="ReplayTransport"/> lets the host read the recorded device bytes.</summary>
public enum ReplayPace
{
    /// <summary>As soon as the command that preceded them has been written. The default.</summary>
    AsFastAsPossible,

    /// <summary>
    /// After the delay recorded between the preceding command and each chunk of the reply,
    /// measured by the transport's <see cref="TimeProvider"/> from the write that completed the command.
    /// </summary>
    Recorded,
}
