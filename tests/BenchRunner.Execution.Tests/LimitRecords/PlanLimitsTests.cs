using BenchRunner.Core.Masks;
using BenchRunner.Core.Quantities;
using BenchRunner.Execution.LimitRecords;
using BenchRunner.Execution.Plans;
using BenchRunner.Simulator.Circuits;
using BenchRunner.Simulator.Devices;
using BenchRunner.Core.Traces;

namespace BenchRunner.Execution.Tests.LimitRecords;

public sealed class PlanLimitsTests
{
    private static TestPlan ExamplePlan() => PlanFile.Load(RepositoryFiles.Example("plans/psf-137-check.yaml"));

    [Fact]
    public void From_ExamplePlan_HoldsItsMaskAndEachFigureLimit()
    {
        var limits = PlanLimits.From(ExamplePlan());

        var mask = Assert.Single(limits.Masks);
        Assert.Equal("mask", mask.Step);
        Assert.Equal("passband", mask.Trace);
        Assert.Equal(["center_hz", "insertion_loss_db", "bandwidth_3db_hz"], limits.Figures.Select(f => f.Key));
        var centre = limits.Figures[0];
        // The plan writes 137.5 MHz ± 0.3 MHz.
        Assert.Equal(137.2e6, centre.Min!.Value, 3);
        Assert.Equal(137.8e6, centre.Max!.Value, 3);
        Assert.Equal(137.5e6, centre.Target!.Value, 3);
        Assert.Equal("center_hz of passband", centre.CheckName);
        Assert.Null(limits.Figures[1].Min);
        Assert.Equal(4, limits.Figures[1].Max);
    }

    [Fact]
    public void ToRunJson_ReadsBackTheSameLimitsAndAMaskThatJudgesAlike()
    {
        var original = PlanLimits.From(ExamplePlan());

        var back = PlanLimits.FromRunJson(original.ToRunJson())!;

        Assert.Equal(original.Figures, back.Figures);
        Assert.Equal(original.Masks, back.Masks);
        var fileMask = MaskFile.Load(RepositoryFiles.Example("psf-137-passband.yaml"));
        var recordedMask = MaskFile.Parse(back.Masks[0].MaskText, "recorded");
        var axis = FrequencyAxis.Linear(Frequency.FromMegahertz(127.5), Frequency.FromMegahertz(147.5), 401);
        foreach (var board in new[] { Preselector137.TunedBoard(), Preselector137.DetunedBoard() })
        {
            var s21 = board.Sweep(axis, [TraceQuantity.S21])[0];
            var fromFile = fileMask.Evaluate(s21);
            var fromRecord = recordedMask.Evaluate(s21);
            Assert.Equal(fromFile.Passed, fromRecord.Passed);
            Assert.Equal(fromFile.FailingSpans.Count, fromRecord.FailingSpans.Count);
            // The mask text writes frequencies in decimal, so margins agree to rounding, not to the bit.
            for (int i = 0; i < s21.Count; i++)
            {
                Assert.Equal(fromFile.MarginsDb[i].HasValue, fromRecord.MarginsDb[i].HasValue);
                Assert.Equal(fromFile.MarginsDb[i] ?? 0, fromRecord.MarginsDb[i] ?? 0, 9);
            }
        }
    }

    [Theory]
    [InlineData(null)]
    [InlineData("")]
    [InlineData("{\"other\": 1}")]
    [InlineData("not json")]
    [InlineData("{\"limits\": {\"figures\": [{\"trace\": \"passband\"}]}}")]
    public void FromRunJson_WithoutUsableLimits_IsNull(string? json)
    {
        Assert.Null(PlanLimits.FromRunJson(json));
    }
}
