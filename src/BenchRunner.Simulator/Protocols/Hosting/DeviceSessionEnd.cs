namespace BenchRunner.Simulator.Protocols.Hosting;

/// <summary>Why <see cref="SimulatedDeviceHost.ServeAsync"/> stopped serving a connection.</summary>
public enum DeviceSessionEnd
{
    /// <summary>The host end closed the connection.</summary>
    PeerClosed,

    /// <summary>The cancellation token fired.</summary>
    Stopped,

    /// <summary>Reading or writing failed (the link broke).</summary>
    ConnectionFailed,
}
