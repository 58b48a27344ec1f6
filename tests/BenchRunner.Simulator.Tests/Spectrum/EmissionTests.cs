using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Simulator.Spectrum;

namespace BenchRunner.Simulator.Tests.Spectrum;

public class EmissionTests
{
    private static readonly Frequency Carrier = Frequency.FromMegahertz(100);

    [Fact]
    public void Cw_Lines_OneLineAtCarrierAndLevel()
    {
        var lines = Emission.Cw(Carrier, Level.FromDbm(-20)).Lines();

        var line = Assert.Single(lines);
        Assert.Equal(Carrier, line.Frequency);
        Assert.Equal(-20, line.Level.Dbm, 12);
    }

    [Fact]
    public void Cw_ZeroFrequency_Throws()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Emission.Cw(Frequency.Zero, Level.FromDbm(0)));
    }

    [Theory]
    [InlineData(75, 15)]
    [InlineData(5, 3)]
    [InlineData(14.6, 2.4)]
    public void Fm_Lines_SumToTotalPower(double deviationKhz, double rateKhz)
    {
        // Jacobi–Anger expansion: an angle-modulated carrier keeps its power, Σ J_n(β)² = 1 (A&S ch. 9, from memory).
        var fm = Emission.Fm(Carrier, Level.FromDbm(-20), Frequency.FromKilohertz(deviationKhz), Frequency.FromKilohertz(rateKhz));

        double milliwatts = fm.Lines().Sum(l => Math.Pow(10, l.Level.Dbm / 10));

        Assert.Equal(-20, 10 * Math.Log10(milliwatts), 9);
    }

    [Fact]
    public void Fm_Lines_LieAtMultiplesOfTheModulatingFrequencyWithBesselShares()
    {
        // β = 5: the carrier holds J0(5)² and the first sidebands J1(5)² (A&S Table 9.1, from memory).
        var fm = Emission.Fm(Carrier, Level.FromDbm(0), Frequency.FromKilohertz(75), Frequency.FromKilohertz(15));
        var lines = fm.Lines();

        Assert.All(lines, l => Assert.Equal(0, Math.IEEERemainder(l.Frequency.Hertz - Carrier.Hertz, 15e3), 6));
        var carrier = lines.Single(l => l.Frequency == Carrier);
        var upper = lines.Single(l => l.Frequency == Frequency.FromKilohertz(100_015));
        var lower = lines.Single(l => l.Frequency == Frequency.FromKilohertz(99_985));
        Assert.Equal(10 * Math.Log10(0.1775967713 * 0.1775967713), carrier.Level.Dbm, 6);
        Assert.Equal(10 * Math.Log10(0.3275791376 * 0.3275791376), upper.Level.Dbm, 6);
        Assert.Equal(upper.Level.Dbm, lower.Level.Dbm, 9);
    }

    [Fact]
    public void Fm_IndexAtFirstBesselZero_HasNoCarrierLine()
    {
        // The carrier vanishes at β = 2.405 (first zero of J0), the trade's way to set a deviation
        // (common practice; zero from A&S Table 9.5, from memory). 2.405 × 1 kHz deviation.
        var fm = Emission.Fm(Carrier, Level.FromDbm(0), Frequency.FromHertz(2404.825557695773), Frequency.FromKilohertz(1));

        Assert.DoesNotContain(fm.Lines(), l => l.Frequency == Carrier);
        Assert.Contains(fm.Lines(), l => l.Frequency == Frequency.FromKilohertz(100_001));
    }

    [Theory]
    [InlineData(75, 15, 180)]
    [InlineData(5, 3, 16)]
    public void Fm_CarsonBandwidth_HoldsAtLeast98PercentOfThePower(double deviationKhz, double rateKhz, double carsonKhz)
    {
        // REFERENCES: Carson's rule B = 2(Δf + fm): 75 kHz with 15 kHz → 180 kHz; 5 kHz with 3 kHz → 16 kHz;
        // the band holds about 98 % of the power (book, from memory).
        var deviation = Frequency.FromKilohertz(deviationKhz);
        var rate = Frequency.FromKilohertz(rateKhz);
        var carson = ModulationFigures.CarsonBandwidth(deviation, rate);
        var fm = Emission.Fm(Carrier, Level.FromDbm(0), deviation, rate);

        double inside = fm.Lines()
            .Where(l => Math.Abs(l.Frequency.Hertz - Carrier.Hertz) <= carson.Hertz / 2)
            .Sum(l => Math.Pow(10, l.Level.Dbm / 10));

        Assert.Equal(carsonKhz, carson.Kilohertz, 9);
        Assert.InRange(inside, 0.98, 1.0);
    }

    [Fact]
    public void Fm_ZeroDeviation_IsUnmodulated()
    {
        var fm = Emission.Fm(Carrier, Level.FromDbm(-10), Frequency.Zero, Frequency.FromKilohertz(1));

        Assert.True(fm.IsUnmodulated);
        Assert.Single(fm.Lines());
    }

    [Fact]
    public void WithLevel_KeepsTheSidebandShares()
    {
        var fm = Emission.Fm(Carrier, Level.FromDbm(-20), Frequency.FromKilohertz(5), Frequency.FromKilohertz(3));

        var louder = fm.WithLevel(Level.FromDbm(-10));

        Assert.Equal(fm.Lines().Count, louder.Lines().Count);
        Assert.All(fm.Lines().Zip(louder.Lines()), p => Assert.Equal(p.First.Level.Dbm + 10, p.Second.Level.Dbm, 9));
    }

    [Fact]
    public void Product_SecondHarmonicOfFm_DoublesTheIndex()
    {
        // cos(2(ωt + β sin ωm t)) = cos(2ωt + 2β sin ωm t): the k-th harmonic carries k·β.
        var fm = Emission.Fm(Carrier, Level.FromDbm(0), Frequency.FromKilohertz(5), Frequency.FromKilohertz(3));

        var harmonic = Emission.Product(fm, 2, null, 0, -40)!;

        Assert.Equal(Frequency.FromMegahertz(200), harmonic.Centre);
        Assert.Equal(2 * fm.Modulation[0].Index, harmonic.Modulation[0].Index, 12);
        Assert.Equal(-40, harmonic.Level.Dbm);
    }
}
