using BenchRunner.Core.Quantities;

namespace BenchRunner.Simulator.Spectrum;

/// <summary>
/// Smooth gain compression of an amplifier, mixer or limiter, set by its input 1 dB compression
/// point P1dB: the gain falls by C(P) = (10/p)·log10(1 + (P/Psat)^p) dB at input power P (linear
/// ratio P/Psat), with Psat = P1dB / (10^(p/10) − 1)^(1/p) so that C(P1dB) = 1 dB exactly. Far
/// below P1dB the gain is flat (C ≈ 0); far above, the output saturates at Psat plus the small-signal
/// gain. The smoothness p sets how sharp the knee is (2 by default; larger is harder).
/// </summary>
/// <remarks>
/// This is the voltage-domain limiter |Vout| = |Vin| / (1 + |Vin/Vsat|^(2p))^(1/(2p)) written in
/// power, a form common in amplifier simulation (common practice, no source). The default value
/// compresses nothing.
/// </remarks>
public readonly struct GainCompression : IEquatable<GainCompression>
{
    private readonly double _saturationDbm;

    private GainCompression(Level inputCompressionPoint, double smoothness)
    {
        InputCompressionPoint = inputCompressionPoint;
        Smoothness = smoothness;
        _saturationDbm = inputCompressionPoint.Dbm - 10 / smoothness * Math.Log10(Math.Pow(10, smoothness / 10) - 1);
    }

    /// <summary>No compression at any level.</summary>
    public static GainCompression None => default;

    /// <summary>The input 1 dB compression point; null for <see cref="None"/>.</summary>
    public Level? InputCompressionPoint { get; }

    /// <summary>The knee's smoothness p; 0 for <see cref="None"/>.</summary>
    public double Smoothness { get; }

    /// <summary>Compression with the gain 1 dB down at <paramref name="inputCompressionPoint"/>.</summary>
    /// <param name="inputCompressionPoint">The input level at which the gain is 1 dB below its small-signal value.</param>
    /// <param name="smoothness">p, finite and at least 0.5; default 2.</param>
    /// <exception cref="ArgumentOutOfRangeException">The smoothness is below 0.5 or not finite.</exception>
    public static GainCompression AtInputPoint(Level inputCompressionPoint, double smoothness = 2)
    {
        if (!double.IsFinite(smoothness) || smoothness < 0.5)
        {
            throw new ArgumentOutOfRangeException(nameof(smoothness), smoothness, "The smoothness must be finite and at least 0.5.");
        }

        return new GainCompression(inputCompressionPoint, smoothness);
    }

    /// <summary>How much the gain falls at input level <paramref name="input"/>: C(P), 0 dB or more.</summary>
    public Ratio CompressionAt(Level input) => Ratio.FromDecibels(CompressionDb(input.Dbm));

    /// <inheritdoc cref="CompressionAt"/>
    internal double CompressionDb(double inputDbm)
    {
        if (InputCompressionPoint is null)
        {
            return 0;
        }

        double exponent = Smoothness * (inputDbm - _saturationDbm) / 10;
        // Far into saturation log10(1 + 10^x) is x to double precision, and 10^x could overflow.
        return exponent > 30 ? inputDbm - _saturationDbm : 10 / Smoothness * Math.Log10(1 + Math.Pow(10, exponent));
    }

    /// <inheritdoc/>
    public bool Equals(GainCompression other) => InputCompressionPoint == other.InputCompressionPoint && Smoothness.Equals(other.Smoothness);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is GainCompression other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(InputCompressionPoint, Smoothness);

    /// <summary>Formats as e.g. <c>P1dB 0 dBm, p 2</c>, or <c>none</c>.</summary>
    public override string ToString() => InputCompressionPoint is { } p ? $"P1dB {p}, p {Smoothness}" : "none";

    public static bool operator ==(GainCompression left, GainCompression right) => left.Equals(right);

    public static bool operator !=(GainCompression left, GainCompression right) => !left.Equals(right);
}
