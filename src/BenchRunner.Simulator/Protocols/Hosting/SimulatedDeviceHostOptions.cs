namespace BenchRunner.Simulator.Protocols.Hosting;

/// <summary>How a <see cref="SimulatedDeviceHost"/> reads command lines.</summary>
public sealed class SimulatedDeviceHostOptions
{
    /// <summary>The default longest command line: 4096 bytes.</summary>
    public const int DefaultMaxLineBytes = 4096;

    /// <summary>
    /// The longest command line accepted, in bytes, without its terminator (64 bytes to 1 MiB;
    /// default 4096). A longer line is discarded up to its terminator and answered with the
    /// protocol's error, so a babbling host cannot exhaust memory.
    /// </summary>
    public int MaxLineBytes { get; init; } = DefaultMaxLineBytes;

    /// <summary>Throws <see cref="ArgumentException"/> naming every invalid setting.</summary>
    public void Validate()
    {
        if (MaxLineBytes is < 64 or > 1024 * 1024)
        {
            throw new ArgumentException($"Invalid device host options: the maximum line length must be 64 bytes to 1 MiB, not {MaxLineBytes}.");
        }
    }
}
