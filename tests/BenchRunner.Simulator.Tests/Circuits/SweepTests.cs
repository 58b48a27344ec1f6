using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Simulator.Circuits;
using BenchRunner.Simulator.Devices;

namespace BenchRunner.Simulator.Tests.Circuits;

public class SweepTests
{
    private static readonly FrequencyAxis Axis = FrequencyAxis.Linear(Frequency.FromMegahertz(127.5), Frequency.FromMegahertz(147.5), 401);

    [Fact]
    public void Sweep_GivesTheFourParametersInOrderAtEveryPoint()
    {
        var network = Preselector137.BuildNetwork(Preselector137.NominalParts, Preselector137.TunedTrimmers);

        var set = network.Sweep(Axis);

        Assert.Equal([TraceQuantity.S11, TraceQuantity.S21, TraceQuantity.S12, TraceQuantity.S22], set.Traces.Select(t => t.Quantity));
        Assert.Equal(50, set.ReferenceOhms);
        var s21 = (ComplexTrace)set.Find(TraceQuantity.S21)!;
        Assert.Equal(network.Evaluate(Axis.Hertz[123], 50).S21, s21.Samples[123]);
    }

    [Fact]
    public void Sweep_AsksForPower_IsRefused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new Network().Sweep(Axis, [TraceQuantity.Power]));
    }

    [Fact]
    public void Evaluate_Preselector_DoesNotAllocate()
    {
        var network = Preselector137.BuildNetwork(Preselector137.NominalParts, Preselector137.TunedTrimmers);
        network.Evaluate(137.5e6, 50);

        long before = GC.GetAllocatedBytesForCurrentThread();
        for (int i = 0; i < 1000; i++)
        {
            network.Evaluate(130e6 + i * 1e4, 50);
        }

        Assert.Equal(0, GC.GetAllocatedBytesForCurrentThread() - before);
    }
}
