namespace BenchRunner.Instruments.Errors;

/// <summary>
/// A failure talking to an instrument. It names the instrument, the command being carried out
/// and what came back, if anything, and knows whether trying again could help
/// (<see cref="IsTransient"/>: a timeout or an I/O error, as opposed to a refused command).
/// </summary>
public class InstrumentException : Exception
{
    /// <summary>Creates the exception.</summary>
    /// <param name="message">What went wrong, in words for the operator.</param>
    /// <param name="isTransient">Whether the same operation may succeed if tried again.</param>
    /// <param name="inner">The underlying error, if any.</param>
    public InstrumentException(string message, bool isTransient, Exception? inner = null)
        : base(message, inner)
    {
        IsTransient = isTransient;
    }

    /// <summary>Whether the same operation may succeed if tried again (timeouts, I/O errors, garbled replies).</summary>
    public bool IsTransient { get; }

    /// <summary>The bench name of the instrument (e.g. <c>vna</c>), when known.</summary>
    public string? Instrument { get; init; }

    /// <summary>The command being carried out, when known.</summary>
    public string? Command { get; init; }

    /// <summary>What the instrument sent back (possibly partial), when anything came.</summary>
    public string? Reply { get; init; }

    /// <summary>
    /// What went wrong, without the instrument, command and reply; for a layer that catches the
    /// exception and raises it again with those filled in.
    /// </summary>
    public string Summary => base.Message;

    /// <summary>The message with the instrument, command and reply appended where known.</summary>
    public override string Message
    {
        get
        {
            var text = base.Message;
            if (Instrument is not null) text = $"{Instrument}: {text}";
            if (Command is not null) text += $" (command \"{Printable(Command)}\")";
            if (Reply is not null) text += Reply.Length == 0 ? " (nothing came back)" : $" (received \"{Printable(Reply)}\")";
            return text;
        }
    }

    /// <summary>Shows control characters as escapes and shortens long text, for messages and logs.</summary>
    public static string Printable(string text, int maxLength = 120)
    {
        var builder = new System.Text.StringBuilder();
        foreach (var c in text)
        {
            if (builder.Length >= maxLength)
            {
                builder.Append("...");
                break;
            }

            builder.Append(c switch
            {
                '\n' => "\\n",
                '\r' => "\\r",
                '\t' => "\\t",
                < ' ' or (> '~' and < '\u00a0') => $"\\x{(int)c:X2}",
                _ => c.ToString(),
            });
        }

        return builder.ToString();
    }
}
