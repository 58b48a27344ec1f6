using System.Buffers.Binary;
using System.Collections.Immutable;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Instruments.Scpi;

/// <summary>
/// Decodes the payload of an IEEE 488.2 block (the bytes after the <c>#</c> header) holding IEEE 754
/// numbers, as a trace comes back under <c>FORMat:DATA REAL,32</c> or <c>REAL,64</c>, in the byte
/// order set by <c>FORMat:BORDer</c>.
/// </summary>
public static class ScpiBinaryBlock
{
    /// <summary>The size of one number in <paramref name="format"/>: 4 or 8 bytes.</summary>
    /// <exception cref="ArgumentOutOfRangeException">ASCII has no fixed size.</exception>
    public static int ElementSize(ScpiDataFormat format) => format switch
    {
        ScpiDataFormat.Real32 => 4,
        ScpiDataFormat.Real64 => 8,
        _ => throw new ArgumentOutOfRangeException(nameof(format), format, "Only REAL,32 and REAL,64 are binary formats."),
    };

    /// <summary>
    /// Decodes the numbers. A payload whose length is not a whole number of elements is a failure
    /// (the block was cut, or the format assumed is not the one the instrument used).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="format"/> is not a binary format.</exception>
    public static ParseResult<ImmutableArray<double>> Decode(ReadOnlySpan<byte> payload, ScpiDataFormat format, ScpiByteOrder order)
    {
        int size = ElementSize(format);
        if (payload.Length % size != 0)
        {
            return ParseResult<ImmutableArray<double>>.Fail(
                $"the block holds {payload.Length} bytes, not a whole number of {size}-byte {(size == 4 ? "float32" : "float64")} values; is the data format right?");
        }

        bool big = order == ScpiByteOrder.Normal;
        var values = ImmutableArray.CreateBuilder<double>(payload.Length / size);
        for (int at = 0; at < payload.Length; at += size)
        {
            var element = payload.Slice(at, size);
            values.Add(size == 4
                ? big ? BinaryPrimitives.ReadSingleBigEndian(element) : BinaryPrimitives.ReadSingleLittleEndian(element)
                : big ? BinaryPrimitives.ReadDoubleBigEndian(element) : BinaryPrimitives.ReadDoubleLittleEndian(element));
        }

        return ParseResult<ImmutableArray<double>>.Ok(values.MoveToImmutable());
    }
}
