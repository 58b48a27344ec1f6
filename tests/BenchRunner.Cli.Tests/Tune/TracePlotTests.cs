using BenchRunner.Cli.Tune;
using BenchRunner.Core.Masks;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;

namespace BenchRunner.Cli.Tests.Tune;

public sealed class TracePlotTests
{
    private static PowerTrace Flat(double dbm, int points = 20) =>
        new(FrequencyAxis.Linear(Frequency.FromMegahertz(100), Frequency.FromMegahertz(200), points), Enumerable.Repeat(dbm, points));

    [Fact]
    public void Render_FlatTrace_DrawsOneRowOfMarksAtItsLevelAndTheSpanBelow()
    {
        var lines = TracePlot.Render(Flat(-20), mask: null, width: 20, height: 11);

        // Top line 0 dBm (−20 rounded up to 5 dB is −20; the plot spans 50 dB below it): the trace sits on the top row.
        Assert.Equal(11 + 2, lines.Count);
        Assert.EndsWith("|" + new string('*', 20), lines[0]);
        Assert.All(lines.Skip(1).Take(10), l => Assert.DoesNotContain('*', l));
        Assert.Contains("100 MHz", lines[^1]);
        Assert.Contains("200 MHz", lines[^1]);
    }

    [Fact]
    public void Render_TraceAboveTheUpperLimit_MarksItOutside()
    {
        var trace = Flat(-20);
        var mask = new LimitMask("cap", new LimitLine([new MaskCorner(Frequency.FromMegahertz(100), -40), new MaskCorner(Frequency.FromMegahertz(200), -40)]), lower: null, unit: TraceUnit.DecibelMilliwatt);

        var lines = TracePlot.Render(trace, mask.Evaluate(trace), width: 20, height: 11);

        Assert.Contains(lines, l => l.Contains(new string(TracePlot.FailMark, 20)));
        Assert.Contains(lines, l => l.Contains(new string(TracePlot.UpperMark, 20)));
        Assert.DoesNotContain(lines, l => l.Contains(TracePlot.TraceMark));
    }
}
