namespace BenchRunner.Cli.Output;

/// <summary>
/// Terminal decoration. Values with units are formatted by Core's <c>QuantityFormat</c>, the one
/// formatter shared with check wording, reports and logs.
/// </summary>
public static class Display
{
    /// <summary>Wraps <paramref name="text"/> in an ANSI colour when <paramref name="enabled"/>.</summary>
    public static string Colour(string text, ConsoleColour colour, bool enabled) =>
        enabled ? $"\u001b[{(int)colour}m{text}\u001b[0m" : text;
}
