using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Profiles;
using BenchRunner.Instruments.Resilience;
using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Instruments.Kinds;

/// <summary>A vector network analyser: sweeps and returns S-parameters. Its RF ports are both input (protected by max-input-level) and output (its test-port level).</summary>
internal sealed class NetworkAnalyserKind() : InstrumentKind("network-analyser", "network analyser", typeof(INetworkAnalyser), hasProtectedInput: true, hasOutput: true)
{
    public static NetworkAnalyserKind Instance { get; } = new();

    protected override object CreateResilient(ResilientInstrument owner) => new ResilientNetworkAnalyser(owner);

    protected override object? ReadProfileSection(ProfileSectionReader reader) => CapabilitySectionReader.ReadNetworkAnalyser(reader);

    protected override object CreateProfileCapability(ProfileChannel channel, object section) =>
        new ProfileNetworkAnalyser(channel.Session, (NetworkAnalyserCommands)section);

    protected override IScpiCommandSection DefaultScpiSection() => new ScpiNetworkCommands();

    protected override IScpiCommandSection ReadScpiSection(ScpiSectionReader reader) => reader.Reader.ReadNetwork(reader);

    protected override object CreateScpiCapability(ScpiInstrument instrument, IScpiCommandSection section) =>
        new ScpiNetworkAnalyser(instrument, (ScpiNetworkCommands)section);
}
