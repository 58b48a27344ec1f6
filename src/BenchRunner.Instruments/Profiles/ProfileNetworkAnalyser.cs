using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;

namespace BenchRunner.Instruments.Profiles;

/// <summary>The network analyser capability of a profile-driven instrument.</summary>
internal sealed class ProfileNetworkAnalyser(ProfileSession session, NetworkAnalyserCommands commands) : INetworkAnalyser
{
    private NetworkSweep? _sweep;

    public Task ConfigureSweepAsync(NetworkSweep sweep, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        if (session.Profile.Limits.FrequencyRange is { } range && (!range.Contains(sweep.Start) || !range.Contains(sweep.Stop)))
        {
            throw new ArgumentOutOfRangeException(nameof(sweep), $"{session.Name}: the sweep {sweep.Start} to {sweep.Stop} leaves the declared range {range}.");
        }

        return session.RunAsync(async token =>
        {
            var arguments = Arguments(sweep);
            var timeout = session.Profile.Timing.CommandTimeout;
            foreach (var command in commands.Setup)
            {
                await session.SettingAsync(command.Render(arguments), timeout, token).ConfigureAwait(false);
            }

            if (sweep.IfBandwidth is { } ifbw && commands.IfBandwidth is { } ifCommand)
            {
                await session.SettingAsync(ifCommand.Render(arguments.Set("ifbw", ifbw)), timeout, token).ConfigureAwait(false);
            }

            if (sweep.Averages is { } averages && commands.Averages is { } averageCommand)
            {
                await session.SettingAsync(averageCommand.Render(arguments.Set("averages", averages)), timeout, token).ConfigureAwait(false);
            }

            _sweep = sweep;
            await session.SettleAsync(session.Profile.Timing.SettleAfterSetting, token).ConfigureAwait(false);
        }, cancellationToken);
    }

    public Task<IReadOnlyList<ComplexTrace>> AcquireAsync(IReadOnlyList<TraceQuantity> parameters, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(parameters);
        var sweep = _sweep ?? throw new InvalidOperationException($"{session.Name}: no sweep is configured; call ConfigureSweepAsync first.");
        foreach (var parameter in parameters)
        {
            if (!commands.Read.ContainsKey(parameter))
            {
                throw new ArgumentException(
                    $"{session.Name}: the profile \"{session.Profile.Name}\" cannot read {parameter}; it reads {string.Join(", ", commands.Read.Keys)}.",
                    nameof(parameters));
            }
        }

        return session.RunAsync<IReadOnlyList<ComplexTrace>>(async token =>
        {
            var arguments = Arguments(sweep);
            var timing = session.Profile.Timing;
            foreach (var command in commands.Sweep)
            {
                await session.SettingAsync(command.Render(arguments), timing.SweepTimeout, token).ConfigureAwait(false);
            }

            await session.SettleAsync(timing.SettleBeforeRead, token).ConfigureAwait(false);
            var axis = FrequencyAxis.Linear(sweep.Start, sweep.Stop, sweep.Points);
            var traces = new List<ComplexTrace>();
            foreach (var parameter in parameters)
            {
                var command = commands.Read[parameter].Render(arguments);
                var reply = await session.ReadSweepAsync(command, commands.Data, sweep.Points, timing.SweepTimeout, token).ConfigureAwait(false);
                var trace = commands.Data.ToComplexTrace(reply, axis, parameter);
                traces.Add(trace.Success ? trace.Value : throw session.ContentError($"unusable {parameter} data: {trace.Error}", command, ""));
            }

            return traces;
        }, cancellationToken);
    }

    private static TemplateArguments Arguments(NetworkSweep sweep) => new TemplateArguments()
        .Set("start", sweep.Start)
        .Set("stop", sweep.Stop)
        .Set("centre", Core.Quantities.Frequency.FromHertz((sweep.Start.Hertz + sweep.Stop.Hertz) / 2))
        .Set("span", sweep.Stop - sweep.Start)
        .Set("points", sweep.Points);
}
