using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;

namespace BenchRunner.Simulator.Protocols;

/// <summary>
/// A simulated network analyser as the protocol servers drive it: plain synchronous settings, each
/// validated, and a sweep that returns the S-parameters. The servers call it one call at a time.
/// A setting refused with <see cref="ArgumentOutOfRangeException"/> (or another
/// <see cref="ArgumentException"/>) must leave every setting as it was; the servers turn the refusal
/// into the protocol's error (SCPI −222 "Data out of range", bench dialect <c>err 3</c>).
/// </summary>
public interface ISimulatedNetworkAnalyser
{
    /// <summary>Maker, model, serial number and firmware, as <c>*IDN?</c> and <c>who</c> report them.</summary>
    InstrumentIdentity Identity { get; }

    /// <summary>The values each setting accepts, with the power-on values.</summary>
    NetworkAnalyserRanges Ranges { get; }

    /// <summary>The sweep's first frequency.</summary>
    Frequency Start { get; }

    /// <summary>The sweep's last frequency.</summary>
    Frequency Stop { get; }

    /// <summary>The number of points.</summary>
    int Points { get; }

    /// <summary>The IF (receiver) bandwidth.</summary>
    Frequency IfBandwidth { get; }

    /// <summary>How many sweeps are averaged; 1 for none.</summary>
    int Averages { get; }

    /// <summary>Sets start, stop and number of points together; points lie at start + (stop − start)·i/(points − 1).</summary>
    /// <exception cref="ArgumentOutOfRangeException">A value outside <see cref="Ranges"/>, or stop not above start; nothing changes.</exception>
    void SetSweep(Frequency start, Frequency stop, int points);

    /// <summary>Sets the IF bandwidth.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside <see cref="NetworkAnalyserRanges.IfBandwidthHertz"/>; nothing changes.</exception>
    void SetIfBandwidth(Frequency bandwidth);

    /// <summary>Sets how many sweeps are averaged (1 for none).</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside <see cref="NetworkAnalyserRanges.Averages"/>; nothing changes.</exception>
    void SetAverages(int count);

    /// <summary>Returns every setting to its power-on value (<c>*RST</c>).</summary>
    void Reset();

    /// <summary>
    /// Makes one measurement with the present settings (all averaged sweeps) and returns it: a
    /// <see cref="ComplexTrace"/> for each of S11, S21, S12 and S22 on the sweep's axis.
    /// </summary>
    TraceSet Sweep();
}
