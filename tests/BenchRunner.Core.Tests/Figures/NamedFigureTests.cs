using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Tests.Figures;

public class NamedFigureTests
{
    [Fact]
    public void Of_Value_IsInTheKeysUnit()
    {
        var figure = NamedFigure.Of(FigureKeys.CentreFrequency, 137.5e6);

        Assert.Equal(Quantity.Of(137.5e6, QuantityUnit.Hertz), figure.Value);
        Assert.Same(QuantityUnit.Hertz, figure.Unit);
        Assert.Equal("Centre frequency (-3 dB)", figure.Label);
        Assert.Null(figure.Reason);
    }

    [Fact]
    public void Constructor_ValueInAnotherUnit_IsRefused()
    {
        var ex = Assert.Throws<ArgumentException>(() => new NamedFigure(FigureKeys.CentreFrequency, Quantity.Of(-4, QuantityUnit.Decibel), null));

        Assert.Contains("center_hz", ex.Message);
    }

    [Fact]
    public void Constructor_BothOrNeitherOfValueAndReason_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => new NamedFigure(FigureKeys.LoadedQ, Quantity.Of(45, QuantityUnit.None), "and a reason"));
        Assert.Throws<ArgumentException>(() => new NamedFigure(FigureKeys.LoadedQ, null, null));
        Assert.Throws<ArgumentException>(() => new NamedFigure(FigureKeys.LoadedQ, null, " "));
    }

    [Fact]
    public void Of_NotFinite_IsRefused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => NamedFigure.Of(FigureKeys.LoadedQ, double.NaN));
    }

    [Fact]
    public void From_UnavailableResult_KeepsTheReason()
    {
        var figure = NamedFigure.From(FigureKeys.ShapeFactor60To3, FigureResult<double>.Unavailable("never 60 dB down"));

        Assert.Null(figure.Value);
        Assert.Equal("never 60 dB down", figure.Reason);
        Assert.Equal("shape_factor_60_3 = not available: never 60 dB down", figure.ToString());
    }

    [Fact]
    public void ToString_Value_IsFormattedByTheOneFormatter()
    {
        Assert.Equal("insertion_loss_db = 2.48 dB", NamedFigure.Of(FigureKeys.InsertionLoss, 2.4812).ToString());
    }
}
