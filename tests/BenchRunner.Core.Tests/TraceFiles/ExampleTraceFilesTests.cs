using BenchRunner.Core.Tests.Support;
using BenchRunner.Core.TraceFiles;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Tests.TraceFiles;

/// <summary>The demo files in docs/examples/ (made by scripts/make-example-traces.py) read, and say what the docs say.</summary>
public class ExampleTraceFilesTests
{
    private static TraceSet Example(string name) => TraceFile.Read(RepositoryFiles.PathOf(Path.Combine("docs", "examples", name)));

    [Theory]
    [InlineData("psf-24-0001.s2p")]
    [InlineData("psf-24-0002.s2p")]
    [InlineData("psf-24-0001.csv")]
    public void Read_Example_Gives401PointsOfFourSParameters(string name)
    {
        var set = Example(name);

        Assert.Equal(401, set.Axis.Count);
        Assert.Equal(127.5e6, set.Axis.Hertz[0]);
        Assert.Equal(147.5e6, set.Axis.Hertz[^1]);
        Assert.Equal(50, set.ReferenceOhms);
        Assert.Equal([TraceQuantity.S11, TraceQuantity.S21, TraceQuantity.S12, TraceQuantity.S22], set.Traces.Select(t => t.Quantity));
    }

    [Fact]
    public void Example0001_CsvAndTouchstone_HoldTheSameData()
    {
        var touchstone = Example("psf-24-0001.s2p");
        var csv = Example("psf-24-0001.csv");

        Assert.Equal<double>(csv.Axis.Hertz, touchstone.Axis.Hertz);
        foreach (var quantity in new[] { TraceQuantity.S11, TraceQuantity.S21, TraceQuantity.S12, TraceQuantity.S22 })
        {
            var a = (ComplexTrace)csv.Find(quantity)!;
            var b = (ComplexTrace)touchstone.Find(quantity)!;
            for (int p = 0; p < a.Count; p++)
            {
                // The .s2p file holds dB and degrees to 6 decimals: about 1e-7 relative.
                ComplexAssert.RelativelyClose(a.Samples[p], b.Samples[p], 1e-6);
            }
        }
    }

    [Fact]
    public void Examples_GoodAndDetunedBoards_DifferAsDocumented()
    {
        var good = Example("psf-24-0001.s2p").Find(TraceQuantity.S21)!;
        var detuned = Example("psf-24-0002.s2p").Find(TraceQuantity.S21)!;
        int centre = good.Axis.Hertz.IndexOf(137.5e6);

        Assert.InRange(good.LevelsDb.Max(), -3.0, -2.0);
        Assert.InRange(good.LevelsDb[centre], -3.0, -2.0);
        Assert.True(detuned.LevelsDb[centre] < -4.0, $"detuned board: {detuned.LevelsDb[centre]} dB at 137.5 MHz");
    }
}
