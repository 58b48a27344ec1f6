using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Tests.Figures;

public class TraceFiguresRangeTests
{
    private static Frequency Mhz(double mhz) => Frequency.FromMegahertz(mhz);

    // Passband of a preselector, 0.5 MHz apart (invented levels).
    private static readonly ComplexTrace Passband =
        TestTraces.S21Mhz([136, 136.5, 137, 137.5, 138, 138.5, 139], [-1.0, -0.2, -0.6, 0.0, -0.8, -0.4, -2.0]);

    [Fact]
    public void ValueAt_BetweenSamples_InterpolatesLinearlyInDb()
    {
        // Halfway from -0.6 to 0.0 dB (calc).
        Assert.Equal(-0.3, TraceFigures.ValueAt(Passband, Mhz(137.25)).Value, 1e-9);
        Assert.Equal(-0.8, TraceFigures.ValueAt(Passband, Mhz(138)).Value, 1e-9);
        Assert.Equal(-2.0, TraceFigures.ValueAt(Passband, Mhz(139)).Value, 1e-9);
    }

    [Fact]
    public void ValueAt_OutsideTheSweep_IsUnavailable()
    {
        var below = TraceFigures.ValueAt(Passband, Mhz(135.9));
        var above = TraceFigures.ValueAt(Passband, Mhz(139.1));

        Assert.False(below.IsAvailable);
        Assert.False(above.IsAvailable);
        Assert.Contains("outside the sweep", below.Reason);
    }

    [Fact]
    public void Ripple_IncludesTheInterpolatedEnds()
    {
        // Ends: -0.6 at 136.25 and -1.2 at 138.75 MHz; inside, the highest is 0.0: 1.2 dB (calc).
        Assert.Equal(1.2, TraceFigures.Ripple(Passband, Mhz(136.25), Mhz(138.75)).Value, 1e-9);
        // Samples only: 137 (-0.6) to 137.5 (0.0).
        Assert.Equal(0.6, TraceFigures.Ripple(Passband, Mhz(137), Mhz(137.5)).Value, 1e-9);
    }

    [Fact]
    public void Ripple_OnePointRange_IsZero()
    {
        Assert.Equal(0, TraceFigures.Ripple(Passband, Mhz(137.25), Mhz(137.25)).Value);
    }

    [Fact]
    public void Ripple_EmptyRange_IsUnavailable()
    {
        var r = TraceFigures.Ripple(Passband, Mhz(138), Mhz(137));

        Assert.False(r.IsAvailable);
        Assert.Contains("empty", r.Reason);
    }

    [Fact]
    public void Ripple_RangeOutsideTheSweep_IsUnavailable()
    {
        var partly = TraceFigures.Ripple(Passband, Mhz(135.5), Mhz(137));
        var wholly = TraceFigures.Ripple(Passband, Mhz(140), Mhz(141));

        Assert.False(partly.IsAvailable);
        Assert.False(wholly.IsAvailable);
        Assert.Contains("outside the sweep", wholly.Reason);
    }

    [Fact]
    public void InsertionLoss_IsMinusThePeakLevel()
    {
        var trace = TestTraces.S21Mhz([96, 100, 104], [-13.5, -1.5, -13.5]);

        Assert.Equal(1.5, TraceFigures.InsertionLoss(trace).Value, 1e-9);
        Assert.Equal(4.5, TraceFigures.InsertionLossAt(trace, Mhz(99)).Value, 1e-9);
    }

    [Fact]
    public void InsertionLoss_ReflectionTrace_IsUnavailable()
    {
        var s11 = TestTraces.FromDb(TraceQuantity.S11, [96e6, 100e6, 104e6], [-1, -20, -1]);

        Assert.False(TraceFigures.InsertionLoss(s11).IsAvailable);
        Assert.False(TraceFigures.InsertionLossAt(s11, Mhz(100)).IsAvailable);
    }

    [Fact]
    public void Rejection_IsPeakMinusLevel()
    {
        var trace = TestTraces.S21Mhz([96, 100, 104], [-13.5, -1.5, -13.5]);

        // At 103 MHz: -1.5 - 3·3 = -10.5 dB, 9 dB below the peak (calc).
        Assert.Equal(9, TraceFigures.Rejection(trace, Mhz(103)).Value, 1e-9);
        Assert.False(TraceFigures.Rejection(trace, Mhz(105)).IsAvailable);
    }

    [Fact]
    public void RejectionAtOffset_IsTakenFromTheMinus3DbCentre()
    {
        // Symmetric round the peak (so the peak stays at 100 MHz, 0 dB) but not beyond: -3 dB
        // edges at 98.75 and 101.5 MHz, centre 100.125 MHz (calc).
        var trace = TestTraces.S21Mhz([96, 98.5, 99, 100, 101, 102, 104], [-14, -4, -2, 0, -2, -4, -12]);

        // 100.125 + 1.5 = 101.625 MHz: -2 - 2·0.625 = -3.25 dB; 100.125 - 2 = 98.125 MHz:
        // -4 - 4·0.375 = -5.5 dB (calc).
        Assert.Equal(3.25, TraceFigures.RejectionAtOffset(trace, Mhz(1.5), above: true).Value, 1e-9);
        Assert.Equal(5.5, TraceFigures.RejectionAtOffset(trace, Mhz(2), above: false).Value, 1e-9);
        Assert.False(TraceFigures.RejectionAtOffset(trace, Mhz(5), above: true).IsAvailable);
    }

    [Fact]
    public void WorstReturnLoss_FindsTheHighestReflectionAndWhere()
    {
        var s11 = TestTraces.FromDb(TraceQuantity.S11,
            TestTraces.LinearHz(136e6, 0.5e6, 5), [-25, -18, -22, -14, -30]);

        var samples = TraceFigures.WorstReturnLoss(s11, Mhz(136), Mhz(137)).Value;
        // The end at 137.4 MHz interpolates to -22 + 0.8·8 = -15.6 dB, worse than any sample inside (calc).
        var end = TraceFigures.WorstReturnLoss(s11, Mhz(136), Mhz(137.4)).Value;

        Assert.Equal(18, samples.ReturnLossDb, 1e-9);
        Assert.Equal(136.5e6, samples.Frequency.Hertz);
        Assert.Equal(15.6, end.ReturnLossDb, 1e-9);
        Assert.Equal(137.4e6, end.Frequency.Hertz, 1e-3);
    }

    [Fact]
    public void WorstReturnLoss_TransmissionTraceOrBadRange_IsUnavailable()
    {
        var s11 = TestTraces.FromDb(TraceQuantity.S11, TestTraces.LinearHz(136e6, 0.5e6, 5), [-25, -18, -22, -14, -30]);

        Assert.False(TraceFigures.WorstReturnLoss(Passband, Mhz(136), Mhz(137)).IsAvailable);
        Assert.False(TraceFigures.WorstReturnLoss(s11, Mhz(137), Mhz(136)).IsAvailable);
        Assert.False(TraceFigures.WorstReturnLoss(s11, Mhz(137), Mhz(139)).IsAvailable);
    }
}
