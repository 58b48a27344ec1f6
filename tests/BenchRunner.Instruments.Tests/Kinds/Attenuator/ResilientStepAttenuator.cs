using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Resilience;

namespace BenchRunner.Instruments.Tests.Kinds.Attenuator;

/// <summary>The toy capability behind <see cref="ResilientInstrument"/>: sets the last attenuation again after a reconnect.</summary>
internal sealed class ResilientStepAttenuator : IStepAttenuator
{
    private readonly ResilientInstrument _owner;
    private Ratio? _attenuation;

    public ResilientStepAttenuator(ResilientInstrument owner)
    {
        _owner = owner;
        owner.Remember(async (fresh, ct) =>
        {
            if (_attenuation is { } attenuation)
            {
                await Inner(fresh).SetAttenuationAsync(attenuation, ct).ConfigureAwait(false);
            }
        });
    }

    public async Task SetAttenuationAsync(Ratio attenuation, CancellationToken cancellationToken)
    {
        await _owner.ExecuteAsync("set the attenuation", idempotent: true, _owner.Options.OperationTimeout,
            async (i, ct) => { await Inner(i).SetAttenuationAsync(attenuation, ct).ConfigureAwait(false); return true; },
            cancellationToken).ConfigureAwait(false);
        _attenuation = attenuation;
    }

    public Task<Ratio> ReadAttenuationAsync(CancellationToken cancellationToken) =>
        _owner.ExecuteAsync("read the attenuation", idempotent: true, _owner.Options.OperationTimeout,
            (i, ct) => Inner(i).ReadAttenuationAsync(ct), cancellationToken);

    private static IStepAttenuator Inner(IInstrument instrument) =>
        instrument.GetCapability<IStepAttenuator>()
        ?? throw new InvalidOperationException($"{instrument.Name} is no longer a step attenuator after reconnecting.");
}
