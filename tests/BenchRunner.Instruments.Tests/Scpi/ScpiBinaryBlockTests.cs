using BenchRunner.Instruments.Framing;
using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Instruments.Tests.Scpi;

public class ScpiBinaryBlockTests
{
    // IEEE 754 binary32: 1.0 = 3F800000, -1.5 = BFC00000, 0.15625 = 3E200000 (IEEE 754-2008 binary32 encoding; section from memory).
    private static readonly byte[] Float32BigEndian = [0x3F, 0x80, 0x00, 0x00, 0xBF, 0xC0, 0x00, 0x00, 0x3E, 0x20, 0x00, 0x00];

    [Fact]
    public void Decode_Float32Normal_ReadsBigEndian()
    {
        // FORMat:BORDer NORMal = big-endian (REFERENCES: SCPI-1999, from memory).
        var result = ScpiBinaryBlock.Decode(Float32BigEndian, ScpiDataFormat.Real32, ScpiByteOrder.Normal);

        Assert.True(result.Success, result.Error);
        Assert.Equal([1.0, -1.5, 0.15625], result.Value.ToArray());
    }

    [Fact]
    public void Decode_Float32Swapped_ReadsLittleEndian()
    {
        // FORMat:BORDer SWAPped = little-endian: each 4-byte value reversed (REFERENCES: SCPI-1999, from memory).
        var swapped = Float32BigEndian.Chunk(4).SelectMany(c => c.Reverse()).ToArray();

        var result = ScpiBinaryBlock.Decode(swapped, ScpiDataFormat.Real32, ScpiByteOrder.Swapped);

        Assert.Equal([1.0, -1.5, 0.15625], result.Value.ToArray());
    }

    [Fact]
    public void Decode_Float32BigEndianReadAsSwapped_GivesOtherValues()
    {
        var result = ScpiBinaryBlock.Decode(Float32BigEndian, ScpiDataFormat.Real32, ScpiByteOrder.Swapped);

        Assert.NotEqual(1.0, result.Value[0]);
    }

    [Fact]
    public void Decode_Float64BothOrders_ReadsTheSameValue()
    {
        // IEEE 754 binary64: 1.0 = 3FF0000000000000, -2.0 = C000000000000000.
        byte[] big = [0x3F, 0xF0, 0, 0, 0, 0, 0, 0, 0xC0, 0x00, 0, 0, 0, 0, 0, 0];
        var little = big.Chunk(8).SelectMany(c => c.Reverse()).ToArray();

        Assert.Equal([1.0, -2.0], ScpiBinaryBlock.Decode(big, ScpiDataFormat.Real64, ScpiByteOrder.Normal).Value.ToArray());
        Assert.Equal([1.0, -2.0], ScpiBinaryBlock.Decode(little, ScpiDataFormat.Real64, ScpiByteOrder.Swapped).Value.ToArray());
    }

    [Fact]
    public void Decode_LengthNotAWholeNumberOfValues_Fails()
    {
        var result = ScpiBinaryBlock.Decode(new byte[10], ScpiDataFormat.Real32, ScpiByteOrder.Normal);

        Assert.False(result.Success);
        Assert.Contains("10 bytes", result.Error);
    }

    [Fact]
    public void Decode_Ascii_IsRefused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => ScpiBinaryBlock.Decode(new byte[4], ScpiDataFormat.Ascii, ScpiByteOrder.Normal));
    }

    [Theory]
    [InlineData(201, ScpiDataFormat.Real32, "#3804")]   // 201 float32 (REFERENCES: IEEE 488.2 §8.7.9)
    [InlineData(402, ScpiDataFormat.Real32, "#41608")]  // 201 complex float32 (REFERENCES: IEEE 488.2 §8.7.9)
    public void ElementSize_TimesCount_GivesTheBlockHeaderOfTheStandard(int values, ScpiDataFormat format, string header)
    {
        Assert.Equal(header, Ieee488Block.DefiniteHeader(values * ScpiBinaryBlock.ElementSize(format)));
    }
}
