namespace BenchRunner.Instruments.Errors;

/// <summary>
/// What came back cannot be framed as a message: too long, a malformed IEEE 488.2 block
/// header, or a connection closed in mid-reply. The session that sees it has lost protocol
/// sync and must be reset; trying again after a reset may help, so it is transient.
/// </summary>
public sealed class FramingException(string message, Exception? inner = null)
    : InstrumentException(message, isTransient: true, inner);
