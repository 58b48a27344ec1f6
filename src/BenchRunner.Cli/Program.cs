namespace BenchRunner.Cli;

/// <summary>The <c>benchrunner</c> executable.</summary>
public static class Program
{
    /// <summary>Runs the command line and returns the process exit code (see <see cref="ExitCodes"/>).</summary>
    public static int Main(string[] args)
    {
        var console = new CliConsole(Console.Out, Console.Error, UseColour: !Console.IsOutputRedirected && Environment.GetEnvironmentVariable("NO_COLOR") is null)
        {
            In = Console.In,
            InIsTerminal = !Console.IsInputRedirected,
            IsTerminal = !Console.IsOutputRedirected,
        };
        return CliApplication.Run(args, console);
    }
}
