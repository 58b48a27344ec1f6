using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;

namespace BenchRunner.Instruments.Profiles;

/// <summary>The spectrum analyser capability of a profile-driven instrument.</summary>
internal sealed class ProfileSpectrumAnalyser(ProfileSession session, SpectrumAnalyserCommands commands) : ISpectrumAnalyser
{
    private SpectrumSettings? _settings;

    public Task ConfigureAsync(SpectrumSettings settings, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(settings);
        if (settings.Span.Stop <= settings.Span.Start)
        {
            throw new ArgumentException($"{session.Name}: a span of {settings.Span} is empty; a profile-driven analyser sweeps a span.", nameof(settings));
        }

        if (settings.Points is < 2)
        {
            throw new ArgumentOutOfRangeException(nameof(settings), $"{session.Name}: a trace needs at least 2 points.");
        }

        if (session.Profile.Limits.FrequencyRange is { } range && !range.Contains(settings.Span))
        {
            throw new ArgumentOutOfRangeException(nameof(settings), $"{session.Name}: the span {settings.Span} leaves the declared range {range}.");
        }

        return session.RunAsync(async token =>
        {
            var arguments = Arguments(settings);
            foreach (var command in commands.Setup)
            {
                await session.SettingAsync(command.Render(arguments), session.Profile.Timing.CommandTimeout, token).ConfigureAwait(false);
            }

            _settings = settings;
            await session.SettleAsync(session.Profile.Timing.SettleAfterSetting, token).ConfigureAwait(false);
        }, cancellationToken);
    }

    public Task<PowerTrace> AcquireAsync(CancellationToken cancellationToken)
    {
        var settings = _settings ?? throw new InvalidOperationException($"{session.Name}: nothing is configured; call ConfigureAsync first.");
        return session.RunAsync(async token =>
        {
            var arguments = Arguments(settings);
            var timing = session.Profile.Timing;
            foreach (var command in commands.Sweep)
            {
                await session.SettingAsync(command.Render(arguments), timing.SweepTimeout, token).ConfigureAwait(false);
            }

            await session.SettleAsync(timing.SettleBeforeRead, token).ConfigureAwait(false);
            var read = commands.Read.Render(arguments);
            var expected = settings.Points ?? commands.DefaultPoints;
            var reply = await session.ReadSweepAsync(read, commands.Data, expected, timing.SweepTimeout, token).ConfigureAwait(false);
            if (reply.Count < 2)
            {
                throw session.ContentError($"the trace has {reply.Count} point; expected at least 2", read, "");
            }

            var axis = FrequencyAxis.Linear(settings.Span.Start, settings.Span.Stop, reply.Count);
            var trace = commands.Data.ToPowerTrace(reply, axis);
            return trace.Success ? trace.Value : throw session.ContentError($"unusable trace data: {trace.Error}", read, "");
        }, cancellationToken);
    }

    private TemplateArguments Arguments(SpectrumSettings settings)
    {
        var arguments = new TemplateArguments()
            .Set("start", settings.Span.Start)
            .Set("stop", settings.Span.Stop)
            .Set("centre", settings.Span.Centre)
            .Set("span", settings.Span.Width)
            .Set("rbw", settings.ResolutionBandwidth)
            .Set("attenuation", settings.InputAttenuation)
            .Set("reference", settings.ReferenceLevel);
        if ((settings.Points ?? commands.DefaultPoints) is { } points)
        {
            arguments.Set("points", points);
        }

        return arguments;
    }
}
