using BenchmarkDotNet.Running;

namespace BenchRunner.Benchmarks;

/// <summary>Runs the benchmarks chosen on the command line (BenchmarkDotNet's own options, e.g. --filter).</summary>
public static class Program
{
    /// <summary>The entry point.</summary>
    public static void Main(string[] args) => BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
}
