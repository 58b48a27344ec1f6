using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Simulator.Protocols;

namespace BenchRunner.Simulator.Endpoints;

/// <summary>Lets several endpoints share one network analyser model: every call holds the bench's lock.</summary>
internal sealed class SerialisedNetworkAnalyser(ISimulatedNetworkAnalyser inner, object gate) : ISimulatedNetworkAnalyser
{
    public InstrumentIdentity Identity => inner.Identity;

    public NetworkAnalyserRanges Ranges => inner.Ranges;

    public Frequency Start { get { lock (gate) return inner.Start; } }

    public Frequency Stop { get { lock (gate) return inner.Stop; } }

    public int Points { get { lock (gate) return inner.Points; } }

    public Frequency IfBandwidth { get { lock (gate) return inner.IfBandwidth; } }

    public int Averages { get { lock (gate) return inner.Averages; } }

    public void SetSweep(Frequency start, Frequency stop, int points) { lock (gate) inner.SetSweep(start, stop, points); }

    public void SetIfBandwidth(Frequency bandwidth) { lock (gate) inner.SetIfBandwidth(bandwidth); }

    public void SetAverages(int count) { lock (gate) inner.SetAverages(count); }

    public void Reset() { lock (gate) inner.Reset(); }

    public TraceSet Sweep() { lock (gate) return inner.Sweep(); }
}
