using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Simulator.Generator;
using BenchRunner.Simulator.Protocols;

namespace BenchRunner.Simulator.Endpoints;

/// <summary>The signal generator model as the protocol servers see it.</summary>
internal sealed class SignalGeneratorDevice : ISimulatedSignalGenerator
{
    private readonly SimulatedSignalGenerator _model;

    public SignalGeneratorDevice(SimulatedSignalGenerator model)
    {
        _model = model;
        _model.Reset();
        var band = SimulatedSignalGenerator.FrequencyRange;
        Ranges = new SignalGeneratorRanges(
            SettingRange.Of(band.Start.Hertz, band.Stop.Hertz, model.Frequency.Hertz, step: 1),
            SettingRange.Of(SimulatedSignalGenerator.MinLevel.Dbm, SimulatedSignalGenerator.MaxLevel.Dbm, model.Level.Dbm, step: 0.01));
    }

    public InstrumentIdentity Identity => _model.Identity;

    public SignalGeneratorRanges Ranges { get; }

    public Frequency Frequency => _model.Frequency;

    public Level Level => _model.Level;

    public bool OutputOn => _model.OutputOn;

    public void SetFrequency(Frequency frequency) => _model.Frequency = frequency;

    public void SetLevel(Level level) => _model.Level = level;

    public void SetOutput(bool on) => _model.OutputOn = on;

    public void Reset() => _model.Reset();
}
