using System.Xml.Linq;
using BenchRunner.Reports.Html;
using BenchRunner.Reports.Tests.Support;
using BenchRunner.Storage;
using static BenchRunner.Reports.Tests.Support.Xhtml;
using BenchRunner.Core.Runs;

namespace BenchRunner.Reports.Tests.Html;

public sealed class RunReportTests
{
    private static readonly DateTimeOffset Now = new(2026, 3, 2, 12, 0, 0, TimeSpan.Zero);

    [Fact]
    public void Create_FailingBoard_DrawsTheTraceAgainstItsMaskWithTheFailingSpansShaded()
    {
        using var lot = new LotStore();
        var id = lot.AddRun("PSF-24-0002", RunStatus.Failed, ["mask psf-137-passband on passband"], LotStore.FailingS21);

        var (text, page) = RoundTrip(RunReport.Create(lot.Store, id, Now, "0.1.0"));

        AssertSelfContained(text, page);
        Assert.Equal("Run 1: psf-137-check on PSF-24-0002", page.Descendants(H + "title").Single().Value);
        var plot = Svgs(page).Single();
        Assert.Contains("fails in", plot.Descendants(S + "text").First(t => (string?)t.Attribute("class") == "plot-title").Value);
        var spans = plot.Descendants(S + "rect").Where(r => (string?)r.Attribute("class") == "fail-span").ToList();
        // The example file's board sits low; the mask's evaluation gives the spans the plot must shade.
        var evaluation = Core.Masks.MaskFile.Load(RepositoryFiles.Example("psf-137-passband.yaml")).Evaluate(LotStore.FailingS21);
        Assert.NotEmpty(evaluation.FailingSpans);
        Assert.Equal(evaluation.FailingSpans.Count, spans.Count);
        Assert.Contains(plot.Descendants(S + "polyline"), p => (string?)p.Attribute("class") == "limit upper");
        Assert.Contains(plot.Descendants(S + "polyline"), p => (string?)p.Attribute("class") == "limit lower");
        var trace = plot.Descendants(S + "polyline").Single(p => (string?)p.Attribute("class") == "trace");
        Assert.Equal(LotStore.FailingS21.Count, ((string)trace.Attribute("points")!).Split(' ').Length);
    }

    [Fact]
    public void Create_HoldsTheRecordInstrumentsChecksAndFigures()
    {
        using var lot = new LotStore();
        var id = lot.AddRun("PSF-24-0001", RunStatus.Passed);

        var (_, page) = RoundTrip(RunReport.Create(lot.Store, id, Now, "0.1.0"));

        var all = TextOf(page);
        Assert.Contains(PlanHash.Sha256Hex(lot.PlanText), all);
        Assert.Contains("2026-03-02 08:01:00 UTC", all);
        var instruments = page.Descendants(H + "table").Single(t => (string?)t.Attribute("class") == "instruments");
        Assert.Equal(["vna", "network-analyser", "BenchRunner", "SIM-VNA", "SV-0001", "1.0", "sim:vna?dialect=raw"],
            instruments.Descendants(H + "tbody").Single().Descendants(H + "td").Select(td => td.Value));
        var checks = page.Descendants(H + "table").Single(t => (string?)t.Attribute("class") == "checks");
        Assert.Contains("bandwidth_3db_hz of passband", checks.Value);
        var figures = page.Descendants(H + "table").Single(t => (string?)t.Attribute("class") == "figures");
        Assert.Contains("center_hz", figures.Value);
        Assert.Contains(" MHz", figures.Value);
    }

    [Fact]
    public void Create_TuningSession_PlotsEachFigureOverTime()
    {
        using var lot = new LotStore();
        var id = lot.AddRun("PSF-24-0002", RunStatus.Stopped, trace: LotStore.FailingS21, mode: RunMode.Tuning, finish: false);
        lot.AddSweep(id, LotStore.FailingS21, 2);
        lot.AddSweep(id, LotStore.PassingS21, 2);
        lot.Store.FinishRun(id, RunStatus.Stopped);

        var (_, page) = RoundTrip(RunReport.Create(lot.Store, id, Now, "0.1.0"));

        Assert.Contains(page.Descendants(H + "h3"), h => h.Value == "Figures of passband over 3 sweeps");
        var centre = Svgs(page).Single(s => s.Element(S + "title")!.Value.Contains("(center_hz)", StringComparison.Ordinal));
        Assert.Equal(3, centre.Descendants(S + "circle").Count());
        // The plan limits the centre to 137.5 MHz ± 0.3 MHz: both limits are drawn.
        Assert.Equal(2, centre.Descendants(S + "polyline").Count(p => ((string?)p.Attribute("class"))!.StartsWith("limit", StringComparison.Ordinal)));
        Assert.Contains("Tuning session", TextOf(page));
    }

    [Fact]
    public void Create_RunWithoutRecordedLimits_DrawsTheTraceAlone()
    {
        using var lot = new LotStore();
        var id = lot.Store.StartRun(new RunRecord(RunMode.Single, "old", "plan: old\n", "0.1.0", "pc"));
        lot.Store.AddSweep(id, new SweepRecord("sweep", LotStore.PassingS21) { TraceName = "passband" });
        lot.Store.FinishRun(id, RunStatus.Passed);

        var (text, page) = RoundTrip(RunReport.Create(lot.Store, id, Now, "0.1.0"));

        AssertSelfContained(text, page);
        Assert.DoesNotContain(Svgs(page).Single().Descendants(S + "rect"), r => (string?)r.Attribute("class") == "fail-span");
        Assert.Contains("No mask was recorded", TextOf(page));
    }

    [Fact]
    public void Create_UnknownRun_IsRefused()
    {
        using var lot = new LotStore();

        Assert.Throws<ArgumentException>(() => RunReport.Create(lot.Store, 7, Now, "0.1.0"));
    }
}
