using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Simulator.Bench;
using BenchRunner.Simulator.Spectrum;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Spectrum;

public class DemoSceneTests
{
    [Fact]
    public void Downlink_IsAbout34KilohertzWideByCarson()
    {
        // Carson's rule B = 2(Δf + fm) (REFERENCES, book): 2(14.6 + 2.4) kHz = 34 kHz.
        var downlink = DemoScene.Create().Signals.Single(s => s.Name == "downlink").Emission;

        var carson = ModulationFigures.CarsonBandwidth(downlink.Modulation[0].PeakDeviation, downlink.Modulation[0].Rate);

        Assert.Equal(34, carson.Kilohertz, 9);
        Assert.Equal(DemoScene.DownlinkFrequency, downlink.Centre);
    }

    [Fact]
    public void Sweep_DemoBench_BeaconIsRealAndStrongCwHarmonicIsInternal()
    {
        // The beacon (136.2 MHz, −62 dBm) is real: it reads the same at 10 and 20 dB attenuation.
        // The −15 dBm carrier at 68.9 MHz makes a second harmonic in the mixer at 137.8 MHz:
        // 2·(−25) − 35 + 10 = −75 dBm at 10 dB, −85 dBm at 20 dB (AN 150, "Dynamic Range"; from
        // memory). RBW 100 Hz keeps the mean floor 25 dB or more below (−110 dBm at 20 dB): it adds
        // 0.3 % to the mean reading and a few times that on an unlucky sample, under 0.1 dB.
        var analyser = VirtualBench.CreateDemo(77).SpectrumAnalyser;
        analyser.ResolutionBandwidth = Frequency.FromHertz(100);
        var span = Frequency.FromKilohertz(5);
        var beacon = Frequency.FromMegahertz(136.2);
        var harmonic = Frequency.FromMegahertz(137.8);

        double beacon10 = SpectrumReadings.LevelAt(analyser, beacon, span, Level.FromDbm(-100));
        double harmonic10 = SpectrumReadings.LevelAt(analyser, harmonic, span, Level.FromDbm(-100));
        analyser.InputAttenuation = Ratio.FromDecibels(20);
        double beacon20 = SpectrumReadings.LevelAt(analyser, beacon, span, Level.FromDbm(-100));
        double harmonic20 = SpectrumReadings.LevelAt(analyser, harmonic, span, Level.FromDbm(-100));

        Assert.Equal(-62, beacon10, 0.1);
        Assert.Equal(-62, beacon20, 0.1);
        Assert.Equal(-75, harmonic10, 0.1);
        Assert.Equal(-85, harmonic20, 0.15);
    }

    [Fact]
    public void Sweep_DemoBench_DownlinkChannelPowerIsItsLevel()
    {
        // Channel power over the downlink's Carson band with the Gaussian's noise bandwidth
        // (1.0645 × RBW) gives back its −70 dBm, less the 0.9 % of its power outside the band
        // (sidebands beyond n = 7 at β = 6.08): −0.04 dB. Tolerance 0.15 dB.
        var analyser = VirtualBench.CreateDemo(78).SpectrumAnalyser;
        analyser.ResolutionBandwidth = Frequency.FromKilohertz(1);
        analyser.Points = 1001;
        analyser.SetCentreSpan(DemoScene.DownlinkFrequency, Frequency.FromKilohertz(100));

        var power = PowerFigures.ChannelPower(
            analyser.Sweep(), DemoScene.DownlinkFrequency, Frequency.FromKilohertz(34),
            analyser.ResolutionBandwidth, SimulatedSpectrumAnalyser.NoiseBandwidthFactor).Value;

        Assert.Equal(DemoScene.DownlinkLevel.Dbm, power.Dbm, 0.15);
    }
}
