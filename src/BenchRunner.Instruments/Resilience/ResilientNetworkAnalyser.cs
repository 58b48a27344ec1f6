using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;

namespace BenchRunner.Instruments.Resilience;

/// <summary>A network analyser behind <see cref="ResilientInstrument"/>; remembers the sweep to set it again after a reconnect.</summary>
internal sealed class ResilientNetworkAnalyser : INetworkAnalyser
{
    private readonly ResilientInstrument _owner;
    private NetworkSweep? _sweep;

    public ResilientNetworkAnalyser(ResilientInstrument owner)
    {
        _owner = owner;
        owner.Remember(async (fresh, ct) =>
        {
            if (_sweep is { } sweep)
            {
                await Inner(fresh).ConfigureSweepAsync(sweep, ct).ConfigureAwait(false);
            }
        });
    }

    public async Task ConfigureSweepAsync(NetworkSweep sweep, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        await _owner.ExecuteAsync("set the sweep", idempotent: true, _owner.Options.OperationTimeout,
            async (i, ct) => { await Inner(i).ConfigureSweepAsync(sweep, ct).ConfigureAwait(false); return true; },
            cancellationToken).ConfigureAwait(false);
        _sweep = sweep;
    }

    public Task<IReadOnlyList<ComplexTrace>> AcquireAsync(IReadOnlyList<TraceQuantity> parameters, CancellationToken cancellationToken) =>
        _owner.ExecuteAsync($"sweep {string.Join(", ", parameters)}", idempotent: true, _owner.Options.SweepTimeout,
            (i, ct) => Inner(i).AcquireAsync(parameters, ct), cancellationToken);

    private static INetworkAnalyser Inner(IInstrument instrument) =>
        instrument.GetCapability<INetworkAnalyser>()
        ?? throw new InvalidOperationException($"{instrument.Name} is no longer a network analyser after reconnecting.");
}
