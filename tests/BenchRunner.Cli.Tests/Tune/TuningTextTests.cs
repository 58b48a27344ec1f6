using BenchRunner.Cli.Tune;
using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Figures;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Tuning;

namespace BenchRunner.Cli.Tests.Tune;

public sealed class TuningTextTests
{
    private static readonly SourceLocation Here = new("plan.yaml", 1, 1);

    private static TuningFigure Row(FigureKey key, double? value, double? change, FigureLimit? limit = null, bool? inside = null) =>
        new(key, "passband", key.Label, value, change, limit, inside);

    [Theory]
    [InlineData(31_200.0, "+31.2 kHz")]
    [InlineData(-2_000_000.0, "-2 MHz")]
    [InlineData(0.01, "±0 Hz")]
    public void Change_Frequency_HasItsSignAndAPrefix(double change, string expected) =>
        Assert.Equal(expected, TuningText.Change(Row(FigureKeys.CentreFrequency, 137.5e6, change)));

    [Fact]
    public void Change_TooSmallToShow_HasNoDirection() =>
        Assert.Equal("±0 dB", TuningText.Change(Row(FigureKeys.InsertionLoss, 2.5, -0.001)));

    [Fact]
    public void Change_FloatingPointNoiseOnAFrequency_IsBelowTheValuesResolution() =>
        Assert.Equal("±0 Hz", TuningText.Change(Row(FigureKeys.CentreFrequency, 137.5e6, 1e-7)));

    [Fact]
    public void Change_LevelInDbm_IsARatioInDb() =>
        Assert.Equal("+0.25 dB", TuningText.Change(Row(FigureKeys.NoiseFloor, -110, 0.25)));

    [Fact]
    public void Value_MaskMargin_HasItsSign()
    {
        Assert.Equal("+0.6 dB", TuningText.Value(Row(FigureKeys.MaskMargin, 0.6, null)));
        Assert.Equal("137.5642 MHz", TuningText.Value(Row(FigureKeys.CentreFrequency, 137.56423e6, null)));
        Assert.Equal("-", TuningText.Value(Row(FigureKeys.LoadedQ, null, null)));
    }

    [Fact]
    public void Target_TargetWithTolerance_ReadsAsPlusMinus() =>
        Assert.Equal("137.5 MHz ± 300 kHz", TuningText.Target(Row(FigureKeys.CentreFrequency, 137.5e6, null, new FigureLimit(FigureKeys.CentreFrequency, 137.2e6, 137.8e6, 137.5e6, Here))));

    [Fact]
    public void Target_MaskMargin_ReadsAsAtLeastZero() =>
        Assert.Equal("at least 0 dB", TuningText.Target(Row(FigureKeys.MaskMargin, 0.4, null, new FigureLimit(FigureKeys.MaskMargin, 0, null, null, Here))));

    [Fact]
    public void Settle_StreakShort_SaysWhatIsStillNeeded()
    {
        var rule = new SettleOptions { Sweeps = 5, MinimumTime = TimeSpan.FromSeconds(3) };

        var text = TuningText.Settle(new SettleProgress(7, true, 2, TimeSpan.FromSeconds(1), false, false, false), rule);

        Assert.Equal("inside for 2 sweeps (1.0 s); settles after 5 sweeps and 3.0 s", text);
    }
}
