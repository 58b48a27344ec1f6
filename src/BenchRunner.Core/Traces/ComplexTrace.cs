using System.Collections.Immutable;
using System.Numerics;

namespace BenchRunner.Core.Traces;

/// <summary>
/// An S-parameter trace: one complex (linear, unitless) sample per frequency.
/// <see cref="Trace.LevelsDb"/> holds 20·log10|S|; a magnitude of exactly zero is shown as
/// <see cref="FloorDb"/> so that figures never meet an infinity.
/// </summary>
public sealed class ComplexTrace : Trace
{
    /// <summary>The level used for a sample of magnitude zero: -400 dB.</summary>
    public const double FloorDb = -400;

    /// <summary>Creates an S-parameter trace.</summary>
    /// <exception cref="ArgumentException">Not an S-parameter quantity, a count mismatch or a non-finite sample.</exception>
    public ComplexTrace(FrequencyAxis axis, TraceQuantity quantity, IEnumerable<Complex> samples)
        : this(axis, quantity, samples.ToImmutableArray())
    {
    }

    private ComplexTrace(FrequencyAxis axis, TraceQuantity quantity, ImmutableArray<Complex> samples)
        : base(axis, CheckQuantity(quantity), ToDb(samples))
    {
        Samples = samples;
    }

    /// <summary>The complex samples, linear and unitless.</summary>
    public ImmutableArray<Complex> Samples { get; }

    /// <inheritdoc/>
    public override TraceUnit Unit => TraceUnit.Decibel;

    /// <summary>The phase of each sample in degrees, in (-180, 180], not unwrapped.</summary>
    public ImmutableArray<double> PhasesDegrees() =>
        Samples.Select(s => s.Phase * 180 / Math.PI).ToImmutableArray();

    private static TraceQuantity CheckQuantity(TraceQuantity quantity) =>
        quantity == TraceQuantity.Power
            ? throw new ArgumentException("A complex trace holds S-parameters, not power.", nameof(quantity))
            : quantity;

    private static ImmutableArray<double> ToDb(ImmutableArray<Complex> samples)
    {
        var builder = ImmutableArray.CreateBuilder<double>(samples.Length);
        foreach (var s in samples)
        {
            if (!double.IsFinite(s.Real) || !double.IsFinite(s.Imaginary))
            {
                throw new ArgumentException($"Sample {builder.Count} ({s}) is not finite.", nameof(samples));
            }

            var magnitude = s.Magnitude;
            builder.Add(magnitude > 0 ? Math.Max(FloorDb, 20 * Math.Log10(magnitude)) : FloorDb);
        }

        return builder.MoveToImmutable();
    }
}
