namespace BenchRunner.Simulator.Protocols.Hosting;

/// <summary>
/// The device side of one line-based protocol for one simulated instrument: it takes each command
/// line and returns the bytes to send back. Bad input is answered with the protocol's own error,
/// never an exception. <see cref="SimulatedDeviceHost"/> calls it one line at a time, for all
/// connections to the instrument, so it needs no locking of its own.
/// </summary>
public interface IDeviceProtocol
{
    /// <summary>Which bytes end a command line.</summary>
    CommandLineEnd LineEnd { get; }

    /// <summary>
    /// Handles one line, given without its terminator (and without a CR before an LF), decoded as
    /// Latin-1 so that every byte is one character. Empty lines are not passed.
    /// </summary>
    /// <returns>The bytes to send, empty for none.</returns>
    byte[] Handle(string line);

    /// <summary>Answers a line that was longer than the host accepts; its bytes were discarded.</summary>
    /// <param name="limitBytes">The longest line accepted, in bytes.</param>
    /// <returns>The bytes to send, empty for none.</returns>
    byte[] HandleOverlongLine(int limitBytes);
}
