using BenchRunner.Simulator.Bench;

namespace BenchRunner.Simulator.Tests.Spectrum;

/// <remarks>Traces are compared as plain arrays: ImmutableArray's own equality compares references.</remarks>
public class SpectrumAnalyserDeterminismTests
{
    [Fact]
    public void Sweep_SameSeed_SameSequenceOfTraces()
    {
        var first = VirtualBench.CreateDemo(2024);
        var second = VirtualBench.CreateDemo(2024);

        for (int i = 0; i < 3; i++)
        {
            Assert.Equal(first.SpectrumAnalyser.Sweep().LevelsDb.ToArray(), second.SpectrumAnalyser.Sweep().LevelsDb.ToArray());
        }
    }

    [Fact]
    public void Sweep_OtherSeed_OtherNoise()
    {
        var first = VirtualBench.CreateDemo(1).SpectrumAnalyser.Sweep();
        var second = VirtualBench.CreateDemo(2).SpectrumAnalyser.Sweep();

        Assert.NotEqual(first.LevelsDb.ToArray(), second.LevelsDb.ToArray());
    }

    [Fact]
    public void Sweep_Repeated_DrawsFreshNoise()
    {
        var analyser = VirtualBench.CreateDemo(3).SpectrumAnalyser;

        Assert.NotEqual(analyser.Sweep().LevelsDb.ToArray(), analyser.Sweep().LevelsDb.ToArray());
    }
}
