namespace BenchRunner.Cli;

/// <summary>
/// Where a verb writes: results to <paramref name="Out"/>, messages and logs to
/// <paramref name="Error"/>; colour only when the output is a terminal.
/// </summary>
/// <param name="Out">Results (the JSON document with <c>--json</c>).</param>
/// <param name="Error">Errors, warnings and progress.</param>
/// <param name="UseColour">Whether ANSI colours may be written to <paramref name="Out"/>.</param>
public sealed record CliConsole(TextWriter Out, TextWriter Error, bool UseColour = false)
{
    /// <summary>What the operator types or scans (standard input); empty unless set.</summary>
    public TextReader In { get; init; } = TextReader.Null;

    /// <summary>True when <see cref="In"/> is a terminal, which shows what is typed; otherwise answers to prompts are echoed.</summary>
    public bool InIsTerminal { get; init; }
    /// <summary>Whether <see cref="Out"/> is an interactive terminal (live views may redraw it); false by default.</summary>
    public bool IsTerminal { get; init; }
}
