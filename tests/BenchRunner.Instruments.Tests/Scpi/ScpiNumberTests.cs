using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Instruments.Tests.Scpi;

public class ScpiNumberTests
{
    // IEEE 488.2 §8.7.2–§8.7.4: NR1 integers, NR2 with a decimal point, NR3 with an exponent
    // (section numbers from memory).
    [Theory]
    [InlineData("42", 42.0)]
    [InlineData("+0", 0.0)]
    [InlineData("-113", -113.0)]
    [InlineData("-1.5", -1.5)]
    [InlineData(".25", 0.25)]
    [InlineData("137.", 137.0)]
    [InlineData("1.375E+08", 137.5e6)]
    [InlineData("-2.5e-3", -0.0025)]
    [InlineData(" 21400000 \r", 21.4e6)]
    public void Parse_DecimalNumber_GivesItsValue(string reply, double expected)
    {
        var result = ScpiNumber.Parse(reply);

        Assert.True(result.Success, result.Error);
        Assert.Equal(expected, result.Value, 12);
    }

    [Theory]
    [InlineData("")]
    [InlineData("abc")]
    [InlineData("1,5")]
    [InlineData("1e")]
    [InlineData("0x10")]
    [InlineData("10 dBm")]
    [InlineData("NaN")]
    [InlineData("1e999")]
    public void Parse_NotANumber_FailsWithWhatWasExpected(string reply)
    {
        var result = ScpiNumber.Parse(reply);

        Assert.False(result.Success);
        Assert.Contains("NR1, NR2 or NR3", result.Error);
    }

    [Theory]
    [InlineData("+0", 0L)]
    [InlineData("1", 1L)]
    [InlineData("-350", -350L)]
    public void ParseInteger_Nr1_GivesItsValue(string reply, long expected)
    {
        Assert.Equal(expected, ScpiNumber.ParseInteger(reply).Value);
    }

    [Theory]
    [InlineData("1.5")]
    [InlineData("1E3")]
    [InlineData("")]
    [InlineData("99999999999999999999")]
    public void ParseInteger_NotAnInteger_Fails(string reply)
    {
        Assert.False(ScpiNumber.ParseInteger(reply).Success);
    }

    // 9.91E37 (not a number) and 9.9E37 (infinity) are the SCPI marker values (SCPI-1999 Vol 1, from memory).
    [Theory]
    [InlineData(9.91e37, true)]
    [InlineData(9.9e37, true)]
    [InlineData(-9.9e37, true)]
    [InlineData(1e30, false)]
    [InlineData(-20.5, false)]
    public void IsMarker_RecognisesTheMarkerValuesOnly(double value, bool expected)
    {
        Assert.Equal(expected, ScpiNumber.IsMarker(value));
    }

    [Fact]
    public void IsMarker_Float32RoundingOfNotANumber_IsStillAMarker()
    {
        Assert.True(ScpiNumber.IsMarker((float)ScpiNumber.NotANumber));
    }
}
