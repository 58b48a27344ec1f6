using BenchRunner.Daemon.Inbox;

namespace BenchRunner.Daemon.Tests.Inbox;

public sealed class InboxScannerTests
{
    private static readonly HashSet<string> None = [];

    [Fact]
    public void Scan_NewFile_IsReadyOnlyOnceUnchangedForTheSettleTime()
    {
        using var dir = new TempDirectory();
        var time = new ManualTimeProvider();
        var scanner = new InboxScanner(dir.Path, TimeSpan.FromSeconds(2), time);
        var plan = dir.Write("board.yaml", "plan: board\n");

        Assert.Empty(scanner.Scan(None));
        time.Advance(TimeSpan.FromSeconds(1));
        Assert.Empty(scanner.Scan(None));
        time.Advance(TimeSpan.FromSeconds(1));
        Assert.Equal([plan], scanner.Scan(None));
    }

    [Fact]
    public void Scan_FileThatGrows_StartsItsSettleTimeAgain()
    {
        using var dir = new TempDirectory();
        var time = new ManualTimeProvider();
        var scanner = new InboxScanner(dir.Path, TimeSpan.FromSeconds(2), time);
        var plan = dir.Write("board.yaml", "plan: board\n");
        Assert.Empty(scanner.Scan(None));

        time.Advance(TimeSpan.FromSeconds(1.5));
        File.AppendAllText(plan, "roles:\n");
        Assert.Empty(scanner.Scan(None));
        time.Advance(TimeSpan.FromSeconds(1.5));
        Assert.Empty(scanner.Scan(None));
        time.Advance(TimeSpan.FromSeconds(0.5));
        Assert.Equal([plan], scanner.Scan(None));
    }

    [Fact]
    public void Scan_FileHeldExclusivelyByItsWriter_IsNotReady()
    {
        using var dir = new TempDirectory();
        var time = new ManualTimeProvider();
        var scanner = new InboxScanner(dir.Path, TimeSpan.Zero, time);
        var plan = dir.Write("board.yaml", "plan: board\n");

        using (new FileStream(plan, FileMode.Open, FileAccess.Write, FileShare.None))
        {
            Assert.Empty(scanner.Scan(None));
        }

        Assert.Equal([plan], scanner.Scan(None));
    }

    [Theory]
    [InlineData(".board.yaml")]
    [InlineData("~board.yaml")]
    [InlineData("board.yaml.part")]
    [InlineData("board.yaml.tmp")]
    [InlineData("board.txt")]
    public void Scan_HiddenTemporaryOrOtherFiles_AreNeverTaken(string name)
    {
        using var dir = new TempDirectory();
        var scanner = new InboxScanner(dir.Path, TimeSpan.Zero, new ManualTimeProvider());
        dir.Write(name, "plan: board\n");

        Assert.Empty(scanner.Scan(None));
    }

    [Fact]
    public void Scan_FilesAlreadyTaken_AreLeftOut()
    {
        using var dir = new TempDirectory();
        var scanner = new InboxScanner(dir.Path, TimeSpan.Zero, new ManualTimeProvider());
        var taken = dir.Write("a.yaml", "plan: a\n");
        var free = dir.Write("b.yml", "plan: b\n");

        Assert.Equal([free], scanner.Scan(new HashSet<string> { taken }));
    }
}
