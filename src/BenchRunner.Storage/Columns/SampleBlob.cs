using System.Buffers.Binary;
using System.Collections.Immutable;
using System.Numerics;

namespace BenchRunner.Storage.Columns;

/// <summary>
/// The byte layout of sample and frequency BLOBs: IEEE 754 binary64 values, little-endian,
/// back to back with no header. Complex samples are interleaved: re₀ im₀ re₁ im₁ … (16 bytes a
/// point); real values (dBm levels, frequencies in hertz) take 8 bytes a point. The bit pattern
/// of every double is kept, so a value read back is identical to the value written.
/// </summary>
internal static class SampleBlob
{
    /// <summary>Bytes per complex point.</summary>
    public const int ComplexPointBytes = 16;

    /// <summary>Bytes per real point.</summary>
    public const int RealPointBytes = 8;

    /// <summary>Encodes complex samples as interleaved real and imaginary parts.</summary>
    public static byte[] FromComplex(ImmutableArray<Complex> samples)
    {
        var bytes = new byte[samples.Length * ComplexPointBytes];
        var span = bytes.AsSpan();
        for (int i = 0; i < samples.Length; i++)
        {
            BinaryPrimitives.WriteDoubleLittleEndian(span[(i * ComplexPointBytes)..], samples[i].Real);
            BinaryPrimitives.WriteDoubleLittleEndian(span[(i * ComplexPointBytes + RealPointBytes)..], samples[i].Imaginary);
        }

        return bytes;
    }

    /// <summary>Encodes real values, one double each.</summary>
    public static byte[] FromReal(ImmutableArray<double> values)
    {
        var bytes = new byte[values.Length * RealPointBytes];
        var span = bytes.AsSpan();
        for (int i = 0; i < values.Length; i++)
        {
            BinaryPrimitives.WriteDoubleLittleEndian(span[(i * RealPointBytes)..], values[i]);
        }

        return bytes;
    }

    /// <summary>Decodes interleaved complex samples.</summary>
    /// <exception cref="FormatException">The length is not a whole number of complex points.</exception>
    public static Complex[] ToComplex(ReadOnlySpan<byte> bytes)
    {
        if (bytes.Length % ComplexPointBytes != 0)
        {
            throw new FormatException($"{bytes.Length} bytes is not a whole number of complex points ({ComplexPointBytes} bytes each).");
        }

        var samples = new Complex[bytes.Length / ComplexPointBytes];
        for (int i = 0; i < samples.Length; i++)
        {
            samples[i] = new Complex(
                BinaryPrimitives.ReadDoubleLittleEndian(bytes[(i * ComplexPointBytes)..]),
                BinaryPrimitives.ReadDoubleLittleEndian(bytes[(i * ComplexPointBytes + RealPointBytes)..]));
        }

        return samples;
    }

    /// <summary>Decodes real values.</summary>
    /// <exception cref="FormatException">The length is not a whole number of doubles.</exception>
    public static double[] ToReal(ReadOnlySpan<byte> bytes)
    {
        if (bytes.Length % RealPointBytes != 0)
        {
            throw new FormatException($"{bytes.Length} bytes is not a whole number of values ({RealPointBytes} bytes each).");
        }

        var values = new double[bytes.Length / RealPointBytes];
        for (int i = 0; i < values.Length; i++)
        {
            values[i] = BinaryPrimitives.ReadDoubleLittleEndian(bytes[(i * RealPointBytes)..]);
        }

        return values;
    }
}
