using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Simulator.Protocols;

namespace BenchRunner.Simulator.Tests.Support;

/// <summary>A stand-in signal generator for protocol tests: the bench ranges and validated settings.</summary>
internal sealed class FakeSignalGenerator : ISimulatedSignalGenerator
{
    public FakeSignalGenerator() => Reset();

    public InstrumentIdentity Identity { get; } = new("benchrunner", "sim-gen", "SIM-GEN-0001", "1.0");

    public SignalGeneratorRanges Ranges => SignalGeneratorRanges.Bench;

    public Frequency Frequency { get; private set; }

    public Level Level { get; private set; }

    public bool OutputOn { get; private set; }

    public void SetFrequency(Frequency frequency)
    {
        if (!Ranges.FrequencyHertz.Contains(frequency.Hertz))
        {
            throw new ArgumentOutOfRangeException(nameof(frequency), frequency.Hertz, "Outside the generator's range.");
        }

        Frequency = frequency;
    }

    public void SetLevel(Level level)
    {
        if (!Ranges.LevelDbm.Contains(level.Dbm))
        {
            throw new ArgumentOutOfRangeException(nameof(level), level.Dbm, "Outside the generator's range.");
        }

        Level = level;
    }

    public void SetOutput(bool on) => OutputOn = on;

    public void Reset()
    {
        Frequency = Frequency.FromHertz(Ranges.FrequencyHertz.Default);
        Level = Level.FromDbm(Ranges.LevelDbm.Default);
        OutputOn = false;
    }
}
