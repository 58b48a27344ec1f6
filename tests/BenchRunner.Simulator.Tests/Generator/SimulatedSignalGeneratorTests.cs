using BenchRunner.Core.Quantities;
using BenchRunner.Simulator.Generator;

namespace BenchRunner.Simulator.Tests.Generator;

public class SimulatedSignalGeneratorTests
{
    [Fact]
    public void Constructor_Defaults_OffAt137Point5MegahertzMinus30Dbm()
    {
        var generator = new SimulatedSignalGenerator();

        Assert.False(generator.OutputOn);
        Assert.Equal(Frequency.FromMegahertz(137.5), generator.Frequency);
        Assert.Equal(Level.FromDbm(-30), generator.Level);
        Assert.Empty(generator.Emissions());
    }

    [Fact]
    public void Identity_AndLimits_NameTheSimulatedModel()
    {
        var generator = new SimulatedSignalGenerator();

        Assert.Equal("BenchRunner", generator.Identity.Maker);
        Assert.Equal("SIM-GEN", generator.Identity.Model);
        Assert.Equal(Frequency.FromKilohertz(100), generator.Limits.FrequencyRange!.Value.Start);
        Assert.Equal(Frequency.FromGigahertz(1.5), generator.Limits.FrequencyRange!.Value.Stop);
        Assert.Equal(Level.FromDbm(-110), generator.Limits.MinOutputLevel);
        Assert.Equal(Level.FromDbm(10), generator.Limits.MaxOutputLevel);
    }

    [Fact]
    public void Emissions_OutputOn_CarrierAndHarmonicsAtTheirDbcLevels()
    {
        var generator = new SimulatedSignalGenerator { Frequency = Frequency.FromMegahertz(100), Level = Level.FromDbm(-20), OutputOn = true };

        var emissions = generator.Emissions().ToList();

        Assert.Equal(3, emissions.Count);
        Assert.All(emissions, e => Assert.True(e.IsUnmodulated));
        Assert.Equal((Frequency.FromMegahertz(100), -20.0), (emissions[0].Centre, emissions[0].Level.Dbm));
        Assert.Equal((Frequency.FromMegahertz(200), -50.0), (emissions[1].Centre, emissions[1].Level.Dbm));
        Assert.Equal((Frequency.FromMegahertz(300), -60.0), (emissions[2].Centre, emissions[2].Level.Dbm));
    }

    [Fact]
    public void Emissions_NoHarmonicsConfigured_OnlyTheCarrier()
    {
        var generator = new SimulatedSignalGenerator(new SignalGeneratorOptions { Harmonics = [] }) { OutputOn = true };

        Assert.Single(generator.Emissions());
    }

    [Theory]
    [InlineData(50e3)]
    [InlineData(1.6e9)]
    public void Frequency_OutsideTheRange_ThrowsAndKeepsTheOldValue(double hertz)
    {
        var generator = new SimulatedSignalGenerator();

        Assert.Throws<ArgumentOutOfRangeException>(() => generator.Frequency = Frequency.FromHertz(hertz));
        Assert.Equal(Frequency.FromMegahertz(137.5), generator.Frequency);
    }

    [Theory]
    [InlineData(10.5)]
    [InlineData(-111)]
    public void Level_OutsideTheRange_Throws(double dbm)
    {
        var generator = new SimulatedSignalGenerator();

        Assert.Throws<ArgumentOutOfRangeException>(() => generator.Level = Level.FromDbm(dbm));
    }

    [Fact]
    public void Reset_RestoresTheStartingState()
    {
        var generator = new SimulatedSignalGenerator { Frequency = Frequency.FromMegahertz(21.4), Level = Level.FromDbm(0), OutputOn = true };

        generator.Reset();

        Assert.False(generator.OutputOn);
        Assert.Equal(Frequency.FromMegahertz(137.5), generator.Frequency);
    }

    [Fact]
    public void Constructor_RepeatedHarmonicOrder_Throws()
    {
        var options = new SignalGeneratorOptions
        {
            Harmonics = [GeneratorHarmonic.Of(2, Ratio.FromDecibels(-30)), GeneratorHarmonic.Of(2, Ratio.FromDecibels(-35))],
        };

        var error = Assert.Throws<ArgumentException>(() => new SimulatedSignalGenerator(options));

        Assert.Contains("order 2", error.Message);
    }

    [Fact]
    public void GeneratorHarmonic_AboveTheCarrierOrFirstOrder_Throws()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => GeneratorHarmonic.Of(2, Ratio.FromDecibels(1)));
        Assert.Throws<ArgumentOutOfRangeException>(() => GeneratorHarmonic.Of(1, Ratio.FromDecibels(-30)));
    }
}
