using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Simulator.Spectrum;

namespace BenchRunner.Simulator.Tests.Spectrum;

public class FmOccupiedBandwidthTests
{
    private static readonly Frequency Carrier = Frequency.FromMegahertz(100);

    [Theory]
    [InlineData(75, 15, 180, 6, 1e3)]
    [InlineData(5, 3, 16, 2, 300)]
    public void Sweep_FmCarrier_OccupiedBandwidthIsAboutCarson(double deviationKhz, double rateKhz, double carsonKhz, int edgeSideband, double rbwHz)
    {
        // REFERENCES: Carson's rule B = 2(Δf + fm): 75 kHz with 15 kHz → 180 kHz; 5 kHz with 3 kHz →
        // 16 kHz (book). Carson's band holds about 98 % of the power, so the 98 % occupied bandwidth
        // must not exceed it (plus the 2·RBW a line is smeared over). The spectrum is lines fm apart,
        // so the 98 % edges fall on a sideband: the outermost one Carson keeps, n = ⌊β + 1⌋, since
        // |n| ≤ 5 holds 95.9 % and |n| ≤ 6 99.4 % at β = 5, |n| ≤ 1 83.7 % and |n| ≤ 2 98.6 % at
        // β = 5/3 (calc from J_n, A&S Table 9.1 values). So the width is 2·n·fm within 2·RBW:
        // 180 kHz (B exactly) and 12 kHz (B − 2·(β + 1 − 2)·fm).
        var deviation = Frequency.FromKilohertz(deviationKhz);
        var rate = Frequency.FromKilohertz(rateKhz);
        var carson = ModulationFigures.CarsonBandwidth(deviation, rate);
        var analyser = new SimulatedSpectrumAnalyser(9) { ResolutionBandwidth = Frequency.FromHertz(rbwHz), Points = 2001 };
        analyser.Connect(Scene.Empty.With("fm", Emission.Fm(Carrier, Level.FromDbm(-20), deviation, rate)));
        analyser.SetCentreSpan(Carrier, Frequency.FromHertz(3 * carson.Hertz));

        var occupied = PowerFigures.OccupiedBandwidth(analyser.Sweep(), 0.98).Value;

        Assert.Equal(carsonKhz * 1e3, carson.Hertz, 6);
        Assert.True(occupied.Width.Hertz <= carson.Hertz + 2 * rbwHz, $"98 % bandwidth {occupied.Width} exceeds Carson's {carson}");
        Assert.Equal(2 * edgeSideband * rate.Hertz, occupied.Width.Hertz, 2 * rbwHz);
        Assert.Equal(Carrier.Hertz, occupied.Centre.Hertz, rbwHz);
    }
}
