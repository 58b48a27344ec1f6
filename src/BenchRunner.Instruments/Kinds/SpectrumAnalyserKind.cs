using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Profiles;
using BenchRunner.Instruments.Resilience;
using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Instruments.Kinds;

/// <summary>A spectrum analyser: sweeps and returns a power trace. It has an RF input (protected by max-input-level) and no output.</summary>
internal sealed class SpectrumAnalyserKind() : InstrumentKind("spectrum-analyser", "spectrum analyser", typeof(ISpectrumAnalyser), hasProtectedInput: true, hasOutput: false)
{
    public static SpectrumAnalyserKind Instance { get; } = new();

    protected override object CreateResilient(ResilientInstrument owner) => new ResilientSpectrumAnalyser(owner);

    protected override object? ReadProfileSection(ProfileSectionReader reader) => CapabilitySectionReader.ReadSpectrumAnalyser(reader);

    protected override object CreateProfileCapability(ProfileChannel channel, object section) =>
        new ProfileSpectrumAnalyser(channel.Session, (SpectrumAnalyserCommands)section);

    protected override IScpiCommandSection DefaultScpiSection() => new ScpiSpectrumCommands();

    protected override IScpiCommandSection ReadScpiSection(ScpiSectionReader reader) => reader.Reader.ReadSpectrum(reader);

    protected override object CreateScpiCapability(ScpiInstrument instrument, IScpiCommandSection section) =>
        new ScpiSpectrumAnalyser(instrument, (ScpiSpectrumCommands)section);
}
