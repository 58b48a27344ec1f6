using BenchRunner.Core.Yaml;

namespace BenchRunner.Instruments.Profiles;

/// <summary>What the section readers of one profile share: the problems, the switch words and the prompt.</summary>
internal sealed class ProfileReadContext(YamlProblems problems)
{
    public YamlProblems Problems { get; } = problems;

    public BoolWords Words { get; set; } = BoolWords.Default;

    public string? Prompt { get; set; }

    /// <summary>Reads one command template; control characters (a terminator in the middle) are refused.</summary>
    public CommandTemplate? Template(YamlText text, string what, IReadOnlyList<TemplateVariable> variables)
    {
        for (int i = 0; i < text.Value.Length; i++)
        {
            if (char.IsControl(text.Value[i]))
            {
                Problems.Add(YamlLocations.Within(text, i),
                    $"{what} contains the control character \\x{(int)text.Value[i]:X2}; a command is one line, and its terminator is set by \"framing: command-end\"");
                return null;
            }
        }

        return TemplateParser.Read(text, what, variables, Words, Problems);
    }

    /// <summary>Reads the command under <paramref name="key"/>; null when absent or malformed.</summary>
    public CommandTemplate? Command(StrictMap map, string key, IReadOnlyList<TemplateVariable> variables, string? missingHint = null)
    {
        var text = map.Text(key, missingHint);
        return text is null ? null : Template(text, $"\"{key}\"", variables);
    }

    /// <summary>Reads one command or a list of commands under <paramref name="key"/>; empty when absent, null when one is malformed.</summary>
    public List<CommandTemplate>? Commands(StrictMap map, string key, IReadOnlyList<TemplateVariable> variables, string? missingHint = null)
    {
        var value = missingHint is null ? map.Get(key) : map.Require(key, missingHint);
        var commands = new List<CommandTemplate>();
        if (value is null)
        {
            return commands;
        }

        var items = value is YamlList list ? list.Items : [value];
        bool ok = true;
        foreach (var item in items)
        {
            if (item is YamlText { IsNull: false } text && !string.IsNullOrWhiteSpace(text.Value))
            {
                if (Template(text, $"\"{key}\"", variables) is { } template)
                {
                    commands.Add(template);
                }
                else
                {
                    ok = false;
                }
            }
            else
            {
                ok = false;
                Problems.Add(item is YamlText { IsNull: true } ? map.ValueLocation(key) : item.Location,
                    $"expected a command, or a list of commands, for \"{key}\"; found {StrictMap.Describe(item)}");
            }
        }

        return ok ? commands : null;
    }
}
