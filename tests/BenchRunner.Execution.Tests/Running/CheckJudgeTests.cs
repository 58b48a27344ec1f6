using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Figures;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Running;

namespace BenchRunner.Execution.Tests.Running;

public sealed class CheckJudgeTests
{
    private static readonly SourceLocation Here = new("plan.yaml", 1, 1);

    [Fact]
    public void Figure_Outside_WordsValueAndLimitWithTheOneFormatter()
    {
        var limit = new FigureLimit(FigureKeys.CentreFrequency, 137.2e6, 137.8e6, 137.5e6, Here);

        var result = CheckJudge.Figure("passband", limit, "figures", [NamedFigure.Of(FigureKeys.CentreFrequency, 136.9e6)]);

        Assert.False(result.Passed);
        Assert.Equal("center_hz of passband", result.Name);
        Assert.Equal("136.9 MHz; wanted 137.5 MHz ± 300 kHz", result.Detail);
        Assert.Equal(-0.3e6, result.Margin!.Value, 1e-3);
        Assert.Equal("Hz", result.MarginUnit);
    }

    [Fact]
    public void Figure_MeasuredDigits_AreTheFrequencysSevenSignificantDigits()
    {
        var limit = new FigureLimit(FigureKeys.CentreFrequency, 137.2e6, 137.8e6, 137.5e6, Here);

        var result = CheckJudge.Figure("passband", limit, "figures", [NamedFigure.Of(FigureKeys.CentreFrequency, 137.5642349e6)]);

        Assert.True(result.Passed);
        Assert.StartsWith("137.5642 MHz;", result.Detail);
    }

    [Fact]
    public void Figure_Unavailable_FailsWithTheReason()
    {
        var limit = new FigureLimit(FigureKeys.LoadedQ, 40, null, null, Here);

        var result = CheckJudge.Figure("passband", limit, "figures", [NamedFigure.Unavailable(FigureKeys.LoadedQ, "no -3 dB crossing")]);

        Assert.False(result.Passed);
        Assert.Equal("not available (no -3 dB crossing); wanted at least 40", result.Detail);
        Assert.Null(result.Margin);
    }

    [Theory]
    [InlineData(null, 4.0, "at most 4 dB")]
    [InlineData(1.5, null, "at least 1.5 dB")]
    [InlineData(1.5, 4.0, "1.5 dB to 4 dB")]
    public void Describe_Bounds_ReadAsWords(double? min, double? max, string expected)
    {
        Assert.Equal(expected, CheckJudge.Describe(new FigureLimit(FigureKeys.InsertionLoss, min, max, null, Here)));
    }
}
