using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Instruments.Tests.Scpi;

public class ScpiBooleanTests
{
    // SCPI-1999 Vol 1 boolean data: 1/ON and 0/OFF; instruments answer 1 or 0 (from memory).
    [Theory]
    [InlineData("1", true)]
    [InlineData("0", false)]
    [InlineData("+1", true)]
    [InlineData("ON", true)]
    [InlineData("off", false)]
    [InlineData(" On\r", true)]
    public void Parse_BooleanReply_GivesItsValue(string reply, bool expected)
    {
        var result = ScpiBoolean.Parse(reply);

        Assert.True(result.Success, result.Error);
        Assert.Equal(expected, result.Value);
    }

    [Theory]
    [InlineData("2")]
    [InlineData("-1")]
    [InlineData("TRUE")]
    [InlineData("0.5")]
    [InlineData("")]
    public void Parse_OtherReply_Fails(string reply)
    {
        var result = ScpiBoolean.Parse(reply);

        Assert.False(result.Success);
        Assert.Contains("expected 0, 1, ON or OFF", result.Error);
    }
}
