namespace BenchRunner.Instruments.Transports;

/// <summary>The faults a <see cref="FaultScript"/> can inject.</summary>
public enum FaultKind
{
    /// <summary>No bytes for a while, or for ever; what arrives meanwhile is delivered afterwards.</summary>
    Stall,

    /// <summary>Extra bytes in the read stream.</summary>
    Garbage,

    /// <summary>The rest of the reply is dropped (until the next write).</summary>
    Truncate,

    /// <summary>The connection goes away: reads return 0 or throw, from then on.</summary>
    Disconnect,

    /// <summary>Endless bytes of a pattern, from then on.</summary>
    Babble,
}
