using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Instruments.Tests.Scpi;

public class ScpiErrorTests
{
    // Error numbers and texts: SCPI-1999 Vol 2 §21.8 (REFERENCES).
    [Theory]
    [InlineData("-113,\"Undefined header\"", -113, "Undefined header")]
    [InlineData("-222,\"Data out of range\"\r", -222, "Data out of range")]
    [InlineData("-350,\"Queue overflow\"", -350, "Queue overflow")]
    [InlineData("+0,\"No error\"", 0, "No error")]
    [InlineData("0,\"No error\"", 0, "No error")]
    [InlineData(" -222 , \"Data out of range\" ", -222, "Data out of range")]
    public void Parse_StandardEntry_GivesCodeAndText(string reply, int code, string text)
    {
        var result = ScpiError.Parse(reply);

        Assert.True(result.Success, result.Error);
        Assert.Equal(new ScpiError(code, text), result.Value);
    }

    [Fact]
    public void Parse_TextWithCommas_KeepsThemInTheText()
    {
        // Device-dependent detail after a semicolon, with commas (SCPI-1999 Vol 2 §21.8 allows added information).
        var result = ScpiError.Parse("-222,\"Data out of range;SOURce:POWer 30, max 10\"");

        Assert.Equal(-222, result.Value.Code);
        Assert.Equal("Data out of range;SOURce:POWer 30, max 10", result.Value.Text);
    }

    [Fact]
    public void Parse_DoubledQuotes_StandForOneQuote()
    {
        // IEEE 488.2 string data: a quote inside the string is doubled (§7.7.5, from memory).
        var result = ScpiError.Parse("-224,\"Illegal parameter value; \"\"MAXX\"\" is not a level\"");

        Assert.Equal("Illegal parameter value; \"MAXX\" is not a level", result.Value.Text);
    }

    [Fact]
    public void Parse_SingleQuotes_AreAccepted()
    {
        Assert.Equal("Undefined header", ScpiError.Parse("-113,'Undefined header'").Value.Text);
    }

    [Fact]
    public void Parse_UnquotedText_IsTakenAsItStands()
    {
        var result = ScpiError.Parse("-113,Undefined header");

        Assert.Equal(new ScpiError(-113, "Undefined header"), result.Value);
    }

    [Fact]
    public void Parse_NoErrorWithAnyText_IsNoError()
    {
        Assert.True(ScpiError.Parse("+0,\"Queue empty\"").Value.IsNoError);
    }

    [Theory]
    [InlineData("\"No error\"")]
    [InlineData("No error")]
    [InlineData("-1.5,\"x\"")]
    [InlineData("")]
    [InlineData("-113,\"Undefined header")]
    [InlineData("-113,\"Undefined \"header\"")]
    public void Parse_Malformed_Fails(string reply)
    {
        Assert.False(ScpiError.Parse(reply).Success);
    }

    [Fact]
    public void ToString_DoublesQuotes_AndParsesBack()
    {
        var entry = new ScpiError(-200, "Execution error; \"ON\" refused, busy");

        Assert.Equal(entry, ScpiError.Parse(entry.ToString()).Value);
    }

    [Fact]
    public void IsQueueOverflow_IsTrueFor350Only()
    {
        Assert.True(new ScpiError(-350, "Queue overflow").IsQueueOverflow);
        Assert.False(new ScpiError(-113, "Undefined header").IsQueueOverflow);
    }
}
