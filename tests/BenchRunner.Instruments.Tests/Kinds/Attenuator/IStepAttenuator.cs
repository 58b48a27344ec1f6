using BenchRunner.Core.Quantities;

namespace BenchRunner.Instruments.Tests.Kinds.Attenuator;

/// <summary>
/// The capability of the toy kind: a programmable step attenuator that is set to an attenuation and
/// says what it is set to. It exists only in the tests, to prove that a kind is added through its
/// descriptor alone (<see cref="StepAttenuatorKind"/>), with no edit to BenchRunner's own code.
/// </summary>
public interface IStepAttenuator
{
    /// <summary>Sets the attenuation.</summary>
    Task SetAttenuationAsync(Ratio attenuation, CancellationToken cancellationToken);

    /// <summary>Reads back the attenuation in force.</summary>
    Task<Ratio> ReadAttenuationAsync(CancellationToken cancellationToken);
}
