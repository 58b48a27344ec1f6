using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Tests.Quantities;

public class LevelTests
{
    [Theory]
    [InlineData("-20 dBm", -20)]
    [InlineData("+10dBm", 10)]
    [InlineData("0 DBM", 0)]
    [InlineData(" -73.5 dbm ", -73.5)]
    [InlineData("1e1 dBm", 10)]
    public void Parse_ValidText_GivesDbm(string text, double dbm)
    {
        var result = Level.Parse(text);

        Assert.True(result.Success, result.Error);
        Assert.Equal(dbm, result.Value.Dbm, 12);
    }

    [Theory]
    [InlineData("", "empty")]
    [InlineData("abc", "does not start with a number")]
    [InlineData("NaN dBm", "does not start with a number")]
    [InlineData("-20", "has no unit")]
    [InlineData("-20 dB", "unknown level unit \"dB\"")]
    [InlineData("-20 dBmm", "unknown level unit \"dBmm\"")]
    public void Parse_BadText_FailsWithMessage(string text, string messagePart)
    {
        var result = Level.Parse(text);

        Assert.False(result.Success);
        Assert.Contains(messagePart, result.Error);
    }

    [Theory]
    [InlineData(-20, "-20 dBm")]
    [InlineData(10, "10 dBm")]
    [InlineData(-173.975, "-173.975 dBm")]
    [InlineData(-1e-9, "0 dBm")]
    public void ToString_FormatsDbm(double dbm, string expected)
    {
        Assert.Equal(expected, Level.FromDbm(dbm).ToString());
    }

    [Theory]
    [InlineData(-20)]
    [InlineData(13.0103)]
    [InlineData(-113.975)]
    public void ToString_ThenParse_RoundTrips(double dbm)
    {
        var level = Level.FromDbm(dbm);

        Assert.Equal(level, Level.Parse(level.ToString()).GetValueOrThrow());
    }

    [Fact]
    public void Watts_ZeroDbm_IsOneMilliwatt()
    {
        // REFERENCES: power into 50 Ω, 0 dBm = 1 mW (definition of dBm).
        Assert.Equal(1e-3, Level.FromDbm(0).Watts, 15);
        Assert.Equal(0, Level.FromWatts(1e-3).Dbm, 12);
        Assert.Equal(30, Level.FromWatts(1).Dbm, 12);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(-1)]
    [InlineData(double.NaN)]
    public void FromWatts_NotPositive_Throws(double watts)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Level.FromWatts(watts));
    }

    [Fact]
    public void PlusAndRelativeTo_AddAndSubtractDecibels()
    {
        var lnaOut = Level.FromDbm(-90).Plus(Ratio.FromDecibels(20));

        Assert.Equal(-70, lnaOut.Dbm, 12);
        Assert.Equal(20, lnaOut.RelativeTo(Level.FromDbm(-90)).Decibels, 12);
    }
}
