namespace BenchRunner.Instruments.Transports;

/// <summary>How a scripted disconnect shows itself to the reader.</summary>
public enum DisconnectStyle
{
    /// <summary>Reads return 0, as when the peer closes the connection. The default.</summary>
    EndOfStream,

    /// <summary>Reads and writes throw <see cref="IOException"/>, as when a cable is pulled.</summary>
    IOError,
}
