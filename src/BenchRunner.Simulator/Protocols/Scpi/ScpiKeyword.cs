namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>
/// A keyword written the SCPI way, its short form in upper case and the rest of its long form in
/// lower case (<c>FREQuency</c>): it matches only the short form <c>FREQ</c> or the whole long form
/// <c>FREQUENCY</c>, in any letter case (SCPI-1999 Vol 1 §6.2.1, from memory).
/// </summary>
internal sealed class ScpiKeyword
{
    private ScpiKeyword(string written, string shortForm, string longForm)
    {
        Written = written;
        Short = shortForm;
        Long = longForm;
    }

    /// <summary>The keyword as declared, e.g. <c>FREQuency</c>.</summary>
    public string Written { get; }

    /// <summary>The short form in upper case, e.g. <c>FREQ</c>.</summary>
    public string Short { get; }

    /// <summary>The long form in upper case, e.g. <c>FREQUENCY</c>.</summary>
    public string Long { get; }

    /// <summary>
    /// Reads a declared keyword: a letter, then upper-case letters or digits (the short form), then
    /// lower-case letters or digits. Digits are allowed for parameter words such as <c>S21</c>.
    /// </summary>
    /// <exception cref="ArgumentException">Not written that way.</exception>
    public static ScpiKeyword Parse(string written)
    {
        ArgumentException.ThrowIfNullOrEmpty(written);
        if (!char.IsAsciiLetterUpper(written[0]))
        {
            throw new ArgumentException($"The keyword \"{written}\" must start with an upper-case letter.", nameof(written));
        }

        int upper = 0;
        while (upper < written.Length && (char.IsAsciiLetterUpper(written[upper]) || char.IsAsciiDigit(written[upper])))
        {
            upper++;
        }

        for (int i = upper; i < written.Length; i++)
        {
            if (!char.IsAsciiLetterLower(written[i]) && !char.IsAsciiDigit(written[i]))
            {
                throw new ArgumentException(
                    $"The keyword \"{written}\" must be its short form in upper case followed by the rest in lower case.", nameof(written));
            }
        }

        return new ScpiKeyword(written, written[..upper], written.ToUpperInvariant());
    }

    /// <summary>True when <paramref name="word"/> is the short or the long form (letter case ignored).</summary>
    public bool Matches(string word) =>
        string.Equals(word, Short, StringComparison.OrdinalIgnoreCase) || string.Equals(word, Long, StringComparison.OrdinalIgnoreCase);

    /// <inheritdoc/>
    public override string ToString() => Written;
}
