using BenchRunner.Core.Quantities;
using BenchRunner.Simulator.Spectrum;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Spectrum;

/// <summary>
/// The analyser's own mixer distortion. Sources: "Spectrum Analysis Basics", Application Note 150,
/// ch. "Dynamic Range", and Witte, Spectrum and Network Measurements (both from memory):
/// internally generated second-order products change 2 dB per dB of mixer level and third-order
/// ones 3 dB per dB, while the attenuator is compensated in the IF so a real signal stays put.
/// Every level here is read off a trace with PowerFigures.Peaks.
/// </summary>
public class SpectrumAnalyserDistortionTests
{
    private static readonly Frequency Fundamental = Frequency.FromMegahertz(100);
    private static readonly Frequency NarrowSpan = Frequency.FromKilohertz(100);

    [Theory]
    [InlineData(-10, 0)]
    [InlineData(0, 10)]
    public void Sweep_TenDbMoreAttenuation_RealSignalStaysSecondFallsTenThirdFallsTwenty(double inputDbm, double attenuationDb)
    {
        // REFERENCES, "Spectrum-analyser distortion": +10 dB attenuation → real signal Δ 0 dB,
        // internal 2nd harmonic −10 dB, internal 3rd −20 dB. The products stand 30 dB or more above
        // the floor (RBW 10 kHz) and the mixer is 10 dB or more below its 1 dB compression point
        // (0.013 dB), so 0.1 dB holds.
        var analyser = AnalyserWith(Emission.Cw(Fundamental, Level.FromDbm(inputDbm)));
        analyser.InputAttenuation = Ratio.FromDecibels(attenuationDb);
        var before = ReadHarmonics(analyser);

        analyser.InputAttenuation = Ratio.FromDecibels(attenuationDb + 10);
        var after = ReadHarmonics(analyser);

        Assert.Equal(0, after.Fundamental - before.Fundamental, 0.1);
        Assert.Equal(-10, after.Second - before.Second, 0.1);
        Assert.Equal(-20, after.Third - before.Third, 0.1);
    }

    [Fact]
    public void Sweep_InternalHarmonics_SitWhereTheInterceptsPutThem()
    {
        // −10 dBm at the mixer (no attenuation), IIP2 +35 dBm, IIP3 +10 dBm (the defaults):
        // 2nd = 2·(−10) − 35 = −55 dBm, 3rd = 3·(−10) − 2·10 = −50 dBm (calc from the intercept definitions).
        var analyser = AnalyserWith(Emission.Cw(Fundamental, Level.FromDbm(-10)));
        analyser.InputAttenuation = Ratio.Unity;

        var read = ReadHarmonics(analyser);

        Assert.Equal(-55, read.Second, 0.1);
        Assert.Equal(-50, read.Third, 0.1);
    }

    [Fact]
    public void Sweep_ReferenceExample_ThirdOrderProductFromMinus85ToMinus105Dbc()
    {
        // REFERENCES (Application Note 150, "Dynamic Range"; Witte): a −85 dBc third-order product
        // at −30 dBm mixer level becomes −105 dBc at −40 dBm; TOI = −30 + 85/2 = +12.5 dBm.
        // The analyser is given IIP3 = +12.5 dBm, and a quiet front end (NF 0 dB, 29 K, RBW 10 Hz:
        // floor −164 dBm at 10 dB attenuation) so the −135 dBm product stands 29 dB clear of the
        // noise; the noise is not under test here. Tolerance 0.1 dB.
        var options = new SpectrumAnalyserOptions
        {
            ThirdOrderIntercept = Level.FromDbm(12.5),
            NoiseFigure = Ratio.Unity,
            NoiseTemperatureKelvin = 29,
        };
        var analyser = AnalyserWith(Emission.Cw(Fundamental, Level.FromDbm(-30)), options);
        analyser.ResolutionBandwidth = Frequency.FromHertz(10);
        var span = Frequency.FromKilohertz(1);
        var third = Frequency.FromMegahertz(300);

        analyser.InputAttenuation = Ratio.Unity; // mixer at −30 dBm
        double carrier30 = SpectrumReadings.LevelAt(analyser, Fundamental, span, Level.FromDbm(-100));
        double dbc30 = SpectrumReadings.LevelAt(analyser, third, span, Level.FromDbm(-150)) - carrier30;
        analyser.InputAttenuation = Ratio.FromDecibels(10); // mixer at −40 dBm
        double carrier40 = SpectrumReadings.LevelAt(analyser, Fundamental, span, Level.FromDbm(-100));
        double dbc40 = SpectrumReadings.LevelAt(analyser, third, span, Level.FromDbm(-150)) - carrier40;

        Assert.Equal(-85, dbc30, 0.1);
        Assert.Equal(-105, dbc40, 0.1);
        Assert.Equal(12.5, -30 - dbc30 / 2, 0.05);
        Assert.Equal(12.5, -40 - dbc40 / 2, 0.05);
    }

    [Fact]
    public void Sweep_TwoTones_ThirdOrderProductsAtTwoF1MinusF2FollowTheIntercept()
    {
        // Two −10 dBm tones at 100.0 and 100.1 MHz, no attenuation: the products at 2f1 − f2 =
        // 99.9 MHz and 2f2 − f1 = 100.2 MHz lie at 2·P1 + P2 − 2·IIP3 = −50 dBm and fall 20 dB for
        // 10 dB more attenuation (Witte, Spectrum and Network Measurements; AN 150; from memory).
        var f2 = Frequency.FromMegahertz(100.1);
        var analyser = AnalyserWith(Emission.Cw(Fundamental, Level.FromDbm(-10)), tone2: Emission.Cw(f2, Level.FromDbm(-10)));
        analyser.InputAttenuation = Ratio.Unity;
        var low = Frequency.FromMegahertz(99.9);
        var high = Frequency.FromMegahertz(100.2);

        double low0 = SpectrumReadings.LevelAt(analyser, low, NarrowSpan, Level.FromDbm(-100));
        double high0 = SpectrumReadings.LevelAt(analyser, high, NarrowSpan, Level.FromDbm(-100));
        analyser.InputAttenuation = Ratio.FromDecibels(10);
        double low10 = SpectrumReadings.LevelAt(analyser, low, NarrowSpan, Level.FromDbm(-100));

        Assert.Equal(-50, low0, 0.1);
        Assert.Equal(-50, high0, 0.1);
        Assert.Equal(-20, low10 - low0, 0.1);
    }

    [Fact]
    public void Sweep_TwoTones_SecondOrderSumProductFollowsTheIntercept()
    {
        // f1 + f2 = 200.1 MHz at P1 + P2 − IIP2 = −10 − 10 − 35 = −55 dBm, falling 10 dB for 10 dB
        // more attenuation (second order; AN 150, from memory).
        var f2 = Frequency.FromMegahertz(100.1);
        var analyser = AnalyserWith(Emission.Cw(Fundamental, Level.FromDbm(-10)), tone2: Emission.Cw(f2, Level.FromDbm(-10)));
        analyser.InputAttenuation = Ratio.Unity;
        var sum = Frequency.FromMegahertz(200.1);

        double at0 = SpectrumReadings.LevelAt(analyser, sum, NarrowSpan, Level.FromDbm(-100));
        analyser.InputAttenuation = Ratio.FromDecibels(10);
        double at10 = SpectrumReadings.LevelAt(analyser, sum, NarrowSpan, Level.FromDbm(-100));

        Assert.Equal(-55, at0, 0.1);
        Assert.Equal(-10, at10 - at0, 0.1);
    }

    [Fact]
    public void Sweep_CarrierAtTheMixerCompressionPoint_ReadsOneDbLowUntilAttenuated()
    {
        // At its 1 dB compression point (0 dBm at the mixer, the default) the mixer's gain is 1 dB
        // down by definition; 10 dB of attenuation takes it back to 0.013 dB (calc from the model).
        var analyser = AnalyserWith(Emission.Cw(Fundamental, Level.FromDbm(0)));
        analyser.InputAttenuation = Ratio.Unity;
        double compressed = SpectrumReadings.LevelAt(analyser, Fundamental, NarrowSpan, Level.FromDbm(-60));

        analyser.InputAttenuation = Ratio.FromDecibels(10);
        double linear = SpectrumReadings.LevelAt(analyser, Fundamental, NarrowSpan, Level.FromDbm(-60));

        Assert.Equal(-1, compressed, 0.02);
        Assert.Equal(0, linear, 0.03);
    }

    private static (double Fundamental, double Second, double Third) ReadHarmonics(SimulatedSpectrumAnalyser analyser) => (
        SpectrumReadings.LevelAt(analyser, Fundamental, NarrowSpan, Level.FromDbm(-100)),
        SpectrumReadings.LevelAt(analyser, Frequency.FromMegahertz(200), NarrowSpan, Level.FromDbm(-100)),
        SpectrumReadings.LevelAt(analyser, Frequency.FromMegahertz(300), NarrowSpan, Level.FromDbm(-100)));

    private static SimulatedSpectrumAnalyser AnalyserWith(Emission tone, SpectrumAnalyserOptions? options = null, Emission? tone2 = null)
    {
        var scene = Scene.Empty.With("tone", tone);
        if (tone2 is not null)
        {
            scene = scene.With("second tone", tone2);
        }

        var analyser = new SimulatedSpectrumAnalyser(5, options);
        analyser.Connect(scene);
        return analyser;
    }
}
