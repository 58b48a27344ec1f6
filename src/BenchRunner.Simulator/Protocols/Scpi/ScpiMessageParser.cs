using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;

namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>
/// Cuts a program message into units and parses each one (IEEE 488.2 §7: program message units
/// separated by <c>;</c>, a header, white space, parameters separated by <c>,</c>). Failures are
/// <see cref="ScpiCommandException"/>s carrying −102 "Syntax error".
/// </summary>
internal static partial class ScpiMessageParser
{
    /// <summary>
    /// Splits a program message at the semicolons outside quoted strings. An unterminated string
    /// runs to the end of the message, where parsing its unit then fails.
    /// </summary>
    public static List<string> SplitUnits(string message) => SplitOutsideQuotes(message, ';');

    /// <summary>Parses one program message unit (not empty).</summary>
    /// <exception cref="ScpiCommandException">−102 "Syntax error" with what was wrong.</exception>
    public static ScpiProgramUnit ParseUnit(string text)
    {
        var unit = text.Trim(' ', '\t');
        int gap = unit.IndexOfAny([' ', '\t']);
        var header = gap < 0 ? unit : unit[..gap];
        var rest = gap < 0 ? "" : unit[gap..].Trim(' ', '\t');

        bool query = header.EndsWith('?');
        var body = query ? header[..^1] : header;
        if (body.Contains('?', StringComparison.Ordinal))
        {
            throw Syntax($"a '?' inside the header \"{header}\"");
        }

        var parameters = ParseParameters(rest);
        if (body.StartsWith('*'))
        {
            var name = body[1..];
            if (name.Length == 0 || !name.All(char.IsAsciiLetter))
            {
                throw Syntax($"\"{header}\" is not a common command header");
            }

            return new ScpiProgramUnit(header, IsCommon: true, IsRooted: false, [new ScpiMnemonic(name.ToUpperInvariant(), null)], query, parameters);
        }

        bool rooted = body.StartsWith(':');
        var keywords = (rooted ? body[1..] : body).Split(':');
        var mnemonics = new List<ScpiMnemonic>(keywords.Length);
        foreach (var keyword in keywords)
        {
            mnemonics.Add(ParseMnemonic(keyword, header));
        }

        return new ScpiProgramUnit(header, IsCommon: false, rooted, mnemonics, query, parameters);
    }

    private static ScpiMnemonic ParseMnemonic(string keyword, string header)
    {
        var match = MnemonicPattern().Match(keyword);
        if (!match.Success)
        {
            throw Syntax(keyword.Length == 0 ? $"an empty keyword in \"{header}\"" : $"\"{keyword}\" is not a header keyword");
        }

        int? suffix = null;
        if (match.Groups[2].Length > 0)
        {
            if (!int.TryParse(match.Groups[2].Value, NumberStyles.None, CultureInfo.InvariantCulture, out var value))
            {
                throw new ScpiCommandException(ScpiStandardErrors.HeaderSuffixOutOfRange, keyword);
            }

            suffix = value;
        }

        return new ScpiMnemonic(match.Groups[1].Value.ToUpperInvariant(), suffix);
    }

    private static List<ScpiParameter> ParseParameters(string text)
    {
        var parameters = new List<ScpiParameter>();
        if (text.Length == 0)
        {
            return parameters;
        }

        foreach (var raw in SplitOutsideQuotes(text, ','))
        {
            var element = raw.Trim(' ', '\t');
            if (element.Length == 0)
            {
                throw Syntax("an empty parameter");
            }

            parameters.Add(ParseParameter(element));
        }

        return parameters;
    }

    private static ScpiParameter ParseParameter(string element)
    {
        char first = element[0];
        if (first is '"' or '\'')
        {
            return new ScpiParameter(ScpiParameterKind.String, element, double.NaN, null, Unquote(element));
        }

        if (first is '+' or '-' or '.' || char.IsAsciiDigit(first))
        {
            var match = NumberPattern().Match(element);
            if (!match.Success)
            {
                throw Syntax($"\"{element}\" is not a number");
            }

            double number = double.Parse(match.Groups[1].Value, NumberStyles.Float, CultureInfo.InvariantCulture);
            var suffix = match.Groups[2].Length > 0 ? match.Groups[2].Value.ToUpperInvariant() : null;
            return new ScpiParameter(ScpiParameterKind.Numeric, element, number, suffix, "");
        }

        if (WordPattern().IsMatch(element))
        {
            return new ScpiParameter(ScpiParameterKind.Character, element, double.NaN, null, element.ToUpperInvariant());
        }

        throw Syntax($"\"{element}\" is not a parameter");
    }

    private static string Unquote(string element)
    {
        char quote = element[0];
        var text = new StringBuilder(element.Length);
        for (int i = 1; i < element.Length; i++)
        {
            if (element[i] != quote)
            {
                text.Append(element[i]);
            }
            else if (i + 1 < element.Length && element[i + 1] == quote)
            {
                text.Append(quote);
                i++;
            }
            else if (i == element.Length - 1)
            {
                return text.ToString();
            }
            else
            {
                throw Syntax("text after the closing quote of a string");
            }
        }

        throw Syntax("a string without its closing quote");
    }

    private static List<string> SplitOutsideQuotes(string text, char separator)
    {
        var parts = new List<string>();
        char? quote = null;
        int start = 0;
        for (int i = 0; i < text.Length; i++)
        {
            char c = text[i];
            if (quote is { } open)
            {
                if (c == open)
                {
                    quote = null;
                }
            }
            else if (c is '"' or '\'')
            {
                quote = c;
            }
            else if (c == separator)
            {
                parts.Add(text[start..i]);
                start = i + 1;
            }
        }

        parts.Add(text[start..]);
        return parts;
    }

    private static ScpiCommandException Syntax(string detail) => new(ScpiStandardErrors.SyntaxError, detail);

    // IEEE 488.2 §7.6.1: a program mnemonic is a letter followed by letters, digits and underscores;
    // SCPI reads trailing digits as the numeric suffix.
    [GeneratedRegex(@"^([A-Za-z](?:[A-Za-z0-9_]*[A-Za-z_])?)([0-9]*)$", RegexOptions.CultureInvariant)]
    private static partial Regex MnemonicPattern();

    // IEEE 488.2 §7.7.2 decimal numeric program data, then an optional suffix (§7.7.3).
    [GeneratedRegex(@"^([+-]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)(?:[eE][+-]?[0-9]+)?)[ \t]*([A-Za-z]+)?$", RegexOptions.CultureInvariant)]
    private static partial Regex NumberPattern();

    [GeneratedRegex(@"^[A-Za-z][A-Za-z0-9_]*$", RegexOptions.CultureInvariant)]
    private static partial Regex WordPattern();
}
