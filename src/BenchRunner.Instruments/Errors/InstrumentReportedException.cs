namespace BenchRunner.Instruments.Errors;

/// <summary>
/// The instrument itself reported an error (for SCPI, an entry of its error queue such as
/// <c>-222,"Data out of range"</c>). Not transient: the same command would fail again.
/// </summary>
public sealed class InstrumentReportedException : InstrumentException
{
    /// <summary>Creates the exception for an error number and text reported by the instrument.</summary>
    public InstrumentReportedException(int code, string text, string? message = null)
        : base(message ?? $"the instrument reported error {code}, \"{text}\"", isTransient: false)
    {
        Code = code;
        Text = text;
    }

    /// <summary>The instrument's error number (SCPI-1999: negative numbers are standard errors).</summary>
    public int Code { get; }

    /// <summary>The instrument's error text.</summary>
    public string Text { get; }
}
