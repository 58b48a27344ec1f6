using System.Text.RegularExpressions;
using BenchRunner.Core.Yaml;

namespace BenchRunner.Instruments.Profiles;

/// <summary>Reads the regular expressions of a profile, reporting a bad pattern at the character concerned.</summary>
internal static class PatternReader
{
    // A reply line is short; a pattern that takes longer than this on one is broken, not slow.
    private static readonly TimeSpan MatchTimeout = TimeSpan.FromSeconds(1);

    /// <summary>
    /// Compiles <paramref name="text"/>. When <paramref name="groups"/> is given, every named group
    /// must be one of them.
    /// </summary>
    public static Regex? Read(YamlText text, string key, IReadOnlyList<string>? groups, YamlProblems problems)
    {
        Regex regex;
        try
        {
            regex = new Regex(text.Value, RegexOptions.CultureInvariant, MatchTimeout);
        }
        catch (RegexParseException e)
        {
            problems.Add(YamlLocations.Within(text, Math.Max(0, e.Offset - 1)),
                $"not a valid pattern for \"{key}\": {Words(e.Error.ToString())} (a .NET regular expression is expected)");
            return null;
        }

        if (groups is null)
        {
            return regex;
        }

        bool ok = true;
        foreach (var name in regex.GetGroupNames().Where(n => !n.All(char.IsAsciiDigit)))
        {
            if (!groups.Contains(name, StringComparer.Ordinal))
            {
                problems.Add(text.Location, $"unknown group \"{name}\" in the pattern for \"{key}\"; expected {string.Join(", ", groups)}");
                ok = false;
            }
        }

        return ok ? regex : null;
    }

    /// <summary>The named groups of <paramref name="regex"/>.</summary>
    public static IEnumerable<string> NamedGroups(Regex regex) => regex.GetGroupNames().Where(n => !n.All(char.IsAsciiDigit));

    // "InsufficientClosingParentheses" -> "insufficient closing parentheses"
    private static string Words(string name) =>
        string.Concat(name.Select((c, i) => char.IsUpper(c) && i > 0 ? " " + char.ToLowerInvariant(c) : char.ToLowerInvariant(c).ToString()));
}
