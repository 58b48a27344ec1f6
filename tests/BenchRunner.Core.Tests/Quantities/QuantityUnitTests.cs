using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Tests.Quantities;

public class QuantityUnitTests
{
    [Theory]
    [InlineData("", "number")]
    [InlineData("Hz", "frequency")]
    [InlineData("s", "time")]
    [InlineData("\u03A9", "resistance")]
    [InlineData("dB", "ratio")]
    [InlineData("dBm", "level")]
    public void FromSymbol_StoredText_GivesTheUnitWithThatSymbol(string symbol, string name)
    {
        var unit = QuantityUnit.FromSymbol(symbol);

        Assert.NotNull(unit);
        Assert.Equal(symbol, unit.Symbol);
        Assert.Equal(name, unit.Name);
    }

    [Theory]
    [InlineData("hz")]
    [InlineData("dbm")]
    [InlineData("V")]
    [InlineData(null)]
    public void FromSymbol_OtherText_GivesNull(string? symbol)
    {
        Assert.Null(QuantityUnit.FromSymbol(symbol));
    }

    [Fact]
    public void FromSymbol_OhmWord_IsTheOhm()
    {
        Assert.Same(QuantityUnit.Ohm, QuantityUnit.FromSymbol("Ohm"));
    }

    [Fact]
    public void All_Symbols_AreDistinct()
    {
        Assert.Equal(QuantityUnit.All.Count, QuantityUnit.All.Select(u => u.Symbol).Distinct().Count());
        Assert.True(QuantityUnit.Decibel.IsLogarithmic);
        Assert.True(QuantityUnit.DecibelMilliwatt.IsLogarithmic);
        Assert.False(QuantityUnit.Hertz.IsLogarithmic);
    }
}
