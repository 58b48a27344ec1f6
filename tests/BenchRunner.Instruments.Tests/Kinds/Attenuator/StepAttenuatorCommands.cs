using System.Globalization;
using System.Text.RegularExpressions;
using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Profiles;

namespace BenchRunner.Instruments.Tests.Kinds.Attenuator;

/// <summary>
/// The toy kind's section of a raw profile:
/// <code>
/// step-attenuator:
///   set: att {attenuation:db}
///   query: att?
///   reply: '^att (?&lt;db&gt;\d+(\.\d+)?)$'
/// </code>
/// </summary>
public sealed class StepAttenuatorCommands
{
    private static readonly IReadOnlyList<string> Keys = ["set", "query", "reply"];
    private static readonly IReadOnlyList<TemplateVariable> SetVariables = [new("attenuation", TemplateValueKind.Ratio)];

    private StepAttenuatorCommands(CommandTemplate set, CommandTemplate query, Regex reply)
    {
        Set = set;
        Query = query;
        Reply = reply;
    }

    /// <summary>Sets the attenuation (<c>{attenuation}</c>).</summary>
    public CommandTemplate Set { get; }

    /// <summary>Asks for the attenuation.</summary>
    public CommandTemplate Query { get; }

    /// <summary>The reply to <see cref="Query"/>, with the attenuation in dB in the group <c>db</c>.</summary>
    public Regex Reply { get; }

    /// <summary>Reads the section; null when a problem was found (reported with its place).</summary>
    public static StepAttenuatorCommands? Read(ProfileSectionReader reader)
    {
        var section = reader.Open(Keys);
        if (section is null)
        {
            return null;
        }

        var set = reader.Command(section, "set", SetVariables, "the command that sets the attenuation, e.g. \"set: att {attenuation:db}\"");
        if (set is not null && !set.Uses("attenuation"))
        {
            reader.Problems.Add(section.ValueLocation("set"), "\"set\" must send the value it sets; use {attenuation}");
            set = null;
        }

        var query = reader.Command(section, "query", [], "the command that asks for the attenuation, e.g. \"query: att?\"");
        var reply = reader.Pattern(section, "reply", ["db"], "a pattern for the answer with the group (?<db>...)");
        return set is not null && query is not null && reply is not null ? new StepAttenuatorCommands(set, query, reply) : null;
    }

    /// <summary>The attenuation in a reply.</summary>
    public ParseResult<Ratio> Parse(IReadOnlyList<string> lines)
    {
        var match = lines.Count == 1 ? Reply.Match(lines[0].Trim()) : Match.Empty;
        return match.Success && double.TryParse(match.Groups["db"].Value, NumberStyles.Float, CultureInfo.InvariantCulture, out var db)
            ? ParseResult<Ratio>.Ok(Ratio.FromDecibels(db))
            : ParseResult<Ratio>.Fail($"expected one line matching {Reply}");
    }
}
