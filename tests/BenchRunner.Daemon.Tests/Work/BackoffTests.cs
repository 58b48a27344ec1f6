using BenchRunner.Daemon.Work;

namespace BenchRunner.Daemon.Tests.Work;

public sealed class BackoffTests
{
    [Theory]
    [InlineData(1, 5)]
    [InlineData(2, 10)]
    [InlineData(3, 20)]
    [InlineData(6, 160)]
    [InlineData(7, 300)]
    [InlineData(1000, 300)]
    public void After_DoublesFromTheFirstWaitUpToTheCap(int failures, double seconds)
    {
        // Exponential backoff with a cap: common practice, no source.
        var backoff = new Backoff(TimeSpan.FromSeconds(5), TimeSpan.FromMinutes(5));

        Assert.Equal(TimeSpan.FromSeconds(seconds), backoff.After(failures));
    }

    [Fact]
    public void After_NoFailure_IsRefused() =>
        Assert.Throws<ArgumentOutOfRangeException>(() => new Backoff(TimeSpan.FromSeconds(1), TimeSpan.FromSeconds(2)).After(0));
}
