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
    /// <summary>Whether <see cref="Out"/> is an interactive terminal (live views may redraw it); false by default.</summary>
    public bool IsTerminal { get; init; }
}
