namespace BenchRunner.Cli;

/// <summary>The <c>benchrunner</c> executable.</summary>
public static class Program
{
    /// <summary>Runs the command line and returns the process exit code.</summary>
    public static int Main(string[] args) => args.Length == 0 ? 0 : 2;
}
