using BenchRunner.Instruments.Kinds;
using BenchRunner.Instruments.Profiles;
using BenchRunner.Instruments.Resilience;
using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Instruments.Tests.Kinds.Attenuator;

/// <summary>
/// The descriptor of the toy kind <c>step-attenuator</c>: an RF input (protected by a declared
/// maximum input level) and no output of its own. It uses only BenchRunner's public API, and is
/// compiled into the Execution tests as well, which see no internals.
/// </summary>
public sealed class StepAttenuatorKind() : InstrumentKind("step-attenuator", "step attenuator", typeof(IStepAttenuator), hasProtectedInput: true, hasOutput: false)
{
    /// <summary>The one instance; kinds are compared by reference.</summary>
    public static StepAttenuatorKind Instance { get; } = new();

    protected override object CreateResilient(ResilientInstrument owner) => new ResilientStepAttenuator(owner);

    protected override object? ReadProfileSection(ProfileSectionReader reader) => StepAttenuatorCommands.Read(reader);

    protected override object CreateProfileCapability(ProfileChannel channel, object section) =>
        new ProfileStepAttenuator(channel, (StepAttenuatorCommands)section);

    protected override IScpiCommandSection DefaultScpiSection() => new ScpiStepAttenuatorCommands();

    protected override IScpiCommandSection ReadScpiSection(ScpiSectionReader reader) => ScpiStepAttenuatorCommands.Read(reader);

    protected override object CreateScpiCapability(ScpiInstrument instrument, IScpiCommandSection section) =>
        new ScpiStepAttenuator(instrument, (ScpiStepAttenuatorCommands)section);
}
