using System.Numerics;
using BenchRunner.Core.TraceFiles;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Tests.TraceFiles;

public class TouchstoneDataTests
{
    private static readonly FrequencyAxis TwoPoints = FrequencyAxis.FromHertz([1e6, 2e6]);

    [Fact]
    public void Constructor_OneReference_AppliesToEveryPort()
    {
        var data = new TouchstoneData(TwoPoints, 2, new Complex[8], [75]);

        Assert.Equal<double>([75.0, 75.0], data.ReferenceOhms);
        Assert.True(data.HasUniformReference);
    }

    [Fact]
    public void Constructor_WrongValueCount_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => new TouchstoneData(TwoPoints, 2, new Complex[7], [50]));

        Assert.Contains("need 8 values, got 7", ex.Message);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(-50.0)]
    [InlineData(double.NaN)]
    public void Constructor_BadReference_Throws(double ohms)
    {
        Assert.Throws<ArgumentException>(() => new TouchstoneData(TwoPoints, 1, new Complex[2], [ohms]));
    }

    [Fact]
    public void Constructor_VersionOtherThan1Or2_Throws()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new TouchstoneData(TwoPoints, 1, new Complex[2], [50], version: 3));
    }

    [Fact]
    public void Constructor_NonFiniteValue_Throws()
    {
        Assert.Throws<ArgumentException>(() => new TouchstoneData(TwoPoints, 1, [Complex.Zero, new Complex(double.NaN, 0)], [50]));
    }

    [Fact]
    public void Get_IsRowMajorPerPoint()
    {
        var data = new TouchstoneData(TwoPoints, 2, [11, 12, 21, 22, 110, 120, 210, 220], [50]);

        Assert.Equal(new Complex(12, 0), data.Get(0, 0, 1));
        Assert.Equal(new Complex(210, 0), data.Get(1, 1, 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => data.Get(2, 0, 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => data.Get(0, 2, 0));
    }

    [Fact]
    public void FromTraceSet_OnePort_GivesOnePortData()
    {
        var set = new TraceSet(TwoPoints, [new ComplexTrace(TwoPoints, TraceQuantity.S11, [0.5, new Complex(0, 0.25)])], 75);

        var data = TouchstoneData.FromTraceSet(set);

        Assert.Equal(1, data.PortCount);
        Assert.Equal(new Complex(0, 0.25), data.Get(1, 0, 0));
        Assert.Equal<double>([75.0], data.ReferenceOhms);
    }
}
