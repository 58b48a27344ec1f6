using BenchRunner.Cli.Batch;
using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Cli.Tests.Batch;

public sealed class SerialSourceTests
{
    /// <summary>Standard input with nobody typing: ReadLine blocks until released.</summary>
    private sealed class SilentInput : TextReader
    {
        public ManualResetEventSlim Release { get; } = new();

        public override string? ReadLine()
        {
            Release.Wait(TimeSpan.FromSeconds(60));
            return null;
        }
    }

    [Fact]
    public async Task NextAsync_StoppedWhileWaitingForTheOperator_EndsAtOnce()
    {
        using var input = new SilentInput();
        var source = SerialSource.FromReader(input, new StringWriter(), new StringWriter());
        using var stop = new CancellationTokenSource();

        var next = source.NextAsync(stop.Token);
        stop.Cancel();

        await Assert.ThrowsAnyAsync<OperationCanceledException>(() => next.WaitAsync(TimeSpan.FromSeconds(30)));
        input.Release.Set();
    }

    [Fact]
    public async Task NextAsync_FromReaderWithEcho_WritesTheLineAfterThePrompt()
    {
        var prompt = new StringWriter();
        var source = SerialSource.FromReader(new StringReader("# scanned\nPSF-24-0005\n"), prompt, new StringWriter(), echo: true);

        Assert.Equal("PSF-24-0005", await source.NextAsync(CancellationToken.None));
        Assert.Null(await source.NextAsync(CancellationToken.None));
        Assert.Contains(SerialSource.Prompt + "PSF-24-0005\n", prompt.ToString().ReplaceLineEndings("\n"));
    }

    [Fact]
    public void FromFile_WithoutSerials_IsBadInput()
    {
        using var dir = new TempDirectory();
        var file = dir.Write("empty.txt", "# nothing yet\n\n");

        var error = Assert.Throws<InputFormatException>(() => SerialSource.FromFile(file));

        Assert.Contains("lists no serials", error.Message);
    }

    [Fact]
    public void FromFile_Missing_IsBadInput()
    {
        var error = Assert.Throws<InputFormatException>(() => SerialSource.FromFile("no-such-serials.txt"));

        Assert.Contains("no such serials file", error.Message);
    }
}
