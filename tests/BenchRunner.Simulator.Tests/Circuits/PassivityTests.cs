using BenchRunner.Core.Quantities;
using BenchRunner.Simulator.Circuits;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Circuits;

/// <summary>
/// Property tests over random ladders, seeded. A reciprocal two-port has S12 = S21; a passive one
/// has |S11|² + |S21|² ≤ 1, with equality when lossless (Pozar, Microwave Engineering, §4.3).
/// </summary>
public class PassivityTests
{
    private const double Z0 = 50;

    [Fact]
    public void LosslessLadders_ConservePowerAndAreReciprocal()
    {
        var random = new Random(20240601);
        for (int trial = 0; trial < 300; trial++)
        {
            var network = RandomLadder(random, lossy: false);
            double hz = 1e6 * Math.Pow(10, 3 * random.NextDouble());

            var s = network.Evaluate(hz, Z0);

            Assert.Equal(1.0, s.S11.Magnitude * s.S11.Magnitude + s.S21.Magnitude * s.S21.Magnitude, 9);
            Assert.Equal(1.0, s.S22.Magnitude * s.S22.Magnitude + s.S12.Magnitude * s.S12.Magnitude, 9);
            ComplexAssert.Close(s.S21, s.S12, 1e-9);
        }
    }

    [Fact]
    public void LossyLadders_NeverGainPowerAndAreReciprocal()
    {
        var random = new Random(137);
        for (int trial = 0; trial < 300; trial++)
        {
            var network = RandomLadder(random, lossy: true);
            double hz = 1e6 * Math.Pow(10, 3 * random.NextDouble());

            var s = network.Evaluate(hz, Z0);

            double forward = s.S11.Magnitude * s.S11.Magnitude + s.S21.Magnitude * s.S21.Magnitude;
            Assert.True(forward <= 1 + 1e-12, $"trial {trial}: |S11|² + |S21|² = {forward}");
            ComplexAssert.Close(s.S21, s.S12, 1e-9);
        }
    }

    private static Network RandomLadder(Random random, bool lossy)
    {
        int count = random.Next(1, 13);
        var elements = new List<NetworkElement>();
        for (int i = 0; i < count; i++)
        {
            double henries = 1e-9 * Math.Pow(10, 3 * random.NextDouble());
            double farads = 1e-13 * Math.Pow(10, 3 * random.NextDouble());
            TwoTerminal part = random.Next(lossy ? 5 : 3) switch
            {
                0 => Inductor.Ideal(henries),
                1 => new Capacitor(farads),
                2 => Resonators.SeriesLc(henries, farads),
                3 => Inductor.WithQ(henries, 20 + 200 * random.NextDouble(), farads / 10),
                _ => new Capacitor(farads, esrOhms: random.NextDouble(), eslHenries: henries / 100),
            };
            NetworkElement element = random.Next(4) switch
            {
                0 => new SeriesElement(part),
                1 => new ShuntElement(part),
                2 => new IdealTransformer(0.3 + 3 * random.NextDouble()),
                _ => lossy
                    ? TransmissionLine.FromPhysicalLength(20 + 100 * random.NextDouble(), random.NextDouble(), 0.66, 0.5, Frequency.FromMegahertz(100))
                    : TransmissionLine.FromPhysicalLength(20 + 100 * random.NextDouble(), random.NextDouble(), 0.66),
            };
            elements.Add(element);
        }

        return new Network(elements);
    }
}
