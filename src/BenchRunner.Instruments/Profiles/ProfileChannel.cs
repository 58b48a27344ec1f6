using BenchRunner.Core.Quantities;

namespace BenchRunner.Instruments.Profiles;

/// <summary>
/// The conversation with a raw-profile instrument, as a kind's capability uses it: one operation at
/// a time, each reply read to the prompt (or the next line without one), error replies recognised,
/// and every failure an <see cref="Errors.InstrumentException"/> naming instrument, command and reply.
/// Timeouts and settle delays are the profile's and run on the instrument's clock.
/// </summary>
public sealed class ProfileChannel
{
    internal ProfileChannel(ProfileSession session) => Session = session;

    /// <summary>The instrument's bench name.</summary>
    public string Name => Session.Name;

    /// <summary>The profile spoken.</summary>
    public DriverProfile Profile => Session.Profile;

    internal ProfileSession Session { get; }

    /// <summary>
    /// Sends a setting rendered from <paramref name="command"/>, checks its acknowledgement (or that
    /// nothing came back), and waits the profile's settle time after a setting.
    /// </summary>
    /// <exception cref="Errors.InstrumentException">The instrument cannot be reached, refused the setting or answered unlike its profile.</exception>
    public Task SetAsync(CommandTemplate command, TemplateArguments arguments, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(command);
        ArgumentNullException.ThrowIfNull(arguments);
        var text = command.Render(arguments);
        return Session.RunAsync(async token =>
        {
            await Session.SettingAsync(text, Profile.Timing.CommandTimeout, token).ConfigureAwait(false);
            await Session.SettleAsync(Profile.Timing.SettleAfterSetting, token).ConfigureAwait(false);
        }, cancellationToken);
    }

    /// <summary>
    /// Sends a query rendered from <paramref name="command"/> and reads its reply with
    /// <paramref name="parse"/>, given the reply's non-blank lines. A reply that does not parse is a
    /// transient <see cref="Errors.InstrumentException"/> carrying the parser's message, the command and the reply.
    /// </summary>
    /// <exception cref="Errors.InstrumentException">No reply in time, an error reply, or a reply that does not parse.</exception>
    public Task<T> QueryAsync<T>(CommandTemplate command, TemplateArguments arguments, Func<IReadOnlyList<string>, ParseResult<T>> parse,
        CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(command);
        ArgumentNullException.ThrowIfNull(arguments);
        ArgumentNullException.ThrowIfNull(parse);
        var text = command.Render(arguments);
        return Session.RunAsync(async token =>
        {
            var lines = await Session.QueryAsync(text, Profile.Timing.CommandTimeout, token).ConfigureAwait(false);
            var parsed = parse(lines);
            return parsed.Success ? parsed.Value : throw Session.ContentError($"unreadable reply: {parsed.Error}", text, string.Join("\n", lines));
        }, cancellationToken);
    }
}
