using BenchRunner.Instruments.Kinds;

namespace BenchRunner.Instruments.Tests.Kinds.Attenuator;

/// <summary>Registers the toy kind, in the style of the registry's own <c>Add</c>.</summary>
public static class StepAttenuatorRegistration
{
    /// <summary>A registry with the kinds of <paramref name="kinds"/> and the step attenuator.</summary>
    public static InstrumentKindRegistry AddStepAttenuator(this InstrumentKindRegistry kinds) => kinds.Add(StepAttenuatorKind.Instance);
}
