using System.Text.RegularExpressions;
using BenchRunner.Core.Yaml;
using BenchRunner.Instruments.Adapters;
using BenchRunner.Instruments.Kinds;

namespace BenchRunner.Instruments.Profiles;

/// <summary>
/// What an <see cref="InstrumentKind"/> is given to read its section of an <c>adapter: raw</c>
/// driver profile: the profile, and readers for commands and reply patterns that check every
/// placeholder and report each problem at its place in the file.
/// </summary>
public sealed class ProfileSectionReader
{
    internal ProfileSectionReader(InstrumentKind kind, StrictMap profile, ProfileReadContext context)
    {
        Kind = kind;
        Profile = profile;
        Context = context;
    }

    /// <summary>The kind whose section is read; its <see cref="InstrumentKind.Word"/> is the section's key.</summary>
    public InstrumentKind Kind { get; }

    /// <summary>The whole profile (the section is under the key <see cref="InstrumentKind.Word"/>).</summary>
    public StrictMap Profile { get; }

    /// <summary>Where problems are reported; the profile is refused when any is.</summary>
    public YamlProblems Problems => Context.Problems;

    internal ProfileReadContext Context { get; }

    /// <summary>
    /// Opens the section as a mapping with the keys <paramref name="keys"/>, reporting any other key.
    /// A key of <paramref name="foreign"/> (a key of scpi profiles) is reported with its hint instead.
    /// </summary>
    /// <returns>The section, or null when it is not a mapping (reported).</returns>
    public StrictMap? Open(IReadOnlyList<string> keys, IReadOnlyDictionary<string, string>? foreign = null) =>
        ForeignKeys.Mapping(Profile, Kind.Word, keys, AdapterKind.Raw, foreign ?? ForeignKeys.Nothing);

    /// <summary>
    /// Reads the command template under <paramref name="key"/>; its placeholders may name only
    /// <paramref name="variables"/>. Null when absent (reported when <paramref name="missingHint"/> is given) or malformed.
    /// </summary>
    public CommandTemplate? Command(StrictMap section, string key, IReadOnlyList<TemplateVariable> variables, string? missingHint = null)
    {
        ArgumentNullException.ThrowIfNull(section);
        return Context.Command(section, key, variables, missingHint);
    }

    /// <summary>Reads one command or a list of commands under <paramref name="key"/>: empty when absent, null when one is malformed.</summary>
    public IReadOnlyList<CommandTemplate>? Commands(StrictMap section, string key, IReadOnlyList<TemplateVariable> variables, string? missingHint = null)
    {
        ArgumentNullException.ThrowIfNull(section);
        return Context.Commands(section, key, variables, missingHint);
    }

    /// <summary>
    /// Reads the regular expression under <paramref name="key"/>, whose named groups must be among
    /// <paramref name="groups"/>. Null when absent (reported when <paramref name="missingHint"/> is given) or not a valid pattern.
    /// </summary>
    public Regex? Pattern(StrictMap section, string key, IReadOnlyList<string> groups, string? missingHint = null)
    {
        ArgumentNullException.ThrowIfNull(section);
        var text = section.Text(key, missingHint);
        return text is null ? null : PatternReader.Read(text, key, groups, Problems);
    }
}
