using System.Text.Json;
using System.Text.RegularExpressions;
using BenchRunner.Cli.Tests.Support;

namespace BenchRunner.Cli.Tests.Commands;

public sealed class CheckCommandTests
{
    private static readonly string GoodBoard = RepositoryFiles.Example("psf-24-0001.s2p");
    private static readonly string DetunedBoard = RepositoryFiles.Example("psf-24-0002.s2p");
    private static readonly string GoodBoardCsv = RepositoryFiles.Example("psf-24-0001.csv");
    private static readonly string PassbandMask = RepositoryFiles.Example("psf-137-passband.yaml");

    [Fact]
    public void Check_GoodBoard_PassesWithExitCodeZero()
    {
        var run = CliRun.Of("check", GoodBoard, "--mask", PassbandMask);

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("PASS", run.Out);
        Assert.Contains("Failing spans  none", run.Out);
        Assert.Equal("", run.Error);
    }

    [Fact]
    public void Check_DetunedBoard_FailsWithExitCodeOneAndNamesTheFailingSpans()
    {
        var run = CliRun.Of("check", DetunedBoard, "--mask", PassbandMask);

        Assert.Equal(1, run.ExitCode);
        Assert.Contains("FAIL", run.Out);
        Assert.Matches(new Regex(@"MHz to [\d.]+ MHz, (lower|upper) limit, worst -\d"), run.Out);
    }

    [Fact]
    public void Check_Json_CarriesTheContractFields()
    {
        var run = CliRun.Of("check", GoodBoard, "--mask", PassbandMask, "--json");

        Assert.Equal(0, run.ExitCode);
        using var doc = JsonDocument.Parse(run.Out);
        var root = doc.RootElement;
        Assert.True(root.GetProperty("passed").GetBoolean());
        Assert.True(root.GetProperty("worst_margin_db").GetDouble() >= 0);
        Assert.InRange(root.GetProperty("worst_margin_hz").GetDouble(), 127.5e6, 147.5e6);
        Assert.Equal(0, root.GetProperty("failing_spans").GetArrayLength());
        var figures = root.GetProperty("figures");
        // The demo board is centred on 137.5 MHz and about 3 MHz wide (design notes' scenario).
        Assert.InRange(figures.GetProperty("center_hz").GetDouble(), 137.2e6, 137.8e6);
        Assert.InRange(figures.GetProperty("bandwidth_3db_hz").GetDouble(), 2.5e6, 3.5e6);
        Assert.InRange(figures.GetProperty("peak_hz").GetDouble(), 136e6, 139e6);
        Assert.True(figures.GetProperty("peak_db").GetDouble() < 0);
        double q = figures.GetProperty("loaded_q").GetDouble();
        Assert.Equal(figures.GetProperty("center_hz").GetDouble() / figures.GetProperty("bandwidth_3db_hz").GetDouble(), q, 6);
    }

    [Fact]
    public void Check_JsonOfFailingBoard_ListsSpansAsStartStopPairs()
    {
        var run = CliRun.Of("check", DetunedBoard, "--mask", PassbandMask, "--json");

        Assert.Equal(1, run.ExitCode);
        using var doc = JsonDocument.Parse(run.Out);
        var root = doc.RootElement;
        Assert.False(root.GetProperty("passed").GetBoolean());
        Assert.True(root.GetProperty("worst_margin_db").GetDouble() < 0);
        var spans = root.GetProperty("failing_spans");
        Assert.True(spans.GetArrayLength() > 0);
        foreach (var span in spans.EnumerateArray())
        {
            Assert.Equal(2, span.GetArrayLength());
            Assert.True(span[0].GetDouble() <= span[1].GetDouble());
        }
    }

    [Fact]
    public void Check_CsvOfTheSameBoard_GivesTheSameVerdictAndFigures()
    {
        var fromTouchstone = JsonDocument.Parse(CliRun.Of("check", GoodBoard, "--mask", PassbandMask, "--json").Out).RootElement;
        var fromCsv = JsonDocument.Parse(CliRun.Of("check", GoodBoardCsv, "--mask", PassbandMask, "--json").Out).RootElement;

        Assert.Equal(fromTouchstone.GetProperty("passed").GetBoolean(), fromCsv.GetProperty("passed").GetBoolean());
        Assert.Equal(
            fromTouchstone.GetProperty("figures").GetProperty("center_hz").GetDouble(),
            fromCsv.GetProperty("figures").GetProperty("center_hz").GetDouble(),
            precision: 0);
    }

    [Fact]
    public void Check_MissingTraceFile_IsBadInputNamingTheFile()
    {
        var run = CliRun.Of("check", "no-such-board.s2p", "--mask", PassbandMask);

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("no-such-board.s2p", run.Error);
        Assert.Equal("", run.Out);
    }

    [Fact]
    public void Check_MalformedTouchstone_IsBadInputNamingFileAndLine()
    {
        using var dir = new TempDirectory();
        var trace = dir.Write("broken.s2p", "# MHz S DB R 50\n137.0 -20 0 -1.5 10 -1.5 10 -20 0\n137.5 -21 0 -1.2 oops -1.2 0 -21 0\n");

        var run = CliRun.Of("check", trace, "--mask", PassbandMask);

        Assert.Equal(2, run.ExitCode);
        Assert.Matches(new Regex(@"broken\.s2p:3(:\d+)?: "), run.Error);
        Assert.Single(run.Error.TrimEnd().Split('\n'));
    }

    [Fact]
    public void Check_MaskWithATypo_IsBadInputNamingFileLineAndColumn()
    {
        using var dir = new TempDirectory();
        var mask = dir.Write("typo.yaml", "mask: typo\napplies-to: S21\ninterpolaton: linear\nlower:\n  - 136.5 MHz: -4 dB\n  - 138.5 MHz: -4 dB\n");

        var run = CliRun.Of("check", GoodBoard, "--mask", mask);

        Assert.Equal(2, run.ExitCode);
        Assert.Matches(new Regex(@"typo\.yaml:3:1: unknown key ""interpolaton"""), run.Error);
        Assert.Equal("", run.Out);
    }

    [Fact]
    public void Check_MaskCornerWithoutUnit_IsBadInputAtTheCorner()
    {
        using var dir = new TempDirectory();
        var mask = dir.Write("nounit.yaml", "mask: nounit\nlower:\n  - 136.5 MHz: -4 dB\n  - 138.5 MHz: -4\n");

        var run = CliRun.Of("check", GoodBoard, "--mask", mask);

        Assert.Equal(2, run.ExitCode);
        Assert.Matches(new Regex(@"nounit\.yaml:4:\d+: "), run.Error);
    }

    [Fact]
    public void Check_MaskOutsideTheSweep_IsBadInputNotAPass()
    {
        using var dir = new TempDirectory();
        var mask = dir.Write("elsewhere.yaml", "mask: elsewhere\napplies-to: S21\nlower:\n  - 21 MHz: -4 dB\n  - 22 MHz: -4 dB\n");

        var run = CliRun.Of("check", GoodBoard, "--mask", mask);

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("covers none", run.Error);
    }

    [Fact]
    public void Check_MissingMaskFile_IsBadInputNamingTheFile()
    {
        var run = CliRun.Of("check", GoodBoard, "--mask", "no-such-mask.yaml");

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("no-such-mask.yaml", run.Error);
    }

    [Fact]
    public void Check_UnknownParameter_IsBadInput()
    {
        var run = CliRun.Of("check", GoodBoard, "--mask", PassbandMask, "--param", "S99");

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("S99", run.Error);
    }

    [Fact]
    public void Check_WithoutMask_IsBadInputWithAHelpHint()
    {
        var run = CliRun.Of("check", GoodBoard);

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("--mask", run.Error);
        Assert.Contains("benchrunner check --help", run.Error);
    }

    [Fact]
    public void Check_BadInputWithJson_PrintsOneErrorDocument()
    {
        var run = CliRun.Of("check", "no-such-board.s2p", "--mask", PassbandMask, "--json");

        Assert.Equal(2, run.ExitCode);
        using var doc = JsonDocument.Parse(run.Out);
        Assert.Equal(2, doc.RootElement.GetProperty("error").GetProperty("exit_code").GetInt32());
        Assert.Contains("no-such-board.s2p", doc.RootElement.GetProperty("error").GetProperty("message").GetString());
    }

    [Fact]
    public void Check_Help_DescribesTheOptions()
    {
        var run = CliRun.Of("check", "--help");

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("--mask", run.Out);
        Assert.Contains("--param", run.Out);
        Assert.Contains("--json", run.Out);
    }
}
