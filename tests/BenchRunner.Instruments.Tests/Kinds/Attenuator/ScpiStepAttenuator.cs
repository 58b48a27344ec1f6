using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Instruments.Tests.Kinds.Attenuator;

/// <summary>The toy capability over SCPI.</summary>
internal sealed class ScpiStepAttenuator(ScpiInstrument instrument, ScpiStepAttenuatorCommands commands) : IStepAttenuator
{
    public Task SetAttenuationAsync(Ratio attenuation, CancellationToken cancellationToken) =>
        instrument.Session.WriteAsync(ScpiCommandTemplate.Parse(commands.Set, ScpiPlaceholder.Db).Value.Render(attenuation), cancellationToken);

    public async Task<Ratio> ReadAttenuationAsync(CancellationToken cancellationToken)
    {
        var reply = await instrument.Session.QueryAsync(commands.Query!, cancellationToken).ConfigureAwait(false);
        var db = ScpiNumber.Parse(reply);
        return db.Success
            ? Ratio.FromDecibels(db.Value)
            : throw new InstrumentException($"the attenuation could not be read: {db.Error}", isTransient: false)
            {
                Instrument = instrument.Name,
                Command = commands.Query,
                Reply = reply,
            };
    }
}
