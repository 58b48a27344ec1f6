namespace BenchRunner.Instruments.Errors;

/// <summary>An instrument did not answer (completely) within the allowed time. Transient.</summary>
public sealed class InstrumentTimeoutException(string message, Exception? inner = null)
    : InstrumentException(message, isTransient: true, inner);
