using System.Text;
using BenchRunner.Core.Yaml;

namespace BenchRunner.Instruments.Profiles;

/// <summary>Reads the text of a command template, reporting each bad placeholder at its column.</summary>
internal static class TemplateParser
{
    private static readonly IReadOnlyList<(string Word, PlaceholderType Type)> TypeWords =
    [
        ("hz", PlaceholderType.Hz), ("khz", PlaceholderType.Khz), ("mhz", PlaceholderType.Mhz), ("ghz", PlaceholderType.Ghz),
        ("dbm", PlaceholderType.Dbm), ("db", PlaceholderType.Db), ("int", PlaceholderType.Int), ("bool", PlaceholderType.Bool),
    ];

    /// <summary>Reads the template in <paramref name="text"/>; null (with problems reported) when it is malformed.</summary>
    public static CommandTemplate? Read(YamlText text, string what, IReadOnlyList<TemplateVariable> variables, BoolWords words, YamlProblems problems)
    {
        var (template, errors) = Parse(text.Value, what, variables, words);
        foreach (var (index, detail) in errors)
        {
            problems.Add(YamlLocations.Within(text, index), detail);
        }

        return errors.Count == 0 ? template : null;
    }

    /// <summary>Parses template text; each error has the 0-based index of the character it concerns.</summary>
    public static (CommandTemplate? Template, List<(int Index, string Detail)> Errors) Parse(
        string text, string what, IReadOnlyList<TemplateVariable> variables, BoolWords words)
    {
        var errors = new List<(int, string)>();
        var parts = new List<object>();
        var literal = new StringBuilder();
        int i = 0;
        while (i < text.Length)
        {
            char c = text[i];
            if (c == '{' && i + 1 < text.Length && text[i + 1] == '{')
            {
                literal.Append('{');
                i += 2;
                continue;
            }

            if (c == '}')
            {
                if (i + 1 < text.Length && text[i + 1] == '}')
                {
                    literal.Append('}');
                    i += 2;
                    continue;
                }

                errors.Add((i, $"a lone \"}}\" in {what}; write \"}}}}\" for a brace, or open a placeholder with \"{{\""));
                i++;
                continue;
            }

            if (c != '{')
            {
                literal.Append(c);
                i++;
                continue;
            }

            int close = text.IndexOf('}', i + 1);
            if (close < 0)
            {
                errors.Add((i, $"unclosed \"{{\" in {what}; a placeholder is written {{name}} or {{name:type}}, and \"{{{{\" is a brace"));
                break;
            }

            if (literal.Length > 0)
            {
                parts.Add(literal.ToString());
                literal.Clear();
            }

            var placeholder = ReadPlaceholder(text, i, close, what, variables, errors);
            if (placeholder is not null)
            {
                parts.Add(placeholder);
            }

            i = close + 1;
        }

        if (literal.Length > 0)
        {
            parts.Add(literal.ToString());
        }

        return (errors.Count == 0 ? new CommandTemplate(text, parts, words) : null, errors);
    }

    private static Placeholder? ReadPlaceholder(string text, int open, int close, string what,
        IReadOnlyList<TemplateVariable> variables, List<(int, string)> errors)
    {
        var inner = text[(open + 1)..close];
        int colon = inner.IndexOf(':');
        var name = (colon < 0 ? inner : inner[..colon]).Trim();
        int nameAt = open + 1 + (inner.Length - inner.TrimStart().Length);
        if (name.Length == 0)
        {
            errors.Add((open, $"an empty placeholder \"{{{inner}}}\" in {what}; expected a name such as {Example(variables)}"));
            return null;
        }

        var variable = variables.FirstOrDefault(v => v.Name == name);
        if (variable is null)
        {
            errors.Add((nameAt, variables.Count == 0
                ? $"{what} takes no placeholders, found \"{{{inner}}}\"; write \"{{{{\" for a brace"
                : $"unknown placeholder \"{name}\" in {what}; expected one of {string.Join(", ", variables.Select(v => v.Name))}"));
            return null;
        }

        if (colon < 0)
        {
            return new Placeholder(name, variable.DefaultType, open);
        }

        var typeText = inner[(colon + 1)..];
        var typeWord = typeText.Trim();
        int typeAt = open + 1 + colon + 1 + (typeText.Length - typeText.TrimStart().Length);
        var found = TypeWords.Where(t => t.Word == typeWord).Select(t => (PlaceholderType?)t.Type).FirstOrDefault();
        if (found is not { } type)
        {
            errors.Add((typeAt, $"unknown placeholder type \"{typeWord}\" in \"{{{inner}}}\"; expected one of {string.Join(", ", TypeWords.Select(t => t.Word))}"));
            return null;
        }

        if (!variable.Accepts(type))
        {
            errors.Add((typeAt, $"\"{{{inner}}}\": {name} is {variable.Description}, which is written as {variable.AcceptedTypes}, not {typeWord}"));
            return null;
        }

        return new Placeholder(name, type, open);
    }

    private static string Example(IReadOnlyList<TemplateVariable> variables) =>
        variables.Count == 0 ? "(none here)" : $"{{{variables[0].Name}}}";
}
