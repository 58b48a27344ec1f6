namespace BenchRunner.Instruments.Errors;

/// <summary>Re-raises lower-layer failures with the instrument and command they belong to.</summary>
internal static class InstrumentFailures
{
    /// <summary>The same failure, of the same type, with <paramref name="instrument"/> and <paramref name="command"/> attached.</summary>
    public static InstrumentException WithContext(InstrumentException failure, string instrument, string? command)
    {
        command ??= failure.Command;
        return failure switch
        {
            InstrumentTimeoutException => new InstrumentTimeoutException(failure.Detail, failure) { Instrument = instrument, Command = command, Reply = failure.Reply },
            FramingException => new FramingException(failure.Detail, failure) { Instrument = instrument, Command = command, Reply = failure.Reply },
            InstrumentReportedException reported => new InstrumentReportedException(reported.Code, reported.Text, failure.Detail) { Instrument = instrument, Command = command, Reply = failure.Reply },
            InstrumentUnavailableException unavailable => new InstrumentUnavailableException(failure.Detail, unavailable.RetryAfter, failure) { Instrument = instrument, Command = command, Reply = failure.Reply },
            _ => new InstrumentException(failure.Detail, failure.IsTransient, failure) { Instrument = instrument, Command = command, Reply = failure.Reply },
        };
    }
}
