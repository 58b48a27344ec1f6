using System.Collections.Immutable;
using System.Numerics;
using BenchRunner.Storage.Columns;

namespace BenchRunner.Storage.Tests.Columns;

public sealed class SampleBlobTests
{
    [Fact]
    public void FromReal_KnownValues_AreLittleEndianBinary64()
    {
        var bytes = SampleBlob.FromReal([1.0, -2.0, 0.1]);

        // IEEE 754-2019 §3.4 binary64: 1.0 = 0x3FF0000000000000, -2.0 = 0xC000000000000000,
        // 0.1 rounds to 0x3FB999999999999A; least significant byte first.
        Assert.Equal(Convert.FromHexString("000000000000F03F" + "00000000000000C0" + "9A9999999999B93F"), bytes);
    }

    [Fact]
    public void FromComplex_Samples_AreInterleavedRealThenImaginary()
    {
        var bytes = SampleBlob.FromComplex([new Complex(-2.0, 1.0)]);

        // IEEE 754-2019 §3.4, as above: re = -2.0, then im = 1.0.
        Assert.Equal(Convert.FromHexString("00000000000000C0" + "000000000000F03F"), bytes);
    }

    [Fact]
    public void ToReal_AnyBitPattern_RoundTripsExactly()
    {
        var values = ImmutableArray.Create(-0.0, double.Epsilon, double.MaxValue, double.NaN, BitConverter.Int64BitsToDouble(0x7FF8_0000_0000_1234), 1.0 / 3);

        var back = SampleBlob.ToReal(SampleBlob.FromReal(values));

        Assert.Equal(values.Select(BitConverter.DoubleToInt64Bits), back.Select(BitConverter.DoubleToInt64Bits));
    }

    [Fact]
    public void ToComplex_LengthNotAWholePoint_IsRefused()
    {
        Assert.Throws<FormatException>(() => SampleBlob.ToComplex(new byte[24]));
        Assert.Throws<FormatException>(() => SampleBlob.ToReal(new byte[12]));
        Assert.Empty(SampleBlob.ToComplex([]));
    }
}
