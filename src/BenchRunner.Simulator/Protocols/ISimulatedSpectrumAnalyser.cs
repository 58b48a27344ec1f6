using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;

namespace BenchRunner.Simulator.Protocols;

/// <summary>
/// A simulated spectrum analyser as the protocol servers drive it: plain synchronous settings, each
/// validated, and a sweep that returns a power trace. The servers call it one call at a time.
/// A setting refused with <see cref="ArgumentOutOfRangeException"/> (or another
/// <see cref="ArgumentException"/>) must leave every setting as it was; the servers turn the refusal
/// into the protocol's error (SCPI −222 "Data out of range", bench dialect <c>err 3</c>).
/// Centre and span are derived from start and stop by the servers.
/// </summary>
public interface ISimulatedSpectrumAnalyser
{
    /// <summary>Maker, model, serial number and firmware, as <c>*IDN?</c> and <c>who</c> report them.</summary>
    InstrumentIdentity Identity { get; }

    /// <summary>The values each setting accepts, with the power-on values.</summary>
    SpectrumAnalyserRanges Ranges { get; }

    /// <summary>The span's first frequency.</summary>
    Frequency Start { get; }

    /// <summary>The span's last frequency.</summary>
    Frequency Stop { get; }

    /// <summary>The number of trace points.</summary>
    int Points { get; }

    /// <summary>The resolution bandwidth (RBW).</summary>
    Frequency ResolutionBandwidth { get; }

    /// <summary>The input attenuation.</summary>
    Ratio InputAttenuation { get; }

    /// <summary>The reference level.</summary>
    Level ReferenceLevel { get; }

    /// <summary>Sets the span's start and stop together.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside <see cref="Ranges"/>, or stop not above start; nothing changes.</exception>
    void SetSpan(Frequency start, Frequency stop);

    /// <summary>Sets the number of trace points; they lie at start + (stop − start)·i/(points − 1).</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside <see cref="SpectrumAnalyserRanges.Points"/>; nothing changes.</exception>
    void SetPoints(int points);

    /// <summary>Sets the resolution bandwidth.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside <see cref="SpectrumAnalyserRanges.ResolutionBandwidthHertz"/>; nothing changes.</exception>
    void SetResolutionBandwidth(Frequency bandwidth);

    /// <summary>Sets the input attenuation.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside <see cref="SpectrumAnalyserRanges.InputAttenuationDb"/>; nothing changes.</exception>
    void SetInputAttenuation(Ratio attenuation);

    /// <summary>Sets the reference level.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside <see cref="SpectrumAnalyserRanges.ReferenceLevelDbm"/>; nothing changes.</exception>
    void SetReferenceLevel(Level level);

    /// <summary>Returns every setting to its power-on value (<c>*RST</c>).</summary>
    void Reset();

    /// <summary>Makes one sweep with the present settings and returns its levels in dBm, one per point.</summary>
    PowerTrace Sweep();
}
