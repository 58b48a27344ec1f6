using BenchRunner.Core.Quantities;

namespace BenchRunner.Instruments.Capabilities;

/// <summary>A signal generator: a CW carrier at a frequency and level, switched on or off.</summary>
public interface ISignalGenerator
{
    /// <summary>Sets the carrier frequency.</summary>
    Task SetFrequencyAsync(Frequency frequency, CancellationToken cancellationToken);

    /// <summary>Sets the output level.</summary>
    Task SetLevelAsync(Level level, CancellationToken cancellationToken);

    /// <summary>Switches the RF output on or off.</summary>
    Task SetOutputAsync(bool on, CancellationToken cancellationToken);
}
