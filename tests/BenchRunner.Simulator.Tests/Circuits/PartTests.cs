using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.RfMath;
using BenchRunner.Core.Traces;
using BenchRunner.Simulator.Circuits;

namespace BenchRunner.Simulator.Tests.Circuits;

public class PartTests
{
    private const double Z0 = 50;

    [Fact]
    public void Capacitor_WithEsl_SelfResonatesAtOneOverTwoPiRootLc()
    {
        // REFERENCES: resonance f0 = 1/(2π√(LC)) [calc]: 100 nH with 25.33 pF → 100.00 MHz.
        var capacitor = new Capacitor(25.33e-12, esrOhms: 0.1, eslHenries: 100e-9);

        Assert.Equal(100.00, capacitor.SelfResonantFrequency!.Value.Megahertz, 2);
        var atResonance = capacitor.ImpedanceAt(capacitor.SelfResonantFrequency.Value.Hertz);
        Assert.Equal(0.1, atResonance.Real, 12);
        Assert.True(Math.Abs(atResonance.Imaginary) < 1e-9, $"X = {atResonance.Imaginary} Ω");
    }

    [Fact]
    public void Capacitor_AboveSelfResonance_IsInductive()
    {
        var capacitor = new Capacitor(22e-12, esrOhms: 0.03, eslHenries: 0.4e-9);
        double srf = capacitor.SelfResonantFrequency!.Value.Hertz;

        Assert.Equal(Resonance.ResonantFrequency(0.4e-9, 22e-12).Hertz, srf, 3);
        Assert.True(capacitor.ImpedanceAt(srf / 2).Imaginary < 0);
        Assert.True(capacitor.ImpedanceAt(srf * 2).Imaginary > 0);
    }

    [Fact]
    public void ShuntCapacitor_WithEsl_LetsRejectionComeBackAboveSelfResonance()
    {
        var real = new Capacitor(100e-12, esrOhms: 0.05, eslHenries: 1e-9);
        double srf = real.SelfResonantFrequency!.Value.Hertz;
        var realShunt = new Network(Elements.Shunt(real));
        var idealShunt = new Network(Elements.ShuntCapacitor(100e-12));

        double atResonance = realShunt.Evaluate(srf, Z0).S21.Magnitude;
        double aboveReal = realShunt.Evaluate(4 * srf, Z0).S21.Magnitude;
        double aboveIdeal = idealShunt.Evaluate(4 * srf, Z0).S21.Magnitude;

        Assert.True(aboveReal > 10 * atResonance, $"|S21| {aboveReal} at 4·SRF against {atResonance} at SRF");
        Assert.True(aboveReal > 10 * aboveIdeal, $"|S21| {aboveReal} with ESL against {aboveIdeal} without");
    }

    [Fact]
    public void Inductor_WithQ_HasThatQAtEveryFrequency()
    {
        var coil = Inductor.WithQ(47e-9, 150);

        foreach (var hz in new[] { 10e6, 137.5e6, 800e6 })
        {
            var z = coil.ImpedanceAt(hz);
            Assert.Equal(150, z.Imaginary / z.Real, 9);
        }
    }

    [Fact]
    public void Inductor_WithQAt_GainsQAsRootFrequency()
    {
        var coil = Inductor.WithQAt(47e-9, 300, Frequency.FromMegahertz(100));

        var at100 = coil.ImpedanceAt(100e6);
        var at400 = coil.ImpedanceAt(400e6);

        // Skin-effect loss R ∝ √f makes Q = ωL/R ∝ √f: four times the frequency, twice the Q.
        Assert.Equal(300, at100.Imaginary / at100.Real, 9);
        Assert.Equal(600, at400.Imaginary / at400.Real, 9);
    }

    [Fact]
    public void Inductor_WithSelfCapacitance_TurnsCapacitiveAboveSelfResonance()
    {
        var coil = Inductor.WithQ(47e-9, 300, selfCapacitanceFarads: 0.25e-12);
        double srf = coil.SelfResonantFrequency!.Value.Hertz;

        Assert.Equal(Resonance.ResonantFrequency(47e-9, 0.25e-12).Hertz, srf, 3);
        Assert.True(coil.ImpedanceAt(srf * 0.8).Imaginary > 0);
        Assert.True(coil.ImpedanceAt(srf * 1.2).Imaginary < 0);
        Assert.True(coil.ImpedanceAt(srf).Magnitude > 100 * coil.ImpedanceAt(srf / 10).Magnitude);
    }

    [Fact]
    public void SeriesLc_InSeries_PassesItsResonance()
    {
        // REFERENCES: 100 nH with 25.33 pF → 100.00 MHz [calc].
        var network = new Network(Elements.Series(Resonators.SeriesLc(100e-9, 25.33e-12, lossOhms: 1)));
        var axis = FrequencyAxis.Linear(Frequency.FromMegahertz(90), Frequency.FromMegahertz(110), 2001);

        var s21 = network.Sweep(axis).Find(TraceQuantity.S21)!;

        Assert.Equal(100.00, TraceFigures.Peak(s21).Value.Frequency.Megahertz, 2);
    }

    [Fact]
    public void ParallelLc_InShunt_PassesItsResonance()
    {
        var network = new Network(Elements.Shunt(Resonators.ParallelLc(100e-9, 25.33e-12, lossOhms: 5000)));
        var axis = FrequencyAxis.Linear(Frequency.FromMegahertz(90), Frequency.FromMegahertz(110), 2001);

        var s21 = network.Sweep(axis).Find(TraceQuantity.S21)!;

        Assert.Equal(100.00, TraceFigures.Peak(s21).Value.Frequency.Megahertz, 2);
        Assert.True(TraceFigures.Peak(s21).Value.LevelDb > -0.05);
    }

    [Fact]
    public void SeriesRlc_Between50OhmPorts_GivesTheExactCaseFigures()
    {
        // REFERENCES: exact case [calc]: series R = 5 Ω, L = 100 µH, C = 2.5330 pF between 50 Ω ports:
        // f0 = 10 MHz, |S21| = 100/105 (−0.42379 dB), BW = 167.113 kHz, QL = 59.840,
        // Qu = ω0L/R = 1256.64 = QL/(1 − |S21|) (Kajfez, Q Factor; from memory).
        var network = new Network(Elements.Series(Resonators.SeriesLc(100e-6, 2.5330e-12, lossOhms: 5)));
        var axis = FrequencyAxis.Linear(Frequency.FromMegahertz(9.8), Frequency.FromMegahertz(10.2), 4001);

        var s21 = network.Sweep(axis).Find(TraceQuantity.S21)!;
        var peak = TraceFigures.Peak(s21).Value;
        var bandwidth = TraceFigures.Bandwidth(s21, TraceFigures.HalfPowerDb).Value;

        Assert.Equal(10.0, peak.Frequency.Megahertz, 3);
        Assert.Equal(-0.42379, peak.LevelDb, 4);
        Assert.Equal(167.113, bandwidth.Width.Kilohertz, 1);
        Assert.Equal(59.840, bandwidth.LoadedQ, 1);
        Assert.InRange(TraceFigures.UnloadedQ(s21).Value, 1256.64 - 2, 1256.64 + 2);
    }

    [Fact]
    public void Combinations_AddImpedancesInSeriesAndAdmittancesInParallel()
    {
        var r = new Resistor(100);
        var c = new Capacitor(10e-12);
        double hz = 50e6;

        Assert.Equal(r.ImpedanceAt(hz) + c.ImpedanceAt(hz), new SeriesCombination(r, c).ImpedanceAt(hz));
        Assert.Equal(r.AdmittanceAt(hz) + c.AdmittanceAt(hz), new ParallelCombination(r, c).AdmittanceAt(hz));
        Assert.Throws<ArgumentException>(() => new SeriesCombination());
    }

    [Fact]
    public void Parts_OutOfRangeValues_AreRefused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new Capacitor(0));
        Assert.Throws<ArgumentOutOfRangeException>(() => new Capacitor(1e-12, esrOhms: -1));
        Assert.Throws<ArgumentOutOfRangeException>(() => Inductor.WithQ(1e-9, double.NaN));
        Assert.Throws<ArgumentOutOfRangeException>(() => new Resistor(-5));
    }
}
