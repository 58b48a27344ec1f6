using BenchRunner.Reports.Lots;
using BenchRunner.Reports.Tests.Support;
using BenchRunner.Storage;
using BenchRunner.Core.Runs;

namespace BenchRunner.Reports.Tests.Lots;

public sealed class LotSummaryTests
{
    private const string Mask = "mask psf-137-passband on passband";
    private const string Centre = "center_hz of passband";

    [Fact]
    public void Read_MixedLot_CountsEachBoardByItsLatestVerdict()
    {
        using var lot = new LotStore();
        lot.AddRun("PSF-24-0001", RunStatus.Passed);
        lot.AddRun("PSF-24-0002", RunStatus.Failed, [Mask]);
        lot.AddRun("PSF-24-0003", RunStatus.Failed, [Mask, Centre]);
        lot.AddRun("PSF-24-0004", RunStatus.Stopped);
        lot.AddRun("PSF-24-0005", RunStatus.Error);
        lot.AddRun("PSF-24-0002", RunStatus.Passed, retest: true);
        lot.AddRun("PSF-24-0005", RunStatus.Passed);
        // Neither a tuning session nor another lot's run is part of the lot's verdicts.
        lot.AddRun("PSF-24-0003", RunStatus.Passed, mode: RunMode.Tuning);
        lot.AddRun("PSF-24-0006", RunStatus.Failed, [Mask], lot: "PSF-24-L08");

        var summary = LotSummary.Read(lot.Store, "PSF-24-L07");

        Assert.Equal(["PSF-24-0001", "PSF-24-0002", "PSF-24-0003", "PSF-24-0005"], summary.Boards.Select(b => b.Serial));
        Assert.Equal(["PSF-24-0004"], summary.Untested);
        var y = summary.Yield!;
        Assert.Equal(4, y.Boards);
        Assert.Equal(3, y.Passed);
        // 0002 failed first and passed on retest: it counts as passed, not as first-pass. 0005's error run is no test.
        Assert.Equal(2, y.PassedFirstTime);
        Assert.Equal(1, y.Retested);
        Assert.Equal(0.75, y.Yield);
        Assert.Equal(0.5, y.FirstPassYield);
        Assert.Equal([(Mask, 2), (Centre, 1)], y.FailuresByCheck.Select(f => (f.CheckName, f.Failures)));
        var retested = summary.Boards[1];
        Assert.True(retested.Retested);
        Assert.False(retested.PassedFirstTime);
        Assert.True(retested.Passed);
        Assert.Empty(retested.LatestFailedChecks);
        Assert.Equal(1, summary.Boards[3].RunsWithoutVerdict);
        Assert.Equal(7, summary.Runs.Count);
    }

    [Fact]
    public void Read_SameFileAsTheLotSummaryView_AgreesOnEveryCount()
    {
        using var lot = new LotStore();
        lot.AddRun("PSF-24-0001", RunStatus.Passed);
        lot.AddRun("PSF-24-0001", RunStatus.Stopped, retest: true);
        lot.AddRun("PSF-24-0002", RunStatus.Failed, [Mask]);
        lot.AddRun("PSF-24-0002", RunStatus.Passed, retest: true);
        lot.AddRun("PSF-24-0003", RunStatus.Passed);
        lot.AddRun("PSF-24-0003", RunStatus.Failed, [Mask], retest: true);
        lot.AddRun("PSF-24-0003", RunStatus.Interrupted, retest: true);
        lot.AddRun("PSF-24-0004", RunStatus.Stopped);
        lot.AddRun("PSF-24-0005", RunStatus.Error);
        lot.AddRun("PSF-24-0005", RunStatus.Stopped, retest: true);
        lot.AddRun("PSF-24-0006", RunStatus.Passed);
        lot.AddRun("PSF-24-0006", RunStatus.Passed, mode: RunMode.Tuning);
        lot.AddRun("PSF-24-0007", RunStatus.Passed, finish: false);

        var summary = LotSummary.Read(lot.Store, "PSF-24-L07");
        var row = LotStore.Query(lot.Store.Path, "SELECT boards, passed, failed, other, yield_percent, runs FROM lot_summary WHERE lot = 'PSF-24-L07'").Single();
        var verdicts = lot.Store.LatestVerdictPerSerial("PSF-24-L07");

        // 0001 passed, then stopped: passed. 0002 failed, then passed: passed. 0003 passed, failed,
        // then was interrupted: failed. 0004, 0005 and 0007 (still running) have no verdict.
        Assert.Equal(["PSF-24-0001", "PSF-24-0002", "PSF-24-0003", "PSF-24-0006"], summary.Boards.Select(b => b.Serial));
        Assert.Equal(["PSF-24-0004", "PSF-24-0005", "PSF-24-0007"], summary.Untested);
        Assert.Equal(summary.Boards.Select(b => (b.Serial, b.Latest.Id, b.Latest.Status, b.Runs.Count + b.RunsWithoutVerdict)),
            verdicts.Select(v => (v.DutSerial, v.RunId, v.Verdict, v.Runs)));
        var y = summary.Yield!;
        Assert.Equal(new object?[]
            {
                (long)(summary.Boards.Count + summary.Untested.Count), (long)y.Passed, (long)y.Failed, (long)summary.Untested.Count,
                Math.Round(100 * y.Yield, 1), (long)summary.Runs.Count,
            },
            row);
        Assert.Equal(new object?[] { 7L, 3L, 1L, 3L, 75.0, 12L }, row);
    }

    [Fact]
    public void Read_FigureSpread_MatchesTheHandbookCapabilityExample()
    {
        // REFERENCES: NIST/SEMATECH e-Handbook of Statistical Methods §6.1.6 (calc):
        // μ = 137.5, σ = 0.2, LSL 136.5, USL 138.7 → Cpk = min(1.2, 1.0)/0.6 = 1.667 and Cp = 2.2/1.2 = 1.833.
        // Four boards at μ ± a, μ ± a have sample σ = a·√(4/3), so a = 0.2·√3/2 gives σ = 0.2 (in MHz here).
        using var lot = new LotStore();
        var a = 0.2e6 * Math.Sqrt(3) / 2;
        double[] centres = [137.5e6 - a, 137.5e6 + a, 137.5e6 - a, 137.5e6 + a];
        for (int i = 0; i < centres.Length; i++)
        {
            lot.AddRun($"PSF-24-000{i + 1}", RunStatus.Passed, figures: LotStore.Centre(centres[i]));
        }

        var spread = LotSummary.Read(lot.Store, "PSF-24-L07").Figures.Single(f => f.Limit.Key == "center_hz");
        var handbook = spread with { Limit = spread.Limit with { Min = 136.5e6, Max = 138.7e6 } };
        handbook = FigureSpread.Of(handbook.Limit, handbook.Values);

        Assert.Equal(137.5e6, handbook.Statistics!.Value.Mean, 3);
        Assert.Equal(0.2e6, handbook.Statistics!.Value.StandardDeviation, 3);
        Assert.Equal(1.0 / 0.6, handbook.Capability.Value.Cpk, 6);
        Assert.Equal(1.667, handbook.Capability.Value.Cpk, 3);
        Assert.Equal(2.2 / 1.2, handbook.Capability.Value.Cp!.Value, 6);
        // Against the plan's own limits, 137.5 MHz ± 0.3 MHz: Cpk = 0.3/0.6 = 0.5 (calc).
        Assert.Equal(0.5, spread.Capability.Value.Cpk, 6);
    }

    [Fact]
    public void Read_RetestedBoard_ContributesOnlyItsLatestValue()
    {
        using var lot = new LotStore();
        lot.AddRun("PSF-24-0001", RunStatus.Passed, figures: LotStore.Centre(137.4e6));
        lot.AddRun("PSF-24-0002", RunStatus.Failed, [Centre], figures: LotStore.Centre(137.9e6));
        lot.AddRun("PSF-24-0002", RunStatus.Passed, figures: LotStore.Centre(137.6e6), retest: true);

        var spread = LotSummary.Read(lot.Store, "PSF-24-L07").Figures.Single(f => f.Limit.Key == "center_hz");

        Assert.Equal([("PSF-24-0001", 137.4e6), ("PSF-24-0002", 137.6e6)], spread.Values);
        Assert.Equal(137.5e6, spread.Statistics!.Value.Mean, 3);
    }

    [Fact]
    public void Read_FigureNotComputedOrSingleBoard_GivesCapabilityAReason()
    {
        using var lot = new LotStore();
        lot.AddRun("PSF-24-0001", RunStatus.Passed, figures: LotStore.Centre(137.5e6));

        var figures = LotSummary.Read(lot.Store, "PSF-24-L07").Figures;

        var centre = figures.Single(f => f.Limit.Key == "center_hz");
        Assert.False(centre.Capability.IsAvailable);
        Assert.Contains("at least 2 samples", centre.Capability.Reason);
        var loss = figures.Single(f => f.Limit.Key == "insertion_loss_db");
        Assert.Empty(loss.Values);
        Assert.Null(loss.Statistics);
        Assert.False(loss.Capability.IsAvailable);
    }

    [Fact]
    public void Read_WithoutFigures_KeepsTheYieldAndSkipsTheSpreads()
    {
        using var lot = new LotStore();
        lot.AddRun("PSF-24-0001", RunStatus.Passed);
        lot.AddRun("PSF-24-0002", RunStatus.Failed, [Mask]);

        var summary = LotSummary.Read(lot.Store, "PSF-24-L07", withFigures: false);

        Assert.Equal(0.5, summary.Yield!.Yield);
        Assert.Empty(summary.Figures);
        Assert.NotEmpty(LotSummary.Read(lot.Store, "PSF-24-L07").Figures);
    }

    [Fact]
    public void Read_UnknownLot_HasNoBoardsAndNoYield()
    {
        using var lot = new LotStore();
        lot.AddRun("PSF-24-0001", RunStatus.Passed);

        var summary = LotSummary.Read(lot.Store, "PSF-24-L99");

        Assert.Empty(summary.Boards);
        Assert.Null(summary.Yield);
        Assert.Empty(summary.Runs);
    }
}
