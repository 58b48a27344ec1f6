using System.Text.Json;
using BenchRunner.Cli.Tests.Support;

namespace BenchRunner.Cli.Tests.Commands;

public sealed class DemoCommandTests
{
    [Fact]
    public void Demo_WithNoHardware_OneBoardPassesOneFailsAndBothAreStored()
    {
        using var dir = new TempDirectory();
        var db = dir.PathOf("demo.db");

        var run = CliRun.Of("demo", "--db", db);

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("Safety:", run.Out);
        Assert.Matches(@"PSF-24-0001\s+PASS", run.Out);
        Assert.Matches(@"PSF-24-0002\s+FAIL", run.Out);
        Assert.Contains("failed: mask psf-137-passband", run.Out);
        using var listed = JsonDocument.Parse(CliRun.Of("results", "--db", db, "--json").Out);
        Assert.Equal(2, listed.RootElement.GetProperty("runs").GetArrayLength());
    }

    [Fact]
    public void Demo_Json_GivesEachBoardsVerdictAndFigures()
    {
        using var dir = new TempDirectory();

        var run = CliRun.Of("demo", "--db", dir.PathOf("demo.db"), "--json");

        Assert.Equal(0, run.ExitCode);
        using var doc = JsonDocument.Parse(run.Out);
        var boards = doc.RootElement.GetProperty("boards");
        Assert.Equal("passed", boards[0].GetProperty("status").GetString());
        Assert.Equal("failed", boards[1].GetProperty("status").GetString());
        // The detuned board sits about 1.2 MHz high (design notes' demo scenario, docs/examples).
        Assert.InRange(boards[1].GetProperty("figures").GetProperty("center_hz").GetDouble(), 138.3e6, 139.0e6);
        Assert.True(boards[1].GetProperty("worst_mask_margin_db").GetDouble() < 0);
    }
}
