using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Capabilities;

namespace BenchRunner.Instruments.Resilience;

/// <summary>
/// A signal generator behind <see cref="ResilientInstrument"/>. After a reconnect it sets the
/// last frequency and level again, and switches the output on again only if it was on and
/// only after frequency and level are back, so a reconnect never makes RF at a stale setting.
/// </summary>
internal sealed class ResilientSignalGenerator : ISignalGenerator
{
    private readonly ResilientInstrument _owner;
    private Frequency? _frequency;
    private Level? _level;
    private bool? _output;

    public ResilientSignalGenerator(ResilientInstrument owner)
    {
        _owner = owner;
        owner.Remember(async (fresh, ct) =>
        {
            var generator = Inner(fresh);
            if (_output == true)
            {
                await generator.SetOutputAsync(false, ct).ConfigureAwait(false);
            }

            if (_frequency is { } f) await generator.SetFrequencyAsync(f, ct).ConfigureAwait(false);
            if (_level is { } l) await generator.SetLevelAsync(l, ct).ConfigureAwait(false);
            if (_output is { } on) await generator.SetOutputAsync(on, ct).ConfigureAwait(false);
        });
    }

    public async Task SetFrequencyAsync(Frequency frequency, CancellationToken cancellationToken)
    {
        await Run("set the frequency", (g, ct) => g.SetFrequencyAsync(frequency, ct), cancellationToken).ConfigureAwait(false);
        _frequency = frequency;
    }

    public async Task SetLevelAsync(Level level, CancellationToken cancellationToken)
    {
        await Run("set the level", (g, ct) => g.SetLevelAsync(level, ct), cancellationToken).ConfigureAwait(false);
        _level = level;
    }

    public async Task SetOutputAsync(bool on, CancellationToken cancellationToken)
    {
        await Run(on ? "switch the output on" : "switch the output off", (g, ct) => g.SetOutputAsync(on, ct), cancellationToken).ConfigureAwait(false);
        _output = on;
    }

    private Task<bool> Run(string what, Func<ISignalGenerator, CancellationToken, Task> action, CancellationToken cancellationToken) =>
        _owner.ExecuteAsync(what, idempotent: true, _owner.Options.OperationTimeout,
            async (i, ct) => { await action(Inner(i), ct).ConfigureAwait(false); return true; },
            cancellationToken);

    private static ISignalGenerator Inner(IInstrument instrument) =>
        instrument.GetCapability<ISignalGenerator>()
        ?? throw new InvalidOperationException($"{instrument.Name} is no longer a signal generator after reconnecting.");
}
