using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Profiles;

namespace BenchRunner.Instruments.Tests.Kinds.Attenuator;

/// <summary>The toy capability over a raw profile.</summary>
internal sealed class ProfileStepAttenuator(ProfileChannel channel, StepAttenuatorCommands commands) : IStepAttenuator
{
    public Task SetAttenuationAsync(Ratio attenuation, CancellationToken cancellationToken) =>
        channel.SetAsync(commands.Set, new TemplateArguments().Set("attenuation", attenuation), cancellationToken);

    public Task<Ratio> ReadAttenuationAsync(CancellationToken cancellationToken) =>
        channel.QueryAsync(commands.Query, new TemplateArguments(), commands.Parse, cancellationToken);
}
