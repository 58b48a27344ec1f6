namespace BenchRunner.Instruments.Profiles;

/// <summary>
/// A name a command template may use, with the kind of value it stands for: <c>{attenuation}</c> in a
/// template is allowed only when the section's reader is given such a variable, and is rendered from
/// the <see cref="TemplateArguments"/> value of that name.
/// </summary>
/// <param name="Name">The placeholder's name.</param>
/// <param name="Kind">The kind of value; it decides which placeholder types fit.</param>
public sealed record TemplateVariable(string Name, TemplateValueKind Kind)
{
    /// <summary>The type used when a placeholder gives none (<c>{points}</c>).</summary>
    public PlaceholderType DefaultType => Kind switch
    {
        TemplateValueKind.Frequency => PlaceholderType.Hz,
        TemplateValueKind.Level => PlaceholderType.Dbm,
        TemplateValueKind.Ratio => PlaceholderType.Db,
        TemplateValueKind.Count => PlaceholderType.Int,
        _ => PlaceholderType.Bool,
    };

    /// <summary>True when <paramref name="type"/> can write this variable's value.</summary>
    public bool Accepts(PlaceholderType type) => Kind switch
    {
        TemplateValueKind.Frequency => type is PlaceholderType.Hz or PlaceholderType.Khz or PlaceholderType.Mhz or PlaceholderType.Ghz,
        TemplateValueKind.Level => type is PlaceholderType.Dbm,
        TemplateValueKind.Ratio => type is PlaceholderType.Db,
        TemplateValueKind.Count => type is PlaceholderType.Int,
        _ => type is PlaceholderType.Bool,
    };

    /// <summary>The types that fit, for messages.</summary>
    public string AcceptedTypes => Kind switch
    {
        TemplateValueKind.Frequency => "hz, khz, mhz or ghz",
        TemplateValueKind.Level => "dbm",
        TemplateValueKind.Ratio => "db",
        TemplateValueKind.Count => "int",
        _ => "bool",
    };

    /// <summary>What the value is, for messages: "a frequency", "a level in dBm", ...</summary>
    public string Description => Kind switch
    {
        TemplateValueKind.Frequency => "a frequency",
        TemplateValueKind.Level => "a level in dBm",
        TemplateValueKind.Ratio => "a ratio in dB",
        TemplateValueKind.Count => "a count",
        _ => "a switch",
    };
}
