using System.Numerics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Simulator.Spectrum;

namespace BenchRunner.Simulator.Bench;

/// <summary>
/// A path whose gain is any function of frequency: a circuit's S21, an amplifier model, a
/// measured response. Optionally compressing, with compression referred to the input.
/// </summary>
public sealed class FrequencyResponsePath : IRfPath
{
    private readonly Func<Frequency, Ratio> _gainAt;

    /// <summary>Creates a path with gain <paramref name="gainAt"/>(f).</summary>
    /// <param name="gainAt">The small-signal gain at a frequency (negative for a loss).</param>
    /// <param name="compression">Compression referred to the path's input; none by default.</param>
    public FrequencyResponsePath(Func<Frequency, Ratio> gainAt, GainCompression compression = default)
    {
        ArgumentNullException.ThrowIfNull(gainAt);
        _gainAt = gainAt;
        Compression = compression;
    }

    /// <summary>The compression, referred to the input.</summary>
    public GainCompression Compression { get; }

    /// <summary>
    /// A path passing power as a transmission coefficient does: gain = 20·log10|S21(f)|, with a
    /// magnitude of zero shown as <see cref="ComplexTrace.FloorDb"/> (−400 dB).
    /// </summary>
    /// <param name="transmission">S21 at a frequency, linear and unitless.</param>
    /// <param name="compression">Compression referred to the path's input; none by default.</param>
    public static FrequencyResponsePath FromTransmission(Func<Frequency, Complex> transmission, GainCompression compression = default)
    {
        ArgumentNullException.ThrowIfNull(transmission);
        return new FrequencyResponsePath(
            f =>
            {
                double magnitude = transmission(f).Magnitude;
                return Ratio.FromDecibels(magnitude > 0 ? Math.Max(ComplexTrace.FloorDb, 20 * Math.Log10(magnitude)) : ComplexTrace.FloorDb);
            },
            compression);
    }

    /// <summary>The small-signal gain at <paramref name="frequency"/>.</summary>
    public Ratio GainAt(Frequency frequency) => _gainAt(frequency);

    /// <inheritdoc/>
    public Level Output(Frequency frequency, Level input) => input.Plus(_gainAt(frequency)).Plus(-Compression.CompressionAt(input));
}
