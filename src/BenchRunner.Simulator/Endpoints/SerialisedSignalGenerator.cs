using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Simulator.Protocols;

namespace BenchRunner.Simulator.Endpoints;

/// <summary>Lets several endpoints share one generator model: every call holds the bench's lock.</summary>
internal sealed class SerialisedSignalGenerator(ISimulatedSignalGenerator inner, object gate) : ISimulatedSignalGenerator
{
    public InstrumentIdentity Identity => inner.Identity;

    public SignalGeneratorRanges Ranges => inner.Ranges;

    public Frequency Frequency { get { lock (gate) return inner.Frequency; } }

    public Level Level { get { lock (gate) return inner.Level; } }

    public bool OutputOn { get { lock (gate) return inner.OutputOn; } }

    public void SetFrequency(Frequency frequency) { lock (gate) inner.SetFrequency(frequency); }

    public void SetLevel(Level level) { lock (gate) inner.SetLevel(level); }

    public void SetOutput(bool on) { lock (gate) inner.SetOutput(on); }

    public void Reset() { lock (gate) inner.Reset(); }
}
