using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Capabilities;

namespace BenchRunner.Instruments.Scpi;

/// <summary>The signal-generator capability of a <see cref="ScpiInstrument"/>.</summary>
internal sealed class ScpiSignalGenerator(ScpiInstrument instrument, ScpiGeneratorCommands commands) : ISignalGenerator
{
    public Task SetFrequencyAsync(Frequency frequency, CancellationToken cancellationToken)
    {
        instrument.CheckFrequency(frequency, "frequency");
        return instrument.Session.WriteAsync(ScpiInstrument.Template(commands.Frequency!, ScpiPlaceholder.Hz).Render(frequency), cancellationToken);
    }

    public Task SetLevelAsync(Level level, CancellationToken cancellationToken)
    {
        var limits = instrument.Limits;
        if (limits.MaxOutputLevel is { } max && level > max)
        {
            throw new ArgumentOutOfRangeException(nameof(level), level.Dbm, $"{instrument.Name}: {level} is above the declared maximum output level {max}.");
        }

        if (limits.MinOutputLevel is { } min && level < min)
        {
            throw new ArgumentOutOfRangeException(nameof(level), level.Dbm, $"{instrument.Name}: {level} is below the declared minimum output level {min}.");
        }

        return instrument.Session.WriteAsync(ScpiInstrument.Template(commands.Level!, ScpiPlaceholder.Dbm).Render(level), cancellationToken);
    }

    public Task SetOutputAsync(bool on, CancellationToken cancellationToken) =>
        instrument.Session.WriteAsync(ScpiInstrument.Template(commands.Output!, ScpiPlaceholder.State).Render(on), cancellationToken);
}
