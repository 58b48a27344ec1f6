using System.Text.RegularExpressions;
using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Errors;

namespace BenchRunner.Instruments.Profiles;

/// <summary>
/// How a profile learns the instrument's identity (<c>identity:</c>): a query whose reply is
/// matched by a pattern with named groups <c>maker</c>, <c>model</c>, <c>serial</c> and
/// <c>firmware</c>, or fixed values, or both (fixed values fill the fields the pattern lacks).
/// A field given by neither is "0", as in IEEE 488.2 §10.14.
/// </summary>
public sealed class IdentityRule
{
    internal static readonly IReadOnlyList<string> Fields = ["maker", "model", "serial", "firmware"];

    internal IdentityRule(CommandTemplate? query, Regex? reply, InstrumentIdentity fixedValues)
    {
        Query = query;
        Reply = reply;
        Fixed = fixedValues;
    }

    /// <summary>The command that asks for the identity; null when the identity is fixed.</summary>
    public CommandTemplate? Query { get; }

    /// <summary>The pattern the reply must match; null when the identity is fixed.</summary>
    public Regex? Reply { get; }

    /// <summary>The fixed values ("0" where none is given).</summary>
    public InstrumentIdentity Fixed { get; }

    /// <summary>The identity from the lines of the query's reply: the first line the pattern matches.</summary>
    public ParseResult<InstrumentIdentity> FromReply(IReadOnlyList<string> lines)
    {
        ArgumentNullException.ThrowIfNull(lines);
        if (Reply is null)
        {
            return ParseResult<InstrumentIdentity>.Ok(Fixed);
        }

        foreach (var line in lines)
        {
            var match = Reply.Match(line);
            if (match.Success)
            {
                string Field(string name, string fallback) =>
                    match.Groups[name] is { Success: true } g && g.Value.Trim().Length > 0 ? g.Value.Trim() : fallback;
                return ParseResult<InstrumentIdentity>.Ok(new InstrumentIdentity(
                    Field("maker", Fixed.Maker), Field("model", Fixed.Model), Field("serial", Fixed.Serial), Field("firmware", Fixed.Firmware)));
            }
        }

        var shown = string.Join("\\n", lines.Select(l => InstrumentException.Printable(l, 80)));
        return ParseResult<InstrumentIdentity>.Fail($"the identity reply \"{shown}\" does not match the profile's pattern {Reply}");
    }
}
