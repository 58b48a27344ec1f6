namespace BenchRunner.Instruments.Profiles;

/// <summary>Where a <see cref="ProfileInstrument"/>'s conversation stands.</summary>
public enum ProfileSessionState
{
    /// <summary>Not connected yet, or disposed.</summary>
    Disconnected,

    /// <summary>Connected and in step with the device: the next command may be sent.</summary>
    Ready,

    /// <summary>
    /// A timeout, a framing error, a cancelled exchange or an unreadable reply left the
    /// conversation out of step; every operation fails until <see cref="ProfileInstrument.ConnectAsync"/> succeeds again.
    /// </summary>
    Broken,
}
