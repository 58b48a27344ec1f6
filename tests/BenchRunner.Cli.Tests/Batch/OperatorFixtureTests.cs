using BenchRunner.Cli.Batch;

namespace BenchRunner.Cli.Tests.Batch;

public sealed class OperatorFixtureTests
{
    [Theory]
    [InlineData("\n", true, null)]
    [InlineData("ok\n", true, null)]
    [InlineData(" SKIP \n", false, "left untested by the operator")]
    [InlineData("", false, "the input ended before the board was confirmed as connected")]
    public async Task PrepareAsync_AsksTheOperatorToConnectTheBoard(string typed, bool ready, string? reason)
    {
        var prompt = new StringWriter();
        var fixture = new OperatorFixture(new StringReader(typed), prompt);

        var result = await fixture.PrepareAsync("PSF-24-0007", CancellationToken.None);

        Assert.Equal(ready, result.Ready);
        Assert.Equal(reason, result.Reason);
        Assert.Contains("Connect board PSF-24-0007", prompt.ToString());
    }
}
