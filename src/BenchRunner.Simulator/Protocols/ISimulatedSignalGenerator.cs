using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Capabilities;

namespace BenchRunner.Simulator.Protocols;

/// <summary>
/// A simulated signal generator as the protocol servers drive it: plain synchronous settings, each
/// validated. The servers call it one call at a time. A setting refused with
/// <see cref="ArgumentOutOfRangeException"/> (or another <see cref="ArgumentException"/>) must
/// leave every setting as it was; the servers turn the refusal into the protocol's error (SCPI −222
/// "Data out of range", bench dialect <c>err 3</c>).
/// </summary>
public interface ISimulatedSignalGenerator
{
    /// <summary>Maker, model, serial number and firmware, as <c>*IDN?</c> and <c>who</c> report them.</summary>
    InstrumentIdentity Identity { get; }

    /// <summary>The values each setting accepts, with the power-on values.</summary>
    SignalGeneratorRanges Ranges { get; }

    /// <summary>The carrier frequency.</summary>
    Frequency Frequency { get; }

    /// <summary>The output level (what the output delivers when it is on).</summary>
    Level Level { get; }

    /// <summary>Whether the RF output is on. Off at power-on and after a reset.</summary>
    bool OutputOn { get; }

    /// <summary>Sets the carrier frequency.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside <see cref="SignalGeneratorRanges.FrequencyHertz"/>; nothing changes.</exception>
    void SetFrequency(Frequency frequency);

    /// <summary>Sets the output level.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside <see cref="SignalGeneratorRanges.LevelDbm"/>; nothing changes.</exception>
    void SetLevel(Level level);

    /// <summary>Switches the RF output on or off.</summary>
    void SetOutput(bool on);

    /// <summary>Returns every setting to its power-on value (<c>*RST</c>): the output off, the lowest level.</summary>
    void Reset();
}
