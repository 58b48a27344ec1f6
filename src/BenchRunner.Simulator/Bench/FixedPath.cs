using BenchRunner.Core.Quantities;
using BenchRunner.Simulator.Spectrum;

namespace BenchRunner.Simulator.Bench;

/// <summary>A gain or loss that does not depend on frequency (an attenuator, a short cable), optionally compressing.</summary>
public sealed class FixedPath : IRfPath
{
    /// <summary>Creates a path of <paramref name="gain"/> (negative for a loss).</summary>
    /// <param name="gain">The small-signal gain in dB.</param>
    /// <param name="compression">Compression referred to the path's input; none by default.</param>
    public FixedPath(Ratio gain, GainCompression compression = default)
    {
        Gain = gain;
        Compression = compression;
    }

    /// <summary>A 0 dB through connection.</summary>
    public static FixedPath Through { get; } = new(Ratio.Unity);

    /// <summary>The small-signal gain (negative for a loss).</summary>
    public Ratio Gain { get; }

    /// <summary>The compression, referred to the input.</summary>
    public GainCompression Compression { get; }

    /// <summary>An attenuator or cable of <paramref name="loss"/> (a positive number of dB).</summary>
    /// <exception cref="ArgumentOutOfRangeException">A negative loss.</exception>
    public static FixedPath Loss(Ratio loss) =>
        loss.Decibels >= 0
            ? new FixedPath(-loss)
            : throw new ArgumentOutOfRangeException(nameof(loss), loss.Decibels, "A loss is a positive number of dB; use a gain for amplification.");

    /// <inheritdoc/>
    public Level Output(Frequency frequency, Level input) => input.Plus(Gain).Plus(-Compression.CompressionAt(input));

    /// <summary>Formats as e.g. <c>fixed -10 dB</c>.</summary>
    public override string ToString() => $"fixed {Gain}";
}
