using System.CommandLine;

namespace BenchRunner.Cli.Commands;

/// <summary>Options shared by several verbs, so that they are spelled and described alike.</summary>
public static class CommonOptions
{
    /// <summary>The name of the JSON output switch; the error handler looks for it too.</summary>
    public const string JsonName = "--json";

    /// <summary><c>--json</c>: one JSON document on standard output, messages on standard error.</summary>
    public static Option<bool> Json() => new(JsonName)
    {
        Description = "Print one JSON document on standard output instead of the text report; messages go to standard error.",
    };
}
