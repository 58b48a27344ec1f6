using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Simulator.Spectrum;

namespace BenchRunner.Simulator.Tests.Spectrum;

public class SpectrumAnalyserSettingsTests
{
    [Fact]
    public void Constructor_Defaults_DemoSpanWith401Points()
    {
        var analyser = new SimulatedSpectrumAnalyser(1);

        Assert.Equal(FrequencyRange.Between(Frequency.FromMegahertz(136), Frequency.FromMegahertz(139)), analyser.Span);
        Assert.Equal(Frequency.FromKilohertz(10), analyser.ResolutionBandwidth);
        Assert.Equal(Ratio.FromDecibels(10), analyser.InputAttenuation);
        Assert.Equal(Level.FromDbm(0), analyser.ReferenceLevel);
        Assert.Equal(401, analyser.Points);
        Assert.Equal(401, analyser.Sweep().Count);
    }

    [Fact]
    public void Identity_NamesTheSimulatedModel()
    {
        var identity = new SimulatedSpectrumAnalyser(1, new SpectrumAnalyserOptions { Serial = "0042" }).Identity;

        Assert.Equal("BenchRunner", identity.Maker);
        Assert.Equal("SIM-SA", identity.Model);
        Assert.Equal("0042", identity.Serial);
        Assert.NotEqual("0", identity.Firmware);
    }

    [Fact]
    public void Limits_DeclareRangeAndMaximumInput()
    {
        var limits = new SimulatedSpectrumAnalyser(1).Limits;

        Assert.Equal(Frequency.FromKilohertz(100), limits.FrequencyRange!.Value.Start);
        Assert.Equal(Frequency.FromGigahertz(1.5), limits.FrequencyRange!.Value.Stop);
        Assert.Equal(Level.FromDbm(20), limits.MaxInputLevel);
        Assert.True(SimulatedSpectrumAnalyser.DamageLevel > limits.MaxInputLevel!.Value);
    }

    [Theory]
    [InlineData(2e3)]
    [InlineData(0.5)]
    [InlineData(3e6)]
    public void ResolutionBandwidth_NotOffered_ThrowsAndKeepsTheOldValue(double hertz)
    {
        var analyser = new SimulatedSpectrumAnalyser(1);

        var error = Assert.Throws<ArgumentOutOfRangeException>(() => analyser.ResolutionBandwidth = Frequency.FromHertz(hertz));

        Assert.Contains("SIM-SA has no", error.Message);
        Assert.Equal(Frequency.FromKilohertz(10), analyser.ResolutionBandwidth);
    }

    [Theory]
    [InlineData(5)]
    [InlineData(-10)]
    [InlineData(60)]
    public void InputAttenuation_NotAStep_Throws(double decibels)
    {
        var analyser = new SimulatedSpectrumAnalyser(1);

        Assert.Throws<ArgumentOutOfRangeException>(() => analyser.InputAttenuation = Ratio.FromDecibels(decibels));
    }

    [Fact]
    public void SetSpan_OutsideTheRangeOrReversed_Throws()
    {
        var analyser = new SimulatedSpectrumAnalyser(1);

        Assert.Throws<ArgumentOutOfRangeException>(() => analyser.SetSpan(Frequency.FromKilohertz(50), Frequency.FromMegahertz(1)));
        Assert.Throws<ArgumentOutOfRangeException>(() => analyser.SetSpan(Frequency.FromGigahertz(1), Frequency.FromGigahertz(1.6)));
        Assert.Throws<ArgumentOutOfRangeException>(() => analyser.SetSpan(Frequency.FromMegahertz(140), Frequency.FromMegahertz(130)));
        Assert.Throws<ArgumentOutOfRangeException>(() => analyser.SetCentreSpan(Frequency.FromKilohertz(200), Frequency.FromKilohertz(500)));
    }

    [Fact]
    public void SetCentreSpan_SetsStartAndStopAroundTheCentre()
    {
        var analyser = new SimulatedSpectrumAnalyser(1);

        analyser.SetCentreSpan(Frequency.FromMegahertz(137.5), Frequency.FromMegahertz(3));

        Assert.Equal(Frequency.FromMegahertz(136), analyser.Span.Start);
        Assert.Equal(Frequency.FromMegahertz(139), analyser.Span.Stop);
        Assert.Equal(Frequency.FromMegahertz(136), analyser.Axis.Start);
    }

    [Theory]
    [InlineData(1)]
    [InlineData(10002)]
    public void Points_OutOfRange_Throws(int points)
    {
        var analyser = new SimulatedSpectrumAnalyser(1);

        Assert.Throws<ArgumentOutOfRangeException>(() => analyser.Points = points);
    }

    [Fact]
    public void ReferenceLevel_OutOfRange_Throws()
    {
        var analyser = new SimulatedSpectrumAnalyser(1);

        Assert.Throws<ArgumentOutOfRangeException>(() => analyser.ReferenceLevel = Level.FromDbm(31));
        analyser.ReferenceLevel = Level.FromDbm(-40);
        Assert.Equal(Level.FromDbm(-40), analyser.ReferenceLevel);
    }

    [Fact]
    public void Configure_ValidSettings_AppliesThemAll()
    {
        var analyser = new SimulatedSpectrumAnalyser(1);

        analyser.Configure(new SpectrumSettings(
            FrequencyRange.Between(Frequency.FromMegahertz(130), Frequency.FromMegahertz(145)),
            Frequency.FromKilohertz(30), Ratio.FromDecibels(20), Level.FromDbm(-10), 201));

        Assert.Equal(Frequency.FromMegahertz(130), analyser.Span.Start);
        Assert.Equal(Frequency.FromMegahertz(145), analyser.Span.Stop);
        Assert.Equal(Frequency.FromKilohertz(30), analyser.ResolutionBandwidth);
        Assert.Equal(Ratio.FromDecibels(20), analyser.InputAttenuation);
        Assert.Equal(Level.FromDbm(-10), analyser.ReferenceLevel);
        Assert.Equal(201, analyser.Points);
    }

    [Fact]
    public void Configure_OneBadSetting_ChangesNothing()
    {
        var analyser = new SimulatedSpectrumAnalyser(1);

        Assert.Throws<ArgumentOutOfRangeException>(() => analyser.Configure(new SpectrumSettings(
            FrequencyRange.Between(Frequency.FromMegahertz(130), Frequency.FromMegahertz(145)),
            Frequency.FromKilohertz(30), Ratio.FromDecibels(15), Level.FromDbm(-10))));

        Assert.Equal(Frequency.FromMegahertz(136), analyser.Span.Start);
        Assert.Equal(Frequency.FromKilohertz(10), analyser.ResolutionBandwidth);
    }

    [Theory]
    [InlineData(2e3, 3e3)]
    [InlineData(1.5e3, 1e3)]
    [InlineData(5e6, 1e6)]
    [InlineData(1, 10)]
    public void NearestResolutionBandwidth_RoundsOnALogScale(double requested, double expected)
    {
        Assert.Equal(Frequency.FromHertz(expected), SimulatedSpectrumAnalyser.NearestResolutionBandwidth(Frequency.FromHertz(requested)));
    }

    [Fact]
    public void Constructor_InvalidOptions_ReportsEveryProblem()
    {
        var error = Assert.Throws<ArgumentException>(() => new SimulatedSpectrumAnalyser(1, new SpectrumAnalyserOptions
        {
            NoiseFigure = Ratio.FromDecibels(-1),
            NoiseTemperatureKelvin = 0,
        }));

        Assert.Contains("noise figure", error.Message);
        Assert.Contains("noise temperature", error.Message);
    }
}
