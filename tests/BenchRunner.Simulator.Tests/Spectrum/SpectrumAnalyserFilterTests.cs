using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Simulator.Spectrum;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Spectrum;

public class SpectrumAnalyserFilterTests
{
    private static readonly Frequency Carrier = Frequency.FromMegahertz(100);

    [Theory]
    [InlineData(1e3)]
    [InlineData(10e3)]
    [InlineData(100e3)]
    public void Sweep_CwCarrier_ShowsTheRbwFilterShape(double rbwHz)
    {
        // A CW line drawn by a Gaussian filter that is 3.0103 dB down at ±RBW/2 and falls as the
        // square of the offset in dB: the N dB width is RBW·√(N / 3.0103) (calc). So the 3 dB width is
        // 0.9983·RBW and the 60:3 dB shape factor √(60/3) = 4.47, in the range the trade quotes for
        // analogue RBW filters (common practice, no source). Points are RBW/40 apart; linear
        // interpolation of a parabola between them errs by under 0.1 %, so 0.5 % is the tolerance.
        // At −10 dBm with no attenuation the −60 dB skirt stands 20 dB or more above the noise.
        var analyser = AnalyserWith(Scene.Empty.With("cw", Emission.Cw(Carrier, Level.FromDbm(-10))), rbwHz);
        analyser.InputAttenuation = Ratio.Unity;
        analyser.Points = 801;
        analyser.SetCentreSpan(Carrier, Frequency.FromHertz(20 * rbwHz));

        var trace = analyser.Sweep();
        var width3 = TraceFigures.Bandwidth(trace, 3).Value.Width.Hertz;
        var width60 = TraceFigures.Bandwidth(trace, 60).Value.Width.Hertz;

        Assert.Equal(rbwHz * Math.Sqrt(3 / TraceFigures.HalfPowerDb), width3, rbwHz * 0.005);
        Assert.Equal(rbwHz * Math.Sqrt(60 / TraceFigures.HalfPowerDb), width60, rbwHz * 0.02);
        Assert.Equal(Math.Sqrt(60 / 3.0), width60 / width3, 0.02);
    }

    [Theory]
    [InlineData(1e3)]
    [InlineData(30e3)]
    [InlineData(1e6)]
    public void Sweep_CwCarrier_PeakReadsTheCarrierLevelAtAnyRbw(double rbwHz)
    {
        // The filter has unit gain at its centre, so a CW carrier reads its power whatever the RBW
        // (the parabola refinement of the peak is exact on a Gaussian drawn in dB).
        var analyser = AnalyserWith(Scene.Empty.With("cw", Emission.Cw(Carrier, Level.FromDbm(-20))), rbwHz);

        double level = SpectrumReadings.LevelAt(analyser, Carrier, Frequency.FromHertz(10 * rbwHz), Level.FromDbm(-60));

        Assert.Equal(-20, level, 0.05);
    }

    [Fact]
    public void Sweep_FmNarrowerThanTheRbw_ReadsItsTotalPower()
    {
        // Powers of the lines inside the filter add: the demo downlink (34 kHz wide) through a 1 MHz
        // filter reads its total power, less 2^(−(2·17/1000)²) ≈ −0.004 dB at the outermost lines.
        var scene = Scene.Empty.With("downlink", Emission.Fm(Carrier, Level.FromDbm(-30), Frequency.FromKilohertz(14.6), Frequency.FromKilohertz(2.4)));
        var analyser = AnalyserWith(scene, 1e6);

        double level = SpectrumReadings.LevelAt(analyser, Carrier, Frequency.FromMegahertz(10), Level.FromDbm(-60));

        Assert.Equal(-30, level, 0.05);
    }

    [Fact]
    public void Sweep_FmWiderThanTheRbw_ChannelPowerOverCarsonBandIsItsPower()
    {
        // Each line is drawn with the filter's area, RBW × 1.0645 (the Gaussian's noise bandwidth),
        // so channel power with that factor gives back the line powers. The demo downlink's Carson band
        // (34 kHz, β = 6.08) holds its lines up to n = 7: 99.1 % of the power (−0.04 dB); the noise in
        // the band is 24 dB below the signal (+0.02 dB). Tolerance 0.15 dB.
        var scene = Scene.Empty.With("downlink", Emission.Fm(Carrier, Level.FromDbm(-70), Frequency.FromKilohertz(14.6), Frequency.FromKilohertz(2.4)));
        var analyser = AnalyserWith(scene, 1e3);
        analyser.Points = 1001;
        analyser.SetCentreSpan(Carrier, Frequency.FromKilohertz(100));

        var trace = analyser.Sweep();
        var carson = ModulationFigures.CarsonBandwidth(Frequency.FromKilohertz(14.6), Frequency.FromKilohertz(2.4));
        var power = PowerFigures.ChannelPower(trace, Carrier, carson, analyser.ResolutionBandwidth, SimulatedSpectrumAnalyser.NoiseBandwidthFactor).Value;

        Assert.Equal(-70, power.Dbm, 0.15);
    }

    private static SimulatedSpectrumAnalyser AnalyserWith(Scene scene, double rbwHz)
    {
        var analyser = new SimulatedSpectrumAnalyser(7) { ResolutionBandwidth = Frequency.FromHertz(rbwHz) };
        analyser.Connect(scene);
        return analyser;
    }
}
