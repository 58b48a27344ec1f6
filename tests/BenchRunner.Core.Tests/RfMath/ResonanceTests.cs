using BenchRunner.Core.Quantities;
using BenchRunner.Core.RfMath;

namespace BenchRunner.Core.Tests.RfMath;

public class ResonanceTests
{
    [Theory]
    // REFERENCES: resonance f0 = 1/(2π√(LC)) [calc]: 1 µH with 100 pF → 15.9155 MHz;
    // 100 nH with 25.33 pF → 100.00 MHz.
    [InlineData(1e-6, 100e-12, 15.9155, 5e-5)]
    [InlineData(100e-9, 25.33e-12, 100.00, 5e-3)]
    public void ResonantFrequency_MatchesReferences(double henries, double farads, double megahertz, double tolerance)
    {
        Assert.Equal(megahertz, Resonance.ResonantFrequency(henries, farads).Megahertz, tolerance);
    }

    [Fact]
    public void CapacitanceFaradsFor_TenPointSevenMegahertzWithOneMicrohenry_Is221Picofarads()
    {
        // REFERENCES: resonance, 10.7 MHz with 1 µH needs 221.24 pF [calc].
        Assert.Equal(221.24, Resonance.CapacitanceFaradsFor(Frequency.FromMegahertz(10.7), 1e-6) * 1e12, 0.005);
    }

    [Fact]
    public void InductanceHenriesFor_TenPointSevenMegahertzWith221Picofarads_IsOneMicrohenry()
    {
        // REFERENCES: resonance, 10.7 MHz with 1 µH needs 221.24 pF [calc], read backwards;
        // 221.24 has 5 digits, so L is good to about 2e-5 relative.
        Assert.Equal(1.0, Resonance.InductanceHenriesFor(Frequency.FromMegahertz(10.7), 221.24e-12) * 1e6, 3e-5);
    }

    [Fact]
    public void Reactances_AtResonance_AreEqualAndOpposite()
    {
        // At f0, ω0L = 1/(ω0C) = √(L/C): 1 µH with 100 pF gives 100 Ω (from the formula).
        var f0 = Resonance.ResonantFrequency(1e-6, 100e-12);

        Assert.Equal(100, Resonance.InductiveReactanceOhms(f0, 1e-6), 1e-9);
        Assert.Equal(-100, Resonance.CapacitiveReactanceOhms(f0, 100e-12), 1e-9);
    }

    [Fact]
    public void Reactances_At137MegahertzPreselector()
    {
        // X_L = 2πfL and X_C = −1/(2πfC) at 137.5 MHz: 100 nH → 86.394 Ω, 10 pF → −115.75 Ω
        // (computed from the formulas for this test).
        var f = Frequency.FromMegahertz(137.5);

        Assert.Equal(86.394, Resonance.InductiveReactanceOhms(f, 100e-9), 0.0005);
        Assert.Equal(-115.75, Resonance.CapacitiveReactanceOhms(f, 10e-12), 0.005);
    }

    [Fact]
    public void Resonance_BadArguments_Throw()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Resonance.ResonantFrequency(0, 100e-12));
        Assert.Throws<ArgumentOutOfRangeException>(() => Resonance.ResonantFrequency(1e-6, double.NaN));
        Assert.Throws<ArgumentOutOfRangeException>(() => Resonance.CapacitanceFaradsFor(Frequency.Zero, 1e-6));
        Assert.Throws<ArgumentOutOfRangeException>(() => Resonance.InductanceHenriesFor(Frequency.FromMegahertz(1), -1));
        Assert.Throws<ArgumentOutOfRangeException>(() => Resonance.CapacitiveReactanceOhms(Frequency.Zero, 1e-12));
    }
}
