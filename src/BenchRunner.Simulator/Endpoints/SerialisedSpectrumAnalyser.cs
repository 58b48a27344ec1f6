using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Simulator.Protocols;

namespace BenchRunner.Simulator.Endpoints;

/// <summary>Lets several endpoints share one spectrum analyser model: every call holds the bench's lock.</summary>
internal sealed class SerialisedSpectrumAnalyser(ISimulatedSpectrumAnalyser inner, object gate) : ISimulatedSpectrumAnalyser
{
    public InstrumentIdentity Identity => inner.Identity;

    public SpectrumAnalyserRanges Ranges => inner.Ranges;

    public Frequency Start { get { lock (gate) return inner.Start; } }

    public Frequency Stop { get { lock (gate) return inner.Stop; } }

    public int Points { get { lock (gate) return inner.Points; } }

    public Frequency ResolutionBandwidth { get { lock (gate) return inner.ResolutionBandwidth; } }

    public Ratio InputAttenuation { get { lock (gate) return inner.InputAttenuation; } }

    public Level ReferenceLevel { get { lock (gate) return inner.ReferenceLevel; } }

    public void SetSpan(Frequency start, Frequency stop) { lock (gate) inner.SetSpan(start, stop); }

    public void SetPoints(int points) { lock (gate) inner.SetPoints(points); }

    public void SetResolutionBandwidth(Frequency bandwidth) { lock (gate) inner.SetResolutionBandwidth(bandwidth); }

    public void SetInputAttenuation(Ratio attenuation) { lock (gate) inner.SetInputAttenuation(attenuation); }

    public void SetReferenceLevel(Level level) { lock (gate) inner.SetReferenceLevel(level); }

    public void Reset() { lock (gate) inner.Reset(); }

    public PowerTrace Sweep() { lock (gate) return inner.Sweep(); }
}
