using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Core.Validity;
using BenchRunner.Simulator.Bench;
using BenchRunner.Simulator.Generator;
using BenchRunner.Simulator.Spectrum;

namespace BenchRunner.Simulator.Tests.Bench;

public class OverloadCheckBenchTests
{
    private static readonly Frequency Carrier = Frequency.FromMegahertz(137.5);
    private static readonly Frequency Span = Frequency.FromKilohertz(20);
    private static readonly Frequency Rbw = Frequency.FromKilohertz(1);

    [Theory]
    // Clean generator (no harmonics) at 0 dBm straight into the analyser (defaults IIP2 +35 dBm,
    // IIP3 +10 dBm). MixerProducts' formulas (Application Note 150, ch. "Dynamic Range"; from memory):
    // at 0 dB attenuation the mixer sees 0 dBm, its 2nd harmonic 2·0 − 35 = −35 dBm and its 3rd
    // 3·0 − 2·10 = −20 dBm; at 10 dB: (2·−10 − 35) + 10 = −45 dBm and (3·−10 − 20) + 10 = −40 dBm,
    // so −10 dB (second order) and −20 dB (third order). Floor (RBW 1 kHz) about −110 dBm or lower.
    [InlineData(2, OverloadClass.AnalyserSecondOrder, -10)]
    [InlineData(3, OverloadClass.AnalyserThirdOrder, -20)]
    public void Compare_CleanCarrierDrivenHard_FindsTheAnalysersOwnHarmonic(int order, OverloadClass expected, double changeDb)
    {
        var bench = Bench([], 0);

        var peak = Judge(bench, order, 0, 10);

        Assert.Equal(expected, peak.Class);
        Assert.Equal(changeDb, peak.ChangeDb!.Value, 0.3);
        Assert.True(peak.IsAnalyserMade);
    }

    [Theory]
    // Generator defaults: 2nd harmonic −30 dBc, 3rd −40 dBc (SignalGeneratorOptions). At −20 dBm and
    // 10 dB attenuation (mixer −30 dBm) the analyser's own 2nd harmonic is (2·−30 − 35) + 10 = −85 dBm,
    // 35 dB under the real −50 dBm (moves it 0.0014 dB), its own 3rd (3·−30 − 20) + 10 = −100 dBm,
    // 40 dB under the real −60 dBm. Both real lines stay within ±1 dB when the attenuation goes to 20 dB;
    // the floor there is about −100 dBm (−174 dBm/Hz + 30 dB + 24 dB NF + 20 dB; REFERENCES thermal noise).
    [InlineData(2)]
    [InlineData(3)]
    public void Compare_GeneratorsOwnHarmonic_IsReal(int order)
    {
        var bench = Bench(new SignalGeneratorOptions().Harmonics, -20);

        var peak = Judge(bench, order, 10, 20);

        Assert.Equal(OverloadClass.Real, peak.Class);
        Assert.Equal(0, peak.ChangeDb!.Value, 0.5);
    }

    private static VirtualBench Bench(IReadOnlyList<GeneratorHarmonic> harmonics, double levelDbm)
    {
        var bench = new VirtualBench(7, generatorOptions: new SignalGeneratorOptions { Harmonics = harmonics });
        bench.Generator.Frequency = Carrier;
        bench.Generator.Level = Level.FromDbm(levelDbm);
        bench.Generator.OutputOn = true;
        bench.SpectrumAnalyser.ResolutionBandwidth = Rbw;
        return bench;
    }

    private static OverloadPeak Judge(VirtualBench bench, int order, double lowerDb, double higherDb)
    {
        var analyser = bench.SpectrumAnalyser;
        analyser.SetCentreSpan(Frequency.FromHertz(order * Carrier.Hertz), Span);
        var lower = SweepAt(analyser, lowerDb);
        var higher = SweepAt(analyser, higherDb);
        var options = new OverloadCheckOptions { Threshold = Level.FromDbm(-80), FrequencyTolerance = SpurLabeller.DefaultTolerance(Rbw) };

        var verdict = OverloadCheck.Compare(lower, Ratio.FromDecibels(lowerDb), higher, Ratio.FromDecibels(higherDb), options).Value;

        return Assert.Single(verdict.Peaks);
    }

    private static PowerTrace SweepAt(SimulatedSpectrumAnalyser analyser, double attenuationDb)
    {
        analyser.InputAttenuation = Ratio.FromDecibels(attenuationDb);
        return analyser.Sweep();
    }
}
