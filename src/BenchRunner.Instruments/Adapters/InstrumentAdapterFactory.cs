using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Capture;
using BenchRunner.Instruments.Connections;
using BenchRunner.Instruments.Profiles;
using BenchRunner.Instruments.Scpi;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Adapters;

/// <summary>Builds the instrument adapter a driver profile asks for, so that callers need not know the adapters.</summary>
public static class InstrumentAdapterFactory
{
    /// <summary>
    /// Creates an unconnected instrument: a <see cref="ProfileInstrument"/> for an
    /// <c>adapter: raw</c> profile, a <see cref="ScpiInstrument"/> with the profile's command set,
    /// options and limits for an <c>adapter: scpi</c> profile. Without a profile, a
    /// <see cref="ScpiInstrument"/> with the default command set, default options and no declared
    /// limits that enables no capability: connecting it sends <c>*CLS</c> and reads <c>*IDN?</c>
    /// (draining the error queue), and <see cref="IInstrument.GetCapability{T}"/> gives null for
    /// every capability, so it can only be identified. Nothing is sent before
    /// <see cref="IInstrument.ConnectAsync"/>.
    /// </summary>
    /// <param name="name">The instrument's bench name, used in every message (e.g. <c>vna</c>).</param>
    /// <param name="profile">The driver profile, or null for an identification-only SCPI instrument.</param>
    /// <param name="transport">The connection; opened on connecting, closed on disposal.</param>
    /// <param name="time">The clock for timeouts and settle delays; the system clock when null.</param>
    /// <exception cref="ArgumentException">An empty name.</exception>
    /// <exception cref="ArgumentNullException">No transport.</exception>
    public static IInstrument Create(string name, DriverProfile? profile, ITransport transport, TimeProvider? time = null)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(name);
        ArgumentNullException.ThrowIfNull(transport);
        if (profile is null)
        {
            return new ScpiInstrument(name, transport, new ScpiCommandSet { IdentificationOnly = true }, timeProvider: time);
        }

        return profile.AdapterKind switch
        {
            AdapterKind.Raw => new ProfileInstrument(name, profile, transport, time),
            AdapterKind.Scpi => new ScpiInstrument(name, transport, profile.ScpiCommands!, profile.ScpiOptions, profile.Limits, time),
            _ => throw new ArgumentException($"The profile \"{profile.Name}\" has an adapter this version cannot build: {profile.AdapterKind}.", nameof(profile)),
        };
    }

    /// <summary>
    /// Creates an unconnected instrument on the connection <paramref name="connection"/> describes,
    /// recording every byte exchanged to <paramref name="recordPath"/> when it is given.
    /// </summary>
    /// <param name="name">The instrument's bench name.</param>
    /// <param name="profile">The driver profile, or null for an identification-only SCPI instrument.</param>
    /// <param name="connection">Where the instrument is.</param>
    /// <param name="transports">Builds the transport for the connection's kind.</param>
    /// <param name="recordPath">A new capture file to record the session into, or null.</param>
    /// <param name="time">The clock for timeouts, settle delays and capture timestamps.</param>
    /// <exception cref="IOException">The capture file exists already or cannot be written.</exception>
    public static IInstrument Create(string name, DriverProfile? profile, ConnectionSpec connection, TransportFactory transports,
        string? recordPath = null, TimeProvider? time = null)
    {
        ArgumentNullException.ThrowIfNull(connection);
        ArgumentNullException.ThrowIfNull(transports);
        var transport = transports.Create(connection);
        if (recordPath is not null)
        {
            transport = RecordingTransport.ToFile(transport, recordPath, name, profile is null ? null : $"profile {profile.Name}", time);
        }

        return Create(name, profile, transport, time);
    }
}
