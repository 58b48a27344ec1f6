namespace BenchRunner.Instruments.Capture;

/// <summary>
/// A command and the reply that followed it, for display. Either side may be missing: a device
/// that speaks first (a banner or prompt) gives an exchange with no command, and a command
/// that got no answer one with no reply.
/// </summary>
/// <param name="Command">What the host wrote, or null when the device spoke first.</param>
/// <param name="Reply">What the device sent back before the next command, or null when nothing came.</param>
public sealed record CaptureExchange(CaptureMessage? Command, CaptureMessage? Reply)
{
    /// <summary>Time from the command to the start of the reply; null when either is missing.</summary>
    public TimeSpan? ReplyDelay => Command is not null && Reply is not null ? Reply.Offset - Command.EndOffset : null;

    /// <summary>For display: <c>&gt; FREQ:CENT?\n  &lt; 137500000\n</c> on one line.</summary>
    public override string ToString() => (Command, Reply) switch
    {
        ({ } c, { } r) => $"{c}  {r}",
        ({ } c, null) => c.ToString(),
        (null, { } r) => r.ToString(),
        _ => "",
    };
}
