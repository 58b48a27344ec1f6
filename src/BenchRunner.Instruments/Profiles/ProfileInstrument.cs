using BenchRunner.Instruments.Adapters;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Profiles;

/// <summary>
/// An instrument that speaks the raw line dialect of a <see cref="DriverProfile"/> over any
/// transport. It offers the capability of each kind the profile declares (<see cref="INetworkAnalyser"/>,
/// <see cref="ISpectrumAnalyser"/>, <see cref="ISignalGenerator"/>, or a registered kind's), each built by
/// its <see cref="Kinds.InstrumentKind"/> from the kind's section; settle delays and timeouts are
/// measured on the injected <see cref="TimeProvider"/>. One operation runs at a time; calls made
/// meanwhile wait their turn. Failures are <see cref="Errors.InstrumentException"/>s naming the
/// instrument, the command and what came back; a refused command is an
/// <see cref="Errors.InstrumentReportedException"/>. Settings outside the declared limits are
/// refused with <see cref="ArgumentOutOfRangeException"/> before anything is sent.
/// </summary>
public sealed class ProfileInstrument : IInstrument
{
    private readonly ProfileSession _session;
    private readonly IReadOnlyList<object> _capabilities;

    /// <summary>Creates the instrument; nothing is sent before <see cref="ConnectAsync"/>.</summary>
    /// <param name="name">The instrument's bench name, used in every message.</param>
    /// <param name="profile">The dialect it speaks.</param>
    /// <param name="transport">The connection; opened by <see cref="ConnectAsync"/>, closed on disposal.</param>
    /// <param name="timeProvider">The clock for timeouts and settle delays; the system clock by default.</param>
    /// <exception cref="ArgumentException">The profile is not an <c>adapter: raw</c> profile.</exception>
    public ProfileInstrument(string name, DriverProfile profile, ITransport transport, TimeProvider? timeProvider = null)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(name);
        ArgumentNullException.ThrowIfNull(profile);
        ArgumentNullException.ThrowIfNull(transport);
        if (profile.AdapterKind != AdapterKind.Raw)
        {
            throw new ArgumentException(
                $"The profile \"{profile.Name}\" is an adapter: {profile.Adapter} profile; a ProfileInstrument speaks adapter: raw profiles only (InstrumentAdapterFactory builds either).",
                nameof(profile));
        }

        _session = new ProfileSession(name, profile, transport, timeProvider ?? TimeProvider.System);
        var channel = new ProfileChannel(_session);
        _capabilities = [.. profile.Sections.Select(s => s.Key.ProfileCapability(channel, s.Value))];
    }

    /// <inheritdoc/>
    public string Name => _session.Name;

    /// <summary>The dialect spoken.</summary>
    public DriverProfile Profile => _session.Profile;

    /// <summary>Where the conversation stands.</summary>
    public ProfileSessionState State => _session.State;

    /// <inheritdoc/>
    public InstrumentIdentity Identity => _session.Identity;

    /// <inheritdoc/>
    public InstrumentLimits Limits => _session.Profile.Limits;

    /// <summary>
    /// Opens the transport, identifies the instrument (its query, or the profile's fixed values)
    /// and sends the profile's on-connect commands. Also the way back from <see cref="ProfileSessionState.Broken"/>.
    /// </summary>
    /// <exception cref="Errors.InstrumentException">The instrument cannot be reached or answers unlike its profile.</exception>
    public Task ConnectAsync(CancellationToken cancellationToken) => _session.ConnectAsync(cancellationToken);

    /// <inheritdoc/>
    public T? GetCapability<T>() where T : class => _capabilities.OfType<T>().FirstOrDefault();

    /// <summary>Closes the transport.</summary>
    public async ValueTask DisposeAsync() => await _session.CloseAsync().ConfigureAwait(false);
}
