using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Errors;

namespace BenchRunner.Instruments.Scpi;

/// <summary>The spectrum-analyser capability of a <see cref="ScpiInstrument"/>.</summary>
internal sealed class ScpiSpectrumAnalyser(ScpiInstrument instrument, ScpiSpectrumCommands commands) : ISpectrumAnalyser
{
    private SpectrumSettings? _settings;

    public async Task ConfigureAsync(SpectrumSettings settings, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(settings);
        if (settings.Span.Stop <= settings.Span.Start)
        {
            throw new ArgumentException($"{instrument.Name}: the span's stop must be above its start (zero span is not supported).", nameof(settings));
        }

        if (settings.InputAttenuation.Decibels < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(settings), settings.InputAttenuation.Decibels, "The input attenuation must not be negative.");
        }

        if (settings.Points is < 2)
        {
            throw new ArgumentOutOfRangeException(nameof(settings), settings.Points, "A trace needs at least 2 points.");
        }

        instrument.CheckFrequency(settings.Span.Start, "span start");
        instrument.CheckFrequency(settings.Span.Stop, "span stop");
        if (settings.Points is not null && commands.Points is null)
        {
            throw instrument.Unsupported("the number of trace points");
        }

        _settings = null;
        var session = instrument.Session;
        await session.WriteAsync(ScpiInstrument.Template(commands.Start!, ScpiPlaceholder.Hz).Render(settings.Span.Start), cancellationToken).ConfigureAwait(false);
        await session.WriteAsync(ScpiInstrument.Template(commands.Stop!, ScpiPlaceholder.Hz).Render(settings.Span.Stop), cancellationToken).ConfigureAwait(false);
        await session.WriteAsync(ScpiInstrument.Template(commands.ResolutionBandwidth!, ScpiPlaceholder.Hz).Render(settings.ResolutionBandwidth), cancellationToken).ConfigureAwait(false);
        await session.WriteAsync(ScpiInstrument.Template(commands.InputAttenuation!, ScpiPlaceholder.Db).Render(settings.InputAttenuation), cancellationToken).ConfigureAwait(false);
        await session.WriteAsync(ScpiInstrument.Template(commands.ReferenceLevel!, ScpiPlaceholder.Dbm).Render(settings.ReferenceLevel), cancellationToken).ConfigureAwait(false);
        if (settings.Points is { } points)
        {
            await session.WriteAsync(ScpiInstrument.Template(commands.Points!, ScpiPlaceholder.Points).Render(points), cancellationToken).ConfigureAwait(false);
        }

        _settings = settings;
    }

    public async Task<PowerTrace> AcquireAsync(CancellationToken cancellationToken)
    {
        var settings = _settings ?? throw new InvalidOperationException($"{instrument.Name}: configure the analyser before acquiring.");
        await instrument.SweepAsync(cancellationToken).ConfigureAwait(false);

        int? expected = settings.Points ?? await QueryPointsAsync(cancellationToken).ConfigureAwait(false);
        FrequencyAxis? axis = null;
        if (commands.FrequencyListQuery is { } listQuery)
        {
            axis = await instrument.FetchAxisAsync(listQuery, cancellationToken).ConfigureAwait(false);
            if (expected is { } count)
            {
                instrument.CheckCount("the frequency list", listQuery, count, axis.Count, 1, $"{axis.Count} frequencies", Hint(count));
            }

            expected = axis.Count;
        }

        var query = commands.TraceQuery!;
        var (levels, reply) = await instrument.FetchNumbersAsync(query, cancellationToken).ConfigureAwait(false);
        if (expected is { } points)
        {
            instrument.CheckCount("the power trace", query, points, levels.Length, 1, reply, Hint(points));
        }
        else if (levels.Length < 2)
        {
            instrument.CheckCount("the power trace", query, 2, levels.Length, 1, reply, "a trace needs at least 2 points");
        }

        axis ??= FrequencyAxis.Linear(settings.Span.Start, settings.Span.Stop, levels.Length);
        instrument.CheckMeasured("the power trace", query, levels, axis, 1, reply);
        return new PowerTrace(axis, levels);
    }

    private async Task<int?> QueryPointsAsync(CancellationToken cancellationToken)
    {
        if (commands.PointsQuery is not { } query)
        {
            return null;
        }

        var reply = await instrument.Session.QueryAsync(query, cancellationToken).ConfigureAwait(false);
        var points = ScpiNumber.Parse(reply);
        return points is { Success: true, Value: >= 2 and <= int.MaxValue } && points.Value == Math.Floor(points.Value)
            ? (int)points.Value
            : throw new InstrumentException("the number of trace points could not be read; expected a whole number of at least 2", isTransient: false)
            {
                Instrument = instrument.Name,
                Command = query,
                Reply = reply,
            };
    }

    private static string Hint(int points) =>
        $"{points} points were configured or reported; is the trace query the right one?";

}
