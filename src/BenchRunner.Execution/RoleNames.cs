using System.Text.RegularExpressions;

namespace BenchRunner.Execution;

/// <summary>The rule for role names (<c>vna</c>, <c>sa</c>, <c>gen-2</c>): a letter, then letters, digits, '-' or '_'.</summary>
public static partial class RoleNames
{
    /// <summary>What a role name looks like, for messages.</summary>
    public const string Rule = "a letter, then letters, digits, '-' or '_', e.g. \"vna\" or \"gen-2\"";

    /// <summary>True when <paramref name="name"/> is a valid role name.</summary>
    public static bool IsValid(string name) => Pattern().IsMatch(name);

    [GeneratedRegex("^[A-Za-z][A-Za-z0-9_-]*$")]
    private static partial Regex Pattern();
}
