namespace BenchRunner.Instruments.Capabilities;

/// <summary>
/// One connected instrument. What it can do is asked with <see cref="GetCapability{T}"/>
/// (<see cref="INetworkAnalyser"/>, <see cref="ISpectrumAnalyser"/>, <see cref="ISignalGenerator"/>,
/// and kinds yet to come), so that adding a capability never changes this interface.
/// </summary>
public interface IInstrument : IAsyncDisposable
{
    /// <summary>The instrument's name on the bench (e.g. <c>vna</c>), used in every message.</summary>
    string Name { get; }

    /// <summary>The identity read at connection; <see cref="InstrumentIdentity.Unknown"/> before.</summary>
    InstrumentIdentity Identity { get; }

    /// <summary>The declared limits.</summary>
    InstrumentLimits Limits { get; }

    /// <summary>Opens the connection, identifies the instrument and brings it to a known state.</summary>
    /// <exception cref="Errors.InstrumentException">It cannot be reached or does not answer as expected.</exception>
    Task ConnectAsync(CancellationToken cancellationToken);

    /// <summary>The capability <typeparamref name="T"/>, or null when this instrument does not have it.</summary>
    T? GetCapability<T>() where T : class;
}
