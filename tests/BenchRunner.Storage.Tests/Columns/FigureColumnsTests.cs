using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Storage.Columns;

namespace BenchRunner.Storage.Tests.Columns;

public sealed class FigureColumnsTests
{
    [Fact]
    public void From_ListedFigure_GivesItsWordLabelValueAndUnitText()
    {
        var columns = FigureColumns.From(NamedFigure.Of(FigureKeys.NoiseFloor, -109.9));

        Assert.Equal(("noise_floor_dbm", "Noise floor (median)", (double?)-109.9, "dBm", (string?)null), columns);
    }

    [Fact]
    public void ToFigure_ListedWord_GivesTheListedKeyWhateverLabelWasStored()
    {
        var figure = FigureColumns.ToFigure("center_hz", "Centre", 137.5e6, "Hz", null);

        Assert.Same(FigureKeys.CentreFrequency, figure.Key);
        Assert.Equal(Quantity.Of(137.5e6, QuantityUnit.Hertz), figure.Value);
    }

    [Fact]
    public void ToFigure_UnlistedWord_KeepsTheStoredLabelAndUnit()
    {
        var figure = FigureColumns.ToFigure("group_delay_s", "Group delay", 159.2e-9, "s", null);

        Assert.False(figure.Key.IsListed);
        Assert.Equal("Group delay", figure.Label);
        Assert.Equal("159.2 ns", figure.Value.ToString());
        Assert.Equal(FigureColumns.From(figure), ("group_delay_s", "Group delay", (double?)159.2e-9, "s", (string?)null));
    }

    [Fact]
    public void ToFigure_NoValue_KeepsTheReason()
    {
        var figure = FigureColumns.ToFigure("unloaded_q", "Unloaded Q", null, "", "no S21");

        Assert.Null(figure.Value);
        Assert.Equal("no S21", figure.Reason);
    }

    [Theory]
    [InlineData("center_hz", "MHz")] // not a stored unit text
    [InlineData("center_hz", "dB")] // a listed figure in another unit
    [InlineData("q", "V")]
    public void ToFigure_UnitThatCannotBeRight_IsInvalidData(string key, string unit)
    {
        Assert.Throws<InvalidDataException>(() => FigureColumns.ToFigure(key, key, 1, unit, null));
    }
}
