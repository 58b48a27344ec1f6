using BenchRunner.Core.Masks;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using static BenchRunner.Core.Tests.Masks.MaskTestData;

namespace BenchRunner.Core.Tests.Masks;

// The margins below are hand calculations from the evaluation rules in docs/mask-format.md
// (margin = limit − level for the upper side, level − limit for the lower side).
public class LimitMaskEvaluateTests
{
    private const int Digits = 9;

    [Fact]
    public void Evaluate_LinearInterpolation_GivesHandCalculatedLimitsAndMargins()
    {
        // Upper line from (100 MHz, -10 dB) to (200 MHz, -30 dB), linear in frequency:
        // L(150) = -10 + (-20)·50/100 = -20 dB; L(175) = -10 + (-20)·75/100 = -25 dB.
        var mask = new LimitMask("slope", Line((100, -10), (200, -30)), null, TraceUnit.Decibel);
        var trace = SParameter([100, 150, 175, 200], [-12, -21, -20, -31]);

        var result = mask.Evaluate(trace);

        AssertValues([-10, -20, -25, -30], result.UpperLimitsDb);
        AssertValues([2, 1, -5, 1], result.MarginsDb);
        Assert.All(result.LowerLimitsDb, l => Assert.Null(l));
        Assert.False(result.Passed);
        Assert.Equal(4, result.PointsChecked);
        Assert.Equal(-5, result.WorstMarginDb!.Value, Digits);
        Assert.Equal(Frequency.FromMegahertz(175), result.WorstMarginAt);
        Assert.Equal(LimitSide.Upper, result.WorstSide);
    }

    [Fact]
    public void Evaluate_LogInterpolation_FollowsStraightLineInLogFrequency()
    {
        // Upper line from (10 MHz, -20 dB) to (1000 MHz, -60 dB), log interpolation:
        // L(f) = -20 + (-40)·log10(f/10 MHz)/log10(100).
        //   f = 100 MHz: log10(10)/2 = 0.5            -> L = -40 dB
        //   f = 20 MHz:  log10(2)/2 = 0.30103/2 = 0.150515 -> L = -20 - 6.0206 = -26.0206 dB
        // (Linear interpolation would give -20 - 40·90/990 = -23.6364 dB at 100 MHz.)
        var upper = Line((10, -20), (1000, -60));
        var logMask = new LimitMask("log", upper, null, TraceUnit.Decibel, interpolation: MaskInterpolation.Logarithmic);
        var linearMask = new LimitMask("lin", upper, null, TraceUnit.Decibel);
        var trace = SParameter([10, 20, 100, 1000], [-70, -70, -70, -70]);

        var log = logMask.Evaluate(trace);
        var linear = linearMask.Evaluate(trace);

        Assert.Equal(-20, log.UpperLimitsDb[0]!.Value, Digits);
        Assert.Equal(-26.0206, log.UpperLimitsDb[1]!.Value, 4);
        Assert.Equal(-40, log.UpperLimitsDb[2]!.Value, Digits);
        Assert.Equal(-60, log.UpperLimitsDb[3]!.Value, Digits);
        Assert.Equal(43.9794, log.MarginsDb[1]!.Value, 4);
        Assert.Equal(-23.6364, linear.UpperLimitsDb[2]!.Value, 4);
        Assert.True(log.Passed);
    }

    [Fact]
    public void Evaluate_UpperStep_AppliesTheStricterCornerAtTheStepFrequency()
    {
        // -30 dB up to 150 MHz, -10 dB from 150 MHz; at exactly 150 MHz both corners apply and
        // the stricter (lower) one counts for an upper limit.
        var up = new LimitMask("up", Line((100, -30), (150, -30), (150, -10), (200, -10)), null, TraceUnit.DecibelMilliwatt);
        var down = new LimitMask("down", Line((100, -10), (150, -10), (150, -30), (200, -30)), null, TraceUnit.DecibelMilliwatt);
        var trace = Power([100, 125, 150, 175, 200], [-20, -20, -20, -20, -20]);

        var rising = up.Evaluate(trace);
        var falling = down.Evaluate(trace);

        AssertValues([-30, -30, -30, -10, -10], rising.UpperLimitsDb);
        AssertValues([-10, -10, -10, 10, 10], rising.MarginsDb);
        AssertValues([-10, -10, -30, -30, -30], falling.UpperLimitsDb);
        var span = Assert.Single(rising.FailingSpans);
        Assert.Equal(new FailingSpan(Frequency.FromMegahertz(100), Frequency.FromMegahertz(150), LimitSide.Upper, -10), span);
    }

    [Fact]
    public void Evaluate_LowerStep_AppliesTheHigherCornerAtTheStepFrequency()
    {
        var mask = new LimitMask("step", null, Line((100, -10), (150, -10), (150, -30), (200, -30)), TraceUnit.Decibel);
        var trace = SParameter([100, 150, 200], [-20, -20, -20]);

        var result = mask.Evaluate(trace);

        AssertValues([-10, -10, -30], result.LowerLimitsDb);
        AssertValues([-10, -10, 10], result.MarginsDb);
        Assert.Equal(LimitSide.Lower, result.WorstSide);
    }

    [Fact]
    public void Evaluate_RelativeToPeak_AddsThePeakLevelToEveryCorner()
    {
        // Peak -10 dBm at 21.4 MHz: lower limit -3 dB -> -13 dBm, upper limit -40 dB -> -50 dBm.
        var mask = new LimitMask("shape",
            Sections([(21.0, -40), (21.2, -40)], [(21.6, -40), (21.8, -40)]),
            Line((21.35, -3), (21.45, -3)),
            unit: null, reference: MaskReference.RelativeToPeak);
        double[] mhz = [21.0, 21.2, 21.35, 21.4, 21.45, 21.6, 21.8];
        double[] dbm = [-55, -48, -12, -10, -14, -60, -65];

        var result = mask.Evaluate(Power(mhz, dbm));
        var louder = mask.Evaluate(Power(mhz, dbm.Select(l => l + 20).ToArray()));

        Assert.Equal(-10, result.ReferenceDb);
        AssertValues([-50, -50, null, null, null, -50, -50], result.UpperLimitsDb);
        AssertValues([null, null, -13, -13, -13, null, null], result.LowerLimitsDb);
        AssertValues([5, -2, 1, 3, -1, 10, 15], result.MarginsDb);
        Assert.Equal(result.MarginsDb.ToArray(), louder.MarginsDb.ToArray());
        Assert.Equal(
            [
                new FailingSpan(Frequency.FromMegahertz(21.2), Frequency.FromMegahertz(21.2), LimitSide.Upper, -2),
                new FailingSpan(Frequency.FromMegahertz(21.45), Frequency.FromMegahertz(21.45), LimitSide.Lower, -1),
            ],
            result.FailingSpans);
    }

    [Fact]
    public void Evaluate_RelativeToPeak_UsesThePeakOfTheWholeTraceNotOnlyTheMaskSpan()
    {
        var mask = new LimitMask("shape", null, Line((110, -6), (120, -6)), unit: null, reference: MaskReference.RelativeToPeak);
        var trace = SParameter([100, 110, 120], [0, -5, -7]);

        var result = mask.Evaluate(trace);

        Assert.Equal(0, result.ReferenceDb, Digits);
        AssertValues([null, 1, -1], result.MarginsDb);
    }

    [Fact]
    public void Evaluate_PointsOutsideTheCornersOrInAGap_AreNotChecked()
    {
        var mask = new LimitMask("islands", Sections([(110, -20), (115, -20)], [(125, -20), (130, -20)]), null, TraceUnit.Decibel);
        var trace = SParameter([100, 105, 110, 115, 120, 125, 130, 135], [0, 0, -30, -30, 0, -30, -30, 0]);

        var result = mask.Evaluate(trace);

        AssertValues([null, null, 10, 10, null, 10, 10, null], result.MarginsDb);
        Assert.Equal(4, result.PointsChecked);
        Assert.True(result.Passed);
        Assert.Empty(result.FailingSpans);
    }

    [Fact]
    public void Evaluate_NoPointInsideTheMask_DoesNotPass()
    {
        var mask = new LimitMask("elsewhere", Line((200, -20), (300, -20)), null, TraceUnit.Decibel);

        var result = mask.Evaluate(SParameter([100, 150], [-40, -40]));

        Assert.False(result.Passed);
        Assert.Equal(0, result.PointsChecked);
        Assert.Null(result.WorstMarginDb);
        Assert.Null(result.WorstMarginAt);
        Assert.Null(result.WorstSide);
    }

    [Fact]
    public void Evaluate_LevelExactlyOnTheLimit_Passes()
    {
        var mask = new LimitMask("edge", null, Line((100, -30), (200, -30)), TraceUnit.DecibelMilliwatt);

        var result = mask.Evaluate(Power([100, 200], [-30, -30]));

        Assert.True(result.Passed);
        Assert.Equal(0, result.WorstMarginDb);
    }

    [Fact]
    public void Evaluate_BothLimitsApply_TakesTheSmallerMarginAndItsSide()
    {
        // Window from -10 dB (upper) to -20 dB (lower): level -12 -> upper 2, lower 8 -> 2 (upper);
        // level -19 -> upper 9, lower 1 -> 1 (lower).
        var mask = new LimitMask("window", Line((100, -10), (200, -10)), Line((100, -20), (200, -20)), TraceUnit.Decibel);

        var result = mask.Evaluate(SParameter([100, 200], [-12, -19]));

        AssertValues([2, 1], result.MarginsDb);
        Assert.Equal(LimitSide.Lower, result.WorstSide);
        Assert.Equal(Frequency.FromMegahertz(200), result.WorstMarginAt);
    }

    [Fact]
    public void Evaluate_SeveralFailingRuns_GivesOneSpanPerRunAndSide()
    {
        var mask = new LimitMask("window", Line((100, -10), (190, -10)), Line((100, -20), (190, -20)), TraceUnit.DecibelMilliwatt);
        double[] mhz = [100, 110, 120, 130, 140, 150, 160, 170, 180, 190];
        double[] dbm = [-15, -8, -7, -15, -9, -15, -22, -25, -21, -15];

        var result = mask.Evaluate(Power(mhz, dbm));

        Assert.Equal(
            [
                new FailingSpan(Frequency.FromMegahertz(110), Frequency.FromMegahertz(120), LimitSide.Upper, -3),
                new FailingSpan(Frequency.FromMegahertz(140), Frequency.FromMegahertz(140), LimitSide.Upper, -1),
                new FailingSpan(Frequency.FromMegahertz(160), Frequency.FromMegahertz(180), LimitSide.Lower, -5),
            ],
            result.FailingSpans);
        Assert.Equal(-5, result.WorstMarginDb!.Value, Digits);
        Assert.Equal(Frequency.FromMegahertz(170), result.WorstMarginAt);
        Assert.Equal(LimitSide.Lower, result.WorstSide);
        Assert.Equal(10, result.PointsChecked);
    }

    [Fact]
    public void Evaluate_DbmMaskOnAnSParameterTrace_IsRefused()
    {
        var mask = new LimitMask("spur", Line((100, -60), (200, -60)), null, TraceUnit.DecibelMilliwatt);

        var e = Assert.Throws<ArgumentException>(() => mask.Evaluate(SParameter([100], [-70])));

        Assert.Contains("dBm", e.Message);
        Assert.Contains("S21", e.Message);
    }

    [Fact]
    public void Evaluate_DbMaskOnAPowerTrace_IsRefused()
    {
        var mask = new LimitMask("loss", null, Line((100, -4), (200, -4)), TraceUnit.Decibel);

        var e = Assert.Throws<ArgumentException>(() => mask.Evaluate(Power([100], [-10])));

        Assert.Contains("power", e.Message);
    }

    [Fact]
    public void Evaluate_TraceOfAnotherParameter_IsRefused()
    {
        var mask = new LimitMask("match", Line((100, -10), (200, -10)), null, unit: null, parameter: TraceQuantity.S11);

        var e = Assert.Throws<ArgumentException>(() => mask.Evaluate(SParameter([100], [-20], TraceQuantity.S21)));

        Assert.Contains("S11", e.Message);
        Assert.Contains("S21", e.Message);
    }

    [Fact]
    public void Evaluate_RelativeMaskWithoutParameter_FitsSParameterAndPowerTraces()
    {
        var mask = new LimitMask("shape", null, Line((100, -3), (200, -3)), unit: null, reference: MaskReference.RelativeToPeak);

        Assert.True(mask.Evaluate(SParameter([100, 200], [-1, -2])).Passed);
        Assert.True(mask.Evaluate(Power([100, 200], [-31, -32])).Passed);
    }

    private static void AssertValues(double?[] expected, IReadOnlyList<double?> actual)
    {
        Assert.Equal(expected.Length, actual.Count);
        for (int i = 0; i < expected.Length; i++)
        {
            if (expected[i] is { } e)
            {
                Assert.True(actual[i].HasValue, $"point {i}: expected {e}, found no value");
                Assert.Equal(e, actual[i]!.Value, Digits);
            }
            else
            {
                Assert.Null(actual[i]);
            }
        }
    }
}
