using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Capabilities;

namespace BenchRunner.Instruments.Profiles;

/// <summary>The signal generator capability of a profile-driven instrument.</summary>
internal sealed class ProfileSignalGenerator(ProfileSession session, SignalGeneratorCommands commands) : ISignalGenerator
{
    public Task SetFrequencyAsync(Frequency frequency, CancellationToken cancellationToken)
    {
        if (session.Profile.Limits.FrequencyRange is { } range && !range.Contains(frequency))
        {
            throw new ArgumentOutOfRangeException(nameof(frequency), frequency.Hertz, $"{session.Name}: {frequency} is outside the declared range {range}.");
        }

        return Set(commands.Frequency.Render(new TemplateArguments().Set("frequency", frequency)), cancellationToken);
    }

    public Task SetLevelAsync(Level level, CancellationToken cancellationToken)
    {
        var limits = session.Profile.Limits;
        if (limits.MaxOutputLevel is { } max && level > max)
        {
            throw new ArgumentOutOfRangeException(nameof(level), level.Dbm, $"{session.Name}: {level} is above the declared maximum output of {max}.");
        }

        if (limits.MinOutputLevel is { } min && level < min)
        {
            throw new ArgumentOutOfRangeException(nameof(level), level.Dbm, $"{session.Name}: {level} is below the declared minimum output of {min}.");
        }

        return Set(commands.Level.Render(new TemplateArguments().Set("level", level)), cancellationToken);
    }

    public Task SetOutputAsync(bool on, CancellationToken cancellationToken) =>
        Set(commands.Output.Render(new TemplateArguments().Set("output", on)), cancellationToken);

    private Task Set(string command, CancellationToken cancellationToken) =>
        session.RunAsync(async token =>
        {
            await session.SettingAsync(command, session.Profile.Timing.CommandTimeout, token).ConfigureAwait(false);
            await session.SettleAsync(session.Profile.Timing.SettleAfterSetting, token).ConfigureAwait(false);
        }, cancellationToken);
}
