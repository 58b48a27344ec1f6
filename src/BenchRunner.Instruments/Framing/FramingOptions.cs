namespace BenchRunner.Instruments.Framing;

/// <summary>
/// How messages are cut out of a byte stream. Defaults suit SCPI over a socket or serial line:
/// commands end with LF, replies end with LF (a CR before it is dropped), no prompt, no echo,
/// at most 4 MiB per message.
/// </summary>
public sealed class FramingOptions
{
    /// <summary>The largest message accepted, in bytes: 4 MiB by default (1 KiB to 256 MiB).</summary>
    public const int DefaultMaxMessageBytes = 4 * 1024 * 1024;

    /// <summary>Appended to every command written. Default LF.</summary>
    public string WriteTerminator { get; init; } = "\n";

    /// <summary>Ends a reply line. Default LF; a CR directly before it is dropped as well.</summary>
    public string ReadTerminator { get; init; } = "\n";

    /// <summary>
    /// A prompt the device prints when it is ready for the next command (e.g. <c>"rdy> "</c>),
    /// or null when replies end at the terminator only.
    /// </summary>
    public string? Prompt { get; init; }

    /// <summary>Whether the device echoes each command back before its reply; the echo is discarded.</summary>
    public bool Echo { get; init; }

    /// <summary>The largest message accepted; a longer one is a <see cref="Errors.FramingException"/>.</summary>
    public int MaxMessageBytes { get; init; } = DefaultMaxMessageBytes;

    /// <summary>Throws <see cref="ArgumentException"/> naming every invalid setting.</summary>
    public void Validate()
    {
        var problems = new List<string>();
        if (string.IsNullOrEmpty(ReadTerminator)) problems.Add("the read terminator must not be empty");
        if (Prompt is { Length: 0 }) problems.Add("the prompt must not be empty (use none)");
        if (MaxMessageBytes is < 1024 or > 256 * 1024 * 1024) problems.Add("the maximum message size must be 1 KiB to 256 MiB");
        if (problems.Count > 0)
        {
            throw new ArgumentException("Invalid framing: " + string.Join("; ", problems) + ".");
        }
    }
}
