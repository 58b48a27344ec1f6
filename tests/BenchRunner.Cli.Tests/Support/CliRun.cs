namespace BenchRunner.Cli.Tests.Support;

/// <summary>The outcome of running the command line in-process.</summary>
public sealed record CliRun(int ExitCode, string Out, string Error)
{
    /// <summary>Runs <c>benchrunner</c> with <paramref name="args"/> and captures both output streams.</summary>
    public static CliRun Of(params string[] args)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        int code = CliApplication.Run(args, new CliConsole(output, error));
        return new CliRun(code, output.ToString(), error.ToString());
    }

    /// <summary>As <see cref="Of"/>, with <paramref name="input"/> as what the operator types on standard input.</summary>
    public static CliRun WithInput(string input, params string[] args)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        int code = CliApplication.Run(args, new CliConsole(output, error) { In = new StringReader(input) });
        return new CliRun(code, output.ToString(), error.ToString());
    }
}
