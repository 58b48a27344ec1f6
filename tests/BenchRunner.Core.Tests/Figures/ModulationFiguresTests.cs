using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Tests.Figures;

public class ModulationFiguresTests
{
    [Theory]
    // REFERENCES: Carson's rule B = 2(Δf + fm) [book, calc].
    [InlineData(75, 15, 180)]
    [InlineData(5, 3, 16)]
    public void CarsonBandwidth_IsTwiceDeviationPlusModulatingFrequency(double deviationKhz, double audioKhz, double expectedKhz)
    {
        var b = ModulationFigures.CarsonBandwidth(Frequency.FromKilohertz(deviationKhz), Frequency.FromKilohertz(audioKhz));

        Assert.Equal(expectedKhz, b.Kilohertz, 1e-9);
    }
}
