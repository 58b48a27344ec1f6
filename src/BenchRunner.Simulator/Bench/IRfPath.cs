using BenchRunner.Core.Quantities;

namespace BenchRunner.Simulator.Bench;

/// <summary>
/// Whatever lies between the generator's output and the analyser's input: cables, attenuators,
/// the device under test. A single-tone model: each emission passes on its own, at its centre frequency.
/// </summary>
public interface IRfPath
{
    /// <summary>The level coming out for <paramref name="input"/> going in at <paramref name="frequency"/>.</summary>
    Level Output(Frequency frequency, Level input);
}
