using System.Xml.Linq;
using BenchRunner.Reports.Html;
using BenchRunner.Reports.Tests.Support;
using BenchRunner.Storage;
using static BenchRunner.Reports.Tests.Support.Xhtml;
using BenchRunner.Core.Runs;

namespace BenchRunner.Reports.Tests.Html;

public sealed class LotReportTests
{
    private static readonly DateTimeOffset Now = new(2026, 3, 2, 12, 0, 0, TimeSpan.Zero);
    private const string Mask = "mask psf-137-passband on passband";

    private static LotStore ThreeBoards()
    {
        var lot = new LotStore();
        lot.AddRun("PSF-24-0001", RunStatus.Passed);
        lot.AddRun("PSF-24-0002", RunStatus.Failed, [Mask, "center_hz of passband"], LotStore.FailingS21);
        lot.AddRun("PSF-24-0003", RunStatus.Failed, [Mask], LotStore.FailingS21);
        lot.AddRun("PSF-24-0003", RunStatus.Passed, retest: true);
        lot.AddRun("PSF-24-0004", RunStatus.Stopped);
        return lot;
    }

    private static XElement TableOf(XDocument page, string cssClass) =>
        page.Descendants(H + "table").Single(t => (string?)t.Attribute("class") == cssClass);

    private static List<List<string>> Rows(XElement table) =>
        table.Descendants(H + "tbody").Single().Elements(H + "tr").Select(r => r.Elements(H + "td").Select(td => td.Value).ToList()).ToList();

    [Fact]
    public void Create_Lot_IsSelfContainedWithYieldFailuresAndBoards()
    {
        using var lot = ThreeBoards();

        var (text, page) = RoundTrip(LotReport.Create(lot.Store, "PSF-24-L07", Now, "0.1.0"));

        AssertSelfContained(text, page);
        var yield = Svgs(page).Single(s => (string?)s.Attribute("id") == "yield");
        // 3 boards with a verdict: 0001 passed first time, 0003 on retest, 0002 failed.
        Assert.Equal("yield 66.7 %, first-pass yield 33.3 %", yield.Element(S + "title")!.Value);
        Assert.Equal(["pass", "pass-retest", "fail"], yield.Elements(S + "rect").Where(r => (string?)r.Attribute("height") == "36").Select(r => (string)r.Attribute("class")!));
        Assert.Equal([[Mask, "2", "50.0 %"], ["center_hz of passband", "1", "25.0 %"]], Rows(TableOf(page, "failures")));
        var boards = Rows(TableOf(page, "boards"));
        Assert.Equal(["PSF-24-0001", "PSF-24-0002", "PSF-24-0003", "PSF-24-0004"], boards.Select(r => r[0]));
        Assert.Equal(["PASS", "FAIL", "PASS", "UNTESTED"], boards.Select(r => r[1]));
        Assert.StartsWith("yes (first: fail)", boards[2][3]);
        Assert.Contains(PlanHash.Sha256Hex(lot.PlanText), TableOf(page, "plans").Value);
        Assert.Contains("SIM-VNA", TableOf(page, "instruments").Value);
    }

    [Fact]
    public void Create_Lot_HasAHistogramAndCapabilityRowForEachLimitedFigure()
    {
        using var lot = ThreeBoards();

        var (_, page) = RoundTrip(LotReport.Create(lot.Store, "PSF-24-L07", Now, "0.1.0"));

        var capability = Rows(TableOf(page, "capability"));
        Assert.Equal(["center_hz of passband", "insertion_loss_db of passband", "bandwidth_3db_hz of passband"], capability.Select(r => r[0]));
        Assert.All(capability, r => Assert.Equal("3", r[1]));
        // The centre has both limits (LSL, USL); the loss only an upper one, so no Cp but a one-sided Cpk.
        Assert.Equal("137.2 MHz", capability[0][6]); // one formatter: 7 significant digits, trailing zeros dropped
        Assert.Equal("137.8 MHz", capability[0][7]);
        Assert.Equal("-", capability[1][6]);
        Assert.Equal("-", capability[1][8]);
        Assert.Matches(@"^-?\d+\.\d\d$", capability[1][9]);
        var histograms = Svgs(page).Where(s => ((string?)s.Attribute("id"))!.StartsWith("histogram", StringComparison.Ordinal)).ToList();
        Assert.Equal(3, histograms.Count);
        var centre = histograms[0];
        Assert.Equal(["LSL", "USL"], centre.Descendants(S + "g").Where(g => (string?)g.Attribute("class") == "spec-limit").Select(g => g.Element(S + "text")!.Value));
        Assert.Equal(3, centre.Descendants(S + "rect").Where(r => (string?)r.Attribute("class") == "bin")
            .Sum(r => int.Parse(r.Element(S + "title")!.Value.Split(' ')[0], System.Globalization.CultureInfo.InvariantCulture)));
    }

    [Fact]
    public void Create_Lot_DrawsEachBoardsCountingRunAgainstTheMask()
    {
        using var lot = ThreeBoards();

        var (_, page) = RoundTrip(LotReport.Create(lot.Store, "PSF-24-L07", Now, "0.1.0"));

        var boardPlots = Svgs(page).Where(s => ((string?)s.Attribute("id"))!.StartsWith("board-", StringComparison.Ordinal)).ToList();
        Assert.Equal(3, boardPlots.Count);
        var failing = boardPlots.Single(s => s.Element(S + "title")!.Value.StartsWith("PSF-24-0002", StringComparison.Ordinal));
        Assert.Contains(failing.Descendants(S + "rect"), r => (string?)r.Attribute("class") == "fail-span");
        // 0003 counts by its retest, which passed: nothing is shaded.
        var retested = boardPlots.Single(s => s.Element(S + "title")!.Value.StartsWith("PSF-24-0003", StringComparison.Ordinal));
        Assert.DoesNotContain(retested.Descendants(S + "rect"), r => (string?)r.Attribute("class") == "fail-span");
    }

    [Fact]
    public void Create_UnknownLot_IsRefused()
    {
        using var lot = ThreeBoards();

        Assert.Throws<ArgumentException>(() => LotReport.Create(lot.Store, "PSF-24-L99", Now, "0.1.0"));
    }
}
