using BenchRunner.Instruments.Capture;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Connections;

/// <summary>
/// Creates the transport a <see cref="ConnectionSpec"/> describes. Serial, TCP and replay of a
/// capture are built in; the virtual bench (<c>sim:</c>) is plugged in by the simulator layer
/// through <see cref="Register"/>, so this class need not know it. Registering a built-in
/// kind replaces it (tests use this to substitute a fake).
/// </summary>
public sealed class TransportFactory
{
    private readonly Dictionary<string, Func<ConnectionSpec, ITransport>> _creators = new(StringComparer.Ordinal);

    /// <summary>Creates a factory with the serial, TCP and replay transports.</summary>
    /// <param name="timeProvider">The clock for connect timeouts and recorded-pace replay; the system clock by default.</param>
    public TransportFactory(TimeProvider? timeProvider = null)
    {
        var time = timeProvider ?? TimeProvider.System;
        _creators[ConnectionSpec.SerialScheme] = spec => new SerialTransport(spec.Serial!);
        _creators[ConnectionSpec.TcpScheme] = spec => new TcpTransport(spec.Tcp!, time);
        _creators[ConnectionSpec.ReplayScheme] = spec => new ReplayTransport(
            CaptureReader.Read(spec.Replay!.Path),
            new ReplayOptions { Mode = spec.Replay.Mode, Pace = spec.Replay.Pace },
            time);
    }

    /// <summary>The kinds a transport can be created for.</summary>
    public IReadOnlyCollection<string> RegisteredSchemes => _creators.Keys;

    /// <summary>Sets how transports of one kind are created.</summary>
    /// <param name="scheme">One of <see cref="ConnectionSpec.Schemes"/>, e.g. <c>sim</c>.</param>
    /// <param name="create">Builds an unopened transport for a parsed connection of that kind.</param>
    /// <exception cref="ArgumentException">The connection syntax has no such kind.</exception>
    public TransportFactory Register(string scheme, Func<ConnectionSpec, ITransport> create)
    {
        ArgumentNullException.ThrowIfNull(scheme);
        ArgumentNullException.ThrowIfNull(create);
        if (!ConnectionSpec.Schemes.Contains(scheme))
        {
            throw new ArgumentException($"The connection syntax has no kind \"{scheme}\"; expected one of {string.Join(", ", ConnectionSpec.Schemes)}.", nameof(scheme));
        }

        _creators[scheme] = create;
        return this;
    }

    /// <summary>Creates (but does not open) the transport for <paramref name="spec"/>.</summary>
    /// <exception cref="InstrumentException">No transport is registered for the connection's kind (not transient).</exception>
    public ITransport Create(ConnectionSpec spec)
    {
        ArgumentNullException.ThrowIfNull(spec);
        if (!_creators.TryGetValue(spec.Scheme, out var create))
        {
            throw new InstrumentException($"cannot connect to \"{spec}\": {spec.Scheme} connections are not available here", isTransient: false);
        }

        return create(spec);
    }
}
