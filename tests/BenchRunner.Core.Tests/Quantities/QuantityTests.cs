using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Tests.Quantities;

public class QuantityTests
{
    [Theory]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    [InlineData(double.NegativeInfinity)]
    public void Of_NotFinite_IsRefusedAtTheDoor(double value)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Quantity.Of(value, QuantityUnit.Hertz));
    }

    [Fact]
    public void Of_NegativeZero_IsZero()
    {
        var zero = Quantity.Of(-0.0, QuantityUnit.Decibel);

        Assert.False(double.IsNegative(zero.Value));
        Assert.Equal(Quantity.Of(0, QuantityUnit.Decibel), zero);
    }

    [Fact]
    public void Equals_SameNumberOtherUnit_IsNotEqual()
    {
        Assert.NotEqual(Quantity.Of(-20, QuantityUnit.Decibel), Quantity.Of(-20, QuantityUnit.DecibelMilliwatt));
        Assert.Equal(Quantity.Of(-20, QuantityUnit.DecibelMilliwatt), Quantity.Of(-20, QuantityUnit.DecibelMilliwatt));
    }

    [Fact]
    public void Default_HasNoUnit()
    {
        Assert.Same(QuantityUnit.None, default(Quantity).Unit);
    }
}
