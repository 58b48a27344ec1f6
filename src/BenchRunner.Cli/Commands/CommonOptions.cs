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

    /// <summary>How <c>--db</c> reads on verbs that write runs: created if missing, with the default named.</summary>
    public static string WrittenDatabase => $"The result database (created if missing). Default {ResultsCommand.DefaultDatabase}.";

    /// <summary>How <c>--db</c> reads on verbs that only read runs.</summary>
    public static string ReadDatabase => $"The result database. Default {ResultsCommand.DefaultDatabase} in the current folder.";

    /// <summary><c>--db FILE</c>: the result database, <see cref="ResultsCommand.DefaultDatabase"/> unless given.</summary>
    public static Option<string> Database(string description) => new("--db")
    {
        Description = description,
        HelpName = "FILE",
        DefaultValueFactory = _ => ResultsCommand.DefaultDatabase,
    };

    /// <summary><c>--bench BENCH</c>, required: the bench file naming the instruments.</summary>
    public static Option<string> RequiredBench(string description) => new("--bench")
    {
        Description = description,
        HelpName = "BENCH",
        Required = true,
    };

    /// <summary><c>--dut SERIAL</c>: the board's serial number.</summary>
    public static Option<string?> Dut(string description) => new("--dut") { Description = description, HelpName = "SERIAL" };

    /// <summary><c>--operator NAME</c>: who does the work, stored with the run.</summary>
    public static Option<string?> Operator(string description) => new("--operator") { Description = description, HelpName = "NAME" };
}
