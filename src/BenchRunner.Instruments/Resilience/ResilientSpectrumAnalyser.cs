using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;

namespace BenchRunner.Instruments.Resilience;

/// <summary>A spectrum analyser behind <see cref="ResilientInstrument"/>; remembers its settings to set them again after a reconnect.</summary>
internal sealed class ResilientSpectrumAnalyser : ISpectrumAnalyser
{
    private readonly ResilientInstrument _owner;
    private SpectrumSettings? _settings;

    public ResilientSpectrumAnalyser(ResilientInstrument owner)
    {
        _owner = owner;
        owner.Remember(async (fresh, ct) =>
        {
            if (_settings is { } settings)
            {
                await Inner(fresh).ConfigureAsync(settings, ct).ConfigureAwait(false);
            }
        });
    }

    public async Task ConfigureAsync(SpectrumSettings settings, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(settings);
        await _owner.ExecuteAsync("apply the analyser settings", idempotent: true, _owner.Options.OperationTimeout,
            async (i, ct) => { await Inner(i).ConfigureAsync(settings, ct).ConfigureAwait(false); return true; },
            cancellationToken).ConfigureAwait(false);
        _settings = settings;
    }

    public Task<PowerTrace> AcquireAsync(CancellationToken cancellationToken) =>
        _owner.ExecuteAsync("sweep the spectrum", idempotent: true, _owner.Options.SweepTimeout,
            (i, ct) => Inner(i).AcquireAsync(ct), cancellationToken);

    private static ISpectrumAnalyser Inner(IInstrument instrument) =>
        instrument.GetCapability<ISpectrumAnalyser>()
        ?? throw new InvalidOperationException($"{instrument.Name} is no longer a spectrum analyser after reconnecting.");
}
