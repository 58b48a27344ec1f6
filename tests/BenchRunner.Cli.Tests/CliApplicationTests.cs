using BenchRunner.Cli.Tests.Support;

namespace BenchRunner.Cli.Tests;

public sealed class CliApplicationTests
{
    [Fact]
    public void Run_WithNoArguments_ShowsTheVerbsAndSucceeds()
    {
        var run = CliRun.Of();

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("check", run.Out);
        Assert.Contains("ports", run.Out);
    }

    [Fact]
    public void Run_UnknownVerb_IsBadInputWithAHelpHint()
    {
        var run = CliRun.Of("chekc");

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("chekc", run.Error);
        Assert.Contains("benchrunner --help", run.Error);
    }
}
