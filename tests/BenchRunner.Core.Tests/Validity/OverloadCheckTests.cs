using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Core.Validity;

namespace BenchRunner.Core.Tests.Validity;

public class OverloadCheckTests
{
    // 1 MHz bins from 100 to 600 MHz; lines sit on single bins above a flat floor.
    private static readonly FrequencyAxis Axis = FrequencyAxis.Linear(Frequency.FromMegahertz(100), Frequency.FromMegahertz(600), 501);
    private static readonly Ratio Zero = Ratio.FromDecibels(0);
    private static readonly Ratio Ten = Ratio.FromDecibels(10);

    [Fact]
    public void Compare_TenDbStep_ClassifiesRealSecondAndThirdOrder()
    {
        // "Spectrum Analysis Basics", Application Note 150, ch. "Dynamic Range"; Witte, Spectrum and
        // Network Measurements (from memory; REFERENCES "Spectrum-analyser distortion"): with 10 dB
        // more attenuation a real line moves 0 dB, an internal 2nd-order product −10 dB, an internal
        // 3rd-order product −20 dB on the corrected display. The floor rises by the step.
        var lower = Trace(-100, (137, -20), (274, -50), (411, -60), (300, -40), (450, -70), (500, -86));
        var higher = Trace(-90, (137, -20), (274, -60), (411, -80), (300, -45));

        var verdict = OverloadCheck.Compare(lower, Zero, higher, Ten, Options).Value;

        Assert.Equal(
            [OverloadClass.Real, OverloadClass.AnalyserSecondOrder, OverloadClass.ChangedOtherwise,
             OverloadClass.AnalyserThirdOrder, OverloadClass.VanishedAnalyserMade, OverloadClass.HiddenByNoise],
            verdict.Peaks.Select(p => p.Class));
        Assert.Equal(-10, verdict.Peaks[1].ChangeDb!.Value, 1e-9);
        Assert.Equal(-5, verdict.Peaks[2].ChangeDb!.Value, 1e-9);
        Assert.Equal(-20, verdict.Peaks[3].ChangeDb!.Value, 1e-9);
        Assert.Null(verdict.Peaks[4].ChangeDb);
        Assert.Equal(-90, verdict.NoiseFloorAtHigher.Dbm, 1e-9);
        Assert.Equal(OverloadVerdict.OverloadAdvice, verdict.Advice);
    }

    [Fact]
    public void Compare_LineNearTheRaisedFloorWithANoiseMatch_IsHiddenByNoiseNotChanged()
    {
        // The raised floor is −90 dBm; a line at −85 dBm stands less than 6 dB (least prominence) + 1 dB
        // above it, so the −80 dBm ripple found there in the higher sweep proves nothing either way.
        var lower = Trace(-100, (137, -20), (250, -85));
        var higher = Trace(-90, (137, -20), (250, -80));

        var verdict = OverloadCheck.Compare(lower, Zero, higher, Ten, Options).Value;

        Assert.Equal([OverloadClass.Real, OverloadClass.HiddenByNoise], verdict.Peaks.Select(p => p.Class));
        Assert.Equal(5, verdict.Peaks[1].ChangeDb!.Value, 1e-9);
        Assert.False(verdict.AnyAnalyserMade);
    }

    [Fact]
    public void Compare_OnlyRealLines_GivesNoAdvice()
    {
        // A line within ±1 dB (the default tolerance) counts as real: 0.8 dB of change is real.
        var lower = Trace(-100, (137, -20), (274, -50));
        var higher = Trace(-90, (137, -20.8), (274, -49.5));

        var verdict = OverloadCheck.Compare(lower, Ten, higher, Ratio.FromDecibels(20), Options).Value;

        Assert.All(verdict.Peaks, p => Assert.Equal(OverloadClass.Real, p.Class));
        Assert.False(verdict.AnyAnalyserMade);
        Assert.Null(verdict.Advice);
    }

    [Fact]
    public void Compare_ReferencesExample_ThirdOrderProductFallsTwentyDbc()
    {
        // REFERENCES "Spectrum-analyser distortion" [book, calc]: a −85 dBc third-order product at
        // −30 dBm mixer level becomes −105 dBc at −40 dBm (the 10 dB step lowers the mixer level
        // by 10 dB; third order moves 3 dB per dB, the carrier 1 dB per dB: 2 dB per dB in dBc).
        var carrier = new CarrierSignal(Frequency.FromMegahertz(137), Level.FromDbm(-30));
        var lower = Trace(-160, (137, -30), (411, -115));
        var higher = Trace(-150, (137, -30), (411, -135));

        var verdict = OverloadCheck.Compare(lower, Zero, higher, Ten, Options with { Threshold = Level.FromDbm(-140) }).Value;
        var dbcLower = SpurLabeller.Label([carrier], PowerFigures.Peaks(lower, Level.FromDbm(-140)), Frequency.FromKilohertz(1));
        var dbcHigher = SpurLabeller.Label([carrier], PowerFigures.Peaks(higher, Level.FromDbm(-145)), Frequency.FromKilohertz(1));

        Assert.Equal(OverloadClass.AnalyserThirdOrder, verdict.Peaks[1].Class);
        Assert.Equal(-85, dbcLower[1].RelativeDbc!.Value, 1e-9);
        Assert.Equal(-105, dbcHigher[1].RelativeDbc!.Value, 1e-9);
        Assert.Equal("H3 of carrier 1", dbcHigher[1].Label);
    }

    [Theory]
    [InlineData(10, 10)]
    [InlineData(10, 0)]
    public void Compare_StepNotUpwards_IsUnavailable(double first, double second)
    {
        var trace = Trace(-100, (137, -20));

        var result = OverloadCheck.Compare(trace, Ratio.FromDecibels(first), trace, Ratio.FromDecibels(second));

        Assert.False(result.IsAvailable);
        Assert.Contains("must be above", result.Reason);
    }

    [Fact]
    public void Compare_StepTooSmallForTolerance_IsUnavailable()
    {
        var trace = Trace(-100, (137, -20));

        var result = OverloadCheck.Compare(trace, Zero, trace, Ratio.FromDecibels(2), Options with { LevelToleranceDb = 1 });

        Assert.False(result.IsAvailable);
    }

    [Theory]
    // Application Note 150, ch. "Dynamic Range" (from memory): 0, −step, −2·step; ±1 dB windows.
    [InlineData(0.9, OverloadClass.Real)]
    [InlineData(-9.2, OverloadClass.AnalyserSecondOrder)]
    [InlineData(-20.7, OverloadClass.AnalyserThirdOrder)]
    [InlineData(-15, OverloadClass.ChangedOtherwise)]
    [InlineData(3, OverloadClass.ChangedOtherwise)]
    public void Classify_ChangeForTenDbStep_FallsInItsWindow(double change, OverloadClass expected)
    {
        Assert.Equal(expected, OverloadCheck.Classify(change, 10, 1));
    }

    private static OverloadCheckOptions Options { get; } = new() { FrequencyTolerance = Frequency.FromKilohertz(100) };

    private static PowerTrace Trace(double floorDbm, params (double Megahertz, double Dbm)[] lines)
    {
        var levels = Enumerable.Repeat(floorDbm, Axis.Count).ToArray();
        foreach (var (megahertz, dbm) in lines)
        {
            levels[(int)Math.Round(megahertz - 100)] = dbm;
        }

        return new PowerTrace(Axis, levels);
    }
}
