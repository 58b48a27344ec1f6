using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Tests.Figures;

public class FigureKeysTests
{
    // The stored words of earlier versions: result files and plans keep using them.
    [Theory]
    [InlineData("peak_hz", "Hz")]
    [InlineData("peak_db", "dB")]
    [InlineData("bandwidth_3db_hz", "Hz")]
    [InlineData("center_hz", "Hz")]
    [InlineData("loaded_q", "")]
    [InlineData("insertion_loss_db", "dB")]
    [InlineData("lower_3db_hz", "Hz")]
    [InlineData("upper_3db_hz", "Hz")]
    [InlineData("bandwidth_1db_hz", "Hz")]
    [InlineData("shape_factor_60_3", "")]
    [InlineData("unloaded_q", "")]
    [InlineData("peak_dbm", "dBm")]
    [InlineData("noise_floor_dbm", "dBm")]
    [InlineData("occupied_bandwidth_hz", "Hz")]
    [InlineData("occupied_lower_hz", "Hz")]
    [InlineData("occupied_upper_hz", "Hz")]
    [InlineData("mask_margin_db", "dB")]
    public void Find_StoredWord_GivesTheKeyWithItsUnit(string word, string unit)
    {
        var key = FigureKeys.Find(word);

        Assert.NotNull(key);
        Assert.Equal(word, key.Word);
        Assert.Equal(unit, key.Unit.Symbol);
        Assert.False(string.IsNullOrWhiteSpace(key.Label));
        Assert.True(key.IsListed);
    }

    [Fact]
    public void All_Words_AreDistinct()
    {
        Assert.Equal(FigureKeys.All.Count, FigureKeys.All.Select(k => k.Word).Distinct().Count());
    }

    [Theory]
    [InlineData("centre_hz")]
    [InlineData("CENTER_HZ")]
    [InlineData("")]
    [InlineData(null)]
    public void Find_UnknownWord_GivesNull(string? word)
    {
        Assert.Null(FigureKeys.Find(word));
    }

    [Fact]
    public void Unlisted_ListedWord_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => FigureKey.Unlisted("center_hz", "Centre", QuantityUnit.Hertz));
    }

    [Fact]
    public void Unlisted_NewWord_KeepsWordLabelAndUnit()
    {
        var key = FigureKey.Unlisted("group_delay_s", "Group delay", QuantityUnit.Second);

        Assert.Equal("group_delay_s", key.Word);
        Assert.Equal("Group delay", key.Label);
        Assert.Same(QuantityUnit.Second, key.Unit);
        Assert.False(key.IsListed);
        Assert.Equal("group_delay_s", key.ToString());
    }
}
