using BenchRunner.Core.Masks;
using BenchRunner.Core.Traces;
using static BenchRunner.Core.Tests.Masks.MaskTestData;

namespace BenchRunner.Core.Tests.Masks;

public class LimitMaskTests
{
    private static readonly LimitLine Flat = Line((100, -20), (200, -20));

    [Fact]
    public void Constructor_NeitherLimit_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => new LimitMask("empty", null, null, TraceUnit.Decibel));
    }

    [Fact]
    public void Constructor_BlankName_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => new LimitMask(" ", Flat, null, TraceUnit.Decibel));
    }

    [Fact]
    public void Constructor_AbsoluteMaskWithoutUnitOrParameter_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => new LimitMask("x", Flat, null, unit: null));
    }

    [Fact]
    public void Constructor_UnitContradictingTheParameter_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => new LimitMask("x", Flat, null, TraceUnit.DecibelMilliwatt, parameter: TraceQuantity.S21));
    }

    [Fact]
    public void Constructor_RelativeMaskWithUnitButNoParameter_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => new LimitMask("x", Flat, null, TraceUnit.Decibel, MaskReference.RelativeToPeak));
    }

    [Fact]
    public void Constructor_LogInterpolationWithACornerAtZeroHertz_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => new LimitMask("x", Line((0, -20), (200, -20)), null, TraceUnit.Decibel,
            interpolation: MaskInterpolation.Logarithmic));
    }

    [Theory]
    [InlineData(TraceQuantity.Power, TraceUnit.DecibelMilliwatt, "dBm")]
    [InlineData(TraceQuantity.S11, TraceUnit.Decibel, "dB")]
    public void Constructor_ParameterWithoutUnit_ImpliesTheUnit(TraceQuantity parameter, TraceUnit unit, string symbol)
    {
        var mask = new LimitMask("x", Flat, null, unit: null, parameter: parameter);

        Assert.Equal(unit, mask.Unit);
        Assert.Equal(symbol, mask.LevelUnitSymbol);
    }

    [Fact]
    public void LevelUnitSymbol_RelativePowerMask_IsDb()
    {
        var mask = new LimitMask("x", Flat, null, unit: null, MaskReference.RelativeToPeak, parameter: TraceQuantity.Power);

        Assert.Equal(TraceUnit.DecibelMilliwatt, mask.Unit);
        Assert.Equal("dB", mask.LevelUnitSymbol);
    }
}
