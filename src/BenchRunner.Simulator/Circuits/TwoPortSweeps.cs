using System.Buffers;
using System.Numerics;
using System.Runtime.InteropServices;
using BenchRunner.Core.Traces;

namespace BenchRunner.Simulator.Circuits;

/// <summary>Sweeps of any <see cref="ITwoPort"/> over a frequency axis into complex traces.</summary>
public static class TwoPortSweeps
{
    private static readonly TraceQuantity[] AllFour = [TraceQuantity.S11, TraceQuantity.S21, TraceQuantity.S12, TraceQuantity.S22];

    /// <summary>The four S-parameters over <paramref name="axis"/>, as a set in the order S11, S21, S12, S22.</summary>
    /// <param name="device">The two-port.</param>
    /// <param name="axis">The frequencies; every one above 0 Hz.</param>
    /// <param name="referenceOhms">Z0 in ohms; 50 by default.</param>
    /// <exception cref="ArgumentOutOfRangeException">A frequency of 0 Hz, or Z0 not finite and positive.</exception>
    public static TraceSet Sweep(this ITwoPort device, FrequencyAxis axis, double referenceOhms = 50) =>
        new(axis, Sweep(device, axis, AllFour, referenceOhms), referenceOhms);

    /// <summary>The requested S-parameters over <paramref name="axis"/>, one trace each, in the order asked.</summary>
    /// <param name="device">The two-port.</param>
    /// <param name="axis">The frequencies; every one above 0 Hz.</param>
    /// <param name="quantities">S11, S21, S12 or S22, each any number of times.</param>
    /// <param name="referenceOhms">Z0 in ohms; 50 by default.</param>
    /// <exception cref="ArgumentOutOfRangeException">A frequency of 0 Hz, Z0 not finite and positive, or <see cref="TraceQuantity.Power"/> asked.</exception>
    public static IReadOnlyList<ComplexTrace> Sweep(this ITwoPort device, FrequencyAxis axis, IReadOnlyList<TraceQuantity> quantities, double referenceOhms = 50)
    {
        ArgumentNullException.ThrowIfNull(device);
        ArgumentNullException.ThrowIfNull(axis);
        ArgumentNullException.ThrowIfNull(quantities);
        var buffer = ArrayPool<SParameters>.Shared.Rent(axis.Count);
        try
        {
            var points = buffer.AsSpan(0, axis.Count);
            Evaluate(device, axis.Hertz.AsSpan(), referenceOhms, points);
            return ToTraces(axis, points, quantities);
        }
        finally
        {
            ArrayPool<SParameters>.Shared.Return(buffer);
        }
    }

    /// <summary>Fills <paramref name="into"/> with the device's S-parameters at each frequency.</summary>
    internal static void Evaluate(ITwoPort device, ReadOnlySpan<double> hertz, double referenceOhms, Span<SParameters> into)
    {
        for (int i = 0; i < hertz.Length; i++)
        {
            into[i] = device.Evaluate(hertz[i], referenceOhms);
        }
    }

    /// <summary>One trace per quantity from per-point S-parameters.</summary>
    internal static IReadOnlyList<ComplexTrace> ToTraces(FrequencyAxis axis, ReadOnlySpan<SParameters> points, IReadOnlyList<TraceQuantity> quantities)
    {
        var traces = new ComplexTrace[quantities.Count];
        for (int q = 0; q < traces.Length; q++)
        {
            var quantity = quantities[q];
            if (quantity == TraceQuantity.Power)
            {
                throw new ArgumentOutOfRangeException(nameof(quantities), quantity, "A two-port sweep gives S-parameters, not power.");
            }

            var samples = new Complex[points.Length];
            for (int i = 0; i < samples.Length; i++)
            {
                samples[i] = points[i].Get(quantity);
            }

            // Handing the array over as an immutable array saves the trace a copy.
            traces[q] = new ComplexTrace(axis, quantity, ImmutableCollectionsMarshal.AsImmutableArray(samples));
        }

        return traces;
    }
}
