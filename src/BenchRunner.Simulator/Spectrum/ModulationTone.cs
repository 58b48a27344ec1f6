using BenchRunner.Core.Quantities;

namespace BenchRunner.Simulator.Spectrum;

/// <summary>
/// One sinusoidal term of an angle modulation: the carrier's phase swings by
/// <see cref="Index"/>·sin(2π·<see cref="Rate"/>·t). For frequency modulation by a tone, the index
/// is β = Δf / fm (peak deviation over modulating frequency).
/// </summary>
public readonly struct ModulationTone : IEquatable<ModulationTone>
{
    private ModulationTone(double index, Frequency rate)
    {
        Index = index;
        Rate = rate;
    }

    /// <summary>The modulation index β in radians, finite and not negative.</summary>
    public double Index { get; }

    /// <summary>The modulating frequency fm, above 0 Hz.</summary>
    public Frequency Rate { get; }

    /// <summary>The peak frequency deviation Δf = β·fm.</summary>
    public Frequency PeakDeviation => Frequency.FromHertz(Index * Rate.Hertz);

    /// <summary>A tone of index <paramref name="index"/> at rate <paramref name="rate"/>.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The index is negative or not finite, or the rate is 0 Hz.</exception>
    public static ModulationTone Create(double index, Frequency rate)
    {
        if (!double.IsFinite(index) || index < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(index), index, "A modulation index must be finite and not negative.");
        }

        if (rate.Hertz <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(rate), rate.Hertz, "A modulating frequency must be above 0 Hz.");
        }

        return new ModulationTone(index, rate);
    }

    /// <summary>The frequency-modulation tone with peak deviation Δf and modulating frequency fm: β = Δf / fm.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The modulating frequency is 0 Hz.</exception>
    public static ModulationTone FromDeviation(Frequency peakDeviation, Frequency modulatingFrequency)
    {
        if (modulatingFrequency.Hertz <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(modulatingFrequency), modulatingFrequency.Hertz, "A modulating frequency must be above 0 Hz.");
        }

        return new ModulationTone(peakDeviation.Hertz / modulatingFrequency.Hertz, modulatingFrequency);
    }

    /// <summary>The same tone with its index multiplied by |<paramref name="factor"/>|: the term in the k-th harmonic or a mixing product.</summary>
    internal ModulationTone Scaled(int factor) => new(Index * Math.Abs(factor), Rate);

    /// <inheritdoc/>
    public bool Equals(ModulationTone other) => Index.Equals(other.Index) && Rate.Equals(other.Rate);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is ModulationTone other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Index, Rate);

    /// <summary>Formats as e.g. <c>β 5 at 15 kHz</c>.</summary>
    public override string ToString() => $"β {Index:0.####} at {Rate}";

    public static bool operator ==(ModulationTone left, ModulationTone right) => left.Equals(right);

    public static bool operator !=(ModulationTone left, ModulationTone right) => !left.Equals(right);
}
