using BenchRunner.Core.Statistics;

namespace BenchRunner.Core.Tests.Statistics;

public sealed class LotYieldTests
{
    // Hand-made lot of four preselector boards (calc):
    // 0001 passes; 0002 fails the passband mask, is retuned and passes; 0003 fails the mask and
    // the return loss twice; 0004 passes.
    private static readonly BoardHistory[] Lot =
    [
        new("PSF-24-0001", [BoardTest.Pass()]),
        new("PSF-24-0002", [BoardTest.Fail("mask psf-137-passband"), BoardTest.Pass()]),
        new("PSF-24-0003", [BoardTest.Fail("mask psf-137-passband", "return loss"), BoardTest.Fail("mask psf-137-passband")]),
        new("PSF-24-0004", [BoardTest.Pass()]),
    ];

    [Fact]
    public void From_LotWithARetest_CountsTheLatestVerdict()
    {
        var lot = LotYield.From(Lot);

        // calc: 3 of 4 boards pass at the end → yield 0.75; 2 of 4 passed first time → 0.5.
        Assert.Equal(4, lot.Boards);
        Assert.Equal(3, lot.Passed);
        Assert.Equal(1, lot.Failed);
        Assert.Equal(0.75, lot.Yield, 12);
        Assert.Equal(2, lot.PassedFirstTime);
        Assert.Equal(0.5, lot.FirstPassYield, 12);
        Assert.Equal(2, lot.Retested);
    }

    [Fact]
    public void From_LotWithARetest_RanksFailuresMostFrequentFirst()
    {
        var lot = LotYield.From(Lot);

        // calc: the mask failed in 3 tests (0002 once, 0003 twice), return loss in 1.
        Assert.Equal(
            [new CheckFailureCount("mask psf-137-passband", 3), new CheckFailureCount("return loss", 1)],
            lot.FailuresByCheck);
    }

    [Fact]
    public void From_FailThenPass_IsNotFirstPass()
    {
        var lot = LotYield.From([new BoardHistory("PSF-24-0002", [BoardTest.Fail("gain"), BoardTest.Pass()])]);

        // calc: 1 of 1 passes at the end, 0 of 1 first time.
        Assert.Equal(1.0, lot.Yield);
        Assert.Equal(0.0, lot.FirstPassYield);
    }

    [Fact]
    public void From_BadInput_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => LotYield.From([]));
        Assert.Throws<ArgumentException>(() => LotYield.From([new BoardHistory("PSF-24-0001", [])]));
        Assert.Throws<ArgumentException>(() => LotYield.From(
            [new BoardHistory("PSF-24-0001", [BoardTest.Pass()]), new BoardHistory("PSF-24-0001", [BoardTest.Pass()])]));
    }
}
