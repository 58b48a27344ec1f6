using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Simulator.Bench;
using BenchRunner.Simulator.Spectrum;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Bench;

public class VirtualBenchTests
{
    private static readonly Frequency Carrier = Frequency.FromMegahertz(100);
    private static readonly Frequency NarrowSpan = Frequency.FromKilohertz(20);

    [Fact]
    public void Sweep_GeneratorThroughTenDbPath_ReadsTenDbLower()
    {
        // Levels add in dB: −20 dBm out of the generator, −10 dB path → −30 dBm at the analyser.
        var bench = BenchWithGenerator(FixedPath.Loss(Ratio.FromDecibels(10)), -20);

        double level = SpectrumReadings.LevelAt(bench.SpectrumAnalyser, Carrier, NarrowSpan, Level.FromDbm(-100));

        Assert.Equal(-30, level, 0.05);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(10)]
    [InlineData(20)]
    public void Sweep_GeneratorHarmonics_ReadAtTheirDbcWhateverTheAttenuation(double attenuationDb)
    {
        // Real harmonics (−30 and −40 dBc, the generator defaults) are at the input, so the IF
        // compensation keeps them where they are; the analyser's own 2nd harmonic is 35 dB or more
        // below the real one (−0.002 dB) and the floor (RBW 1 kHz) 30 dB or more below. 0.1 dB.
        var bench = BenchWithGenerator(FixedPath.Loss(Ratio.FromDecibels(10)), -20);
        var analyser = bench.SpectrumAnalyser;
        analyser.ResolutionBandwidth = Frequency.FromKilohertz(1);
        analyser.InputAttenuation = Ratio.FromDecibels(attenuationDb);

        double carrier = SpectrumReadings.LevelAt(analyser, Carrier, NarrowSpan, Level.FromDbm(-120));
        double second = SpectrumReadings.LevelAt(analyser, Frequency.FromMegahertz(200), NarrowSpan, Level.FromDbm(-120));
        double third = SpectrumReadings.LevelAt(analyser, Frequency.FromMegahertz(300), NarrowSpan, Level.FromDbm(-120));

        Assert.Equal(-30, second - carrier, 0.1);
        Assert.Equal(-40, third - carrier, 0.1);
    }

    [Fact]
    public void Sweep_GeneratorOff_NothingAboveTheFloor()
    {
        var bench = BenchWithGenerator(FixedPath.Through, -20);
        bench.Generator.OutputOn = false;
        var analyser = bench.SpectrumAnalyser;
        analyser.SetCentreSpan(Carrier, NarrowSpan);

        var lines = PowerFigures.Peaks(analyser.Sweep(), analyser.DisplayedAverageNoiseLevel.Plus(Ratio.FromDecibels(15)), 20);

        Assert.Empty(lines);
    }

    [Fact]
    public void Path_Swapped_TheNextSweepSeesTheNewPath()
    {
        // A DUT plugged in as a transmission function: |S21| = 0.1 → −20 dB (calc).
        var bench = BenchWithGenerator(FixedPath.Through, -20);
        bench.Path = FrequencyResponsePath.FromTransmission(_ => new System.Numerics.Complex(0.1, 0));

        double level = SpectrumReadings.LevelAt(bench.SpectrumAnalyser, Carrier, NarrowSpan, Level.FromDbm(-100));

        Assert.Equal(-40, level, 0.05);
    }

    [Fact]
    public void Sweep_SceneAndGenerator_BothArrive()
    {
        var bench = BenchWithGenerator(FixedPath.Loss(Ratio.FromDecibels(1)), -30);
        bench.Scene = Scene.Empty.With("neighbour", Emission.Cw(Frequency.FromMegahertz(100.5), Level.FromDbm(-50)));
        var analyser = bench.SpectrumAnalyser;
        analyser.SetCentreSpan(Frequency.FromMegahertz(100.25), Frequency.FromMegahertz(1));

        var trace = analyser.Sweep();

        Assert.Equal(-31, SpectrumReadings.LineNear(trace, Carrier, Level.FromDbm(-90), Frequency.FromKilohertz(5)).LevelDb, 0.05);
        Assert.Equal(-50, SpectrumReadings.LineNear(trace, Frequency.FromMegahertz(100.5), Level.FromDbm(-90), Frequency.FromKilohertz(5)).LevelDb, 0.05);
    }

    [Fact]
    public void CreateDemo_HoldsTheDemoSceneAndAnIdleGenerator()
    {
        var bench = VirtualBench.CreateDemo(1);

        Assert.Contains(bench.Scene.Signals, s => s.Name == "downlink");
        Assert.False(bench.Generator.OutputOn);
        Assert.Equal(-21, bench.Path.Output(Carrier, Level.FromDbm(-20)).Dbm, 12);
    }

    private static VirtualBench BenchWithGenerator(IRfPath path, double levelDbm)
    {
        var bench = new VirtualBench(seed: 3, path: path);
        bench.SpectrumAnalyser.ResolutionBandwidth = Frequency.FromKilohertz(1);
        bench.Generator.Frequency = Carrier;
        bench.Generator.Level = Level.FromDbm(levelDbm);
        bench.Generator.OutputOn = true;
        return bench;
    }
}
