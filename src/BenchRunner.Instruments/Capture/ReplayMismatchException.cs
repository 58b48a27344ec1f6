using BenchRunner.Instruments.Errors;

namespace BenchRunner.Instruments.Capture;

/// <summary>
/// In strict replay, the host wrote something other than what the recording holds, or wrote
/// after the recording ended. Not transient: the same write would differ again.
/// </summary>
public sealed class ReplayMismatchException : InstrumentException
{
    /// <summary>Creates the exception for <paramref name="mismatch"/>.</summary>
    public ReplayMismatchException(ReplayMismatch mismatch)
        : base($"replay mismatch: {mismatch?.Description}", isTransient: false)
    {
        ArgumentNullException.ThrowIfNull(mismatch);
        Mismatch = mismatch;
    }

    /// <summary>Where and how the write differed.</summary>
    public ReplayMismatch Mismatch { get; }
}
