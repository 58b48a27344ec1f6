namespace BenchRunner.Instruments.Capture;

/// <summary>How a <see cref="ReplayTransport"/> treats host writes that differ from the recording.</summary>
public enum ReplayMode
{
    /// <summary>Every byte written must match the recording; a difference is a <see cref="ReplayMismatchException"/>. The default.</summary>
    Strict,

    /// <summary>
    /// A differing write is reported to <see cref="ReplayOptions.OnMismatch"/> and stands in for
    /// the rest of the recorded chunk it was compared with; the replay carries on.
    /// </summary>
    Lenient,
}
