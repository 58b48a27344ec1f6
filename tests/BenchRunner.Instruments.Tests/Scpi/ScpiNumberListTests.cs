using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Instruments.Tests.Scpi;

public class ScpiNumberListTests
{
    [Fact]
    public void Parse_MixedNumberForms_GivesEachInOrder()
    {
        var result = ScpiNumberList.Parse("-20.5, +3,1.375E+08,-2.5e-3\r");

        Assert.True(result.Success, result.Error);
        Assert.Equal([-20.5, 3.0, 137.5e6, -0.0025], result.Value.ToArray());
    }

    [Fact]
    public void Parse_SingleNumber_GivesOneValue()
    {
        Assert.Equal([-87.25], ScpiNumberList.Parse("-87.25").Value.ToArray());
    }

    [Fact]
    public void Parse_EmptyItem_NamesItsPosition()
    {
        var result = ScpiNumberList.Parse("1,,3");

        Assert.False(result.Success);
        Assert.Contains("item 2 of 3", result.Error);
    }

    [Fact]
    public void Parse_ItemWithUnit_NamesItsPositionAndText()
    {
        var result = ScpiNumberList.Parse("-20 dBm,-21");

        Assert.False(result.Success);
        Assert.Contains("item 1 of 2, \"-20 dBm\"", result.Error);
    }

    [Fact]
    public void Parse_EmptyReply_Fails()
    {
        Assert.False(ScpiNumberList.Parse("  ").Success);
    }
}
