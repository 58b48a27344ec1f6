using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Profiles;
using BenchRunner.Instruments.Resilience;
using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Instruments.Kinds;

/// <summary>A signal generator: a CW carrier at a frequency and level, switched on or off. It has an RF output (bounded by max-output-level) and no input.</summary>
internal sealed class SignalGeneratorKind() : InstrumentKind("signal-generator", "signal generator", typeof(ISignalGenerator), hasProtectedInput: false, hasOutput: true)
{
    public static SignalGeneratorKind Instance { get; } = new();

    protected override object CreateResilient(ResilientInstrument owner) => new ResilientSignalGenerator(owner);

    protected override object? ReadProfileSection(ProfileSectionReader reader) => CapabilitySectionReader.ReadSignalGenerator(reader);

    protected override object CreateProfileCapability(ProfileChannel channel, object section) =>
        new ProfileSignalGenerator(channel.Session, (SignalGeneratorCommands)section);

    protected override IScpiCommandSection DefaultScpiSection() => new ScpiGeneratorCommands();

    protected override IScpiCommandSection ReadScpiSection(ScpiSectionReader reader) => reader.Reader.ReadGenerator(reader);

    protected override object CreateScpiCapability(ScpiInstrument instrument, IScpiCommandSection section) =>
        new ScpiSignalGenerator(instrument, (ScpiGeneratorCommands)section);
}
