using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Tests.Quantities;

public class ResistanceTests
{
    [Theory]
    [InlineData("4.7 kOhm", 4700)]
    [InlineData("50 Ohm", 50)]
    [InlineData("50 ohms", 50)]
    [InlineData("50 OHM", 50)]
    [InlineData("1 MOhm", 1e6)]
    [InlineData("50 Ω", 50)]
    [InlineData("4.7 kΩ", 4700)]
    [InlineData("4.7 k\u2126", 4700)]
    [InlineData("450Ohm", 450)]
    [InlineData("2.2 KOhms", 2200)]
    [InlineData("0 Ohm", 0)]
    public void Parse_ValidText_GivesOhms(string text, double ohms)
    {
        var result = Resistance.Parse(text);

        Assert.True(result.Success, result.Error);
        Assert.Equal(ohms, result.Value.Ohms, 1e-9);
    }

    [Theory]
    [InlineData("", "empty")]
    [InlineData(null, "empty")]
    [InlineData("abc", "does not start with a number")]
    [InlineData("NaN Ohm", "does not start with a number")]
    [InlineData("50", "has no unit")]
    [InlineData("4k7", "unknown resistance unit \"k7\"")]
    [InlineData("50 Ohmz", "unknown resistance unit \"Ohmz\"")]
    [InlineData("4.7 k Ohm", "unknown resistance unit \"k Ohm\"")]
    [InlineData("4.7 GOhm", "unknown resistance unit \"GOhm\"")]
    [InlineData("1 mOhm", "would mean milliohms")]
    [InlineData("-50 Ohm", "negative")]
    [InlineData("1e308 MOhm", "too large")]
    public void Parse_BadText_FailsWithMessage(string? text, string messagePart)
    {
        var result = Resistance.Parse(text);

        Assert.False(result.Success);
        Assert.Contains(messagePart, result.Error);
    }

    [Theory]
    [InlineData(4700, "4.7 kOhm")]
    [InlineData(50, "50 Ohm")]
    [InlineData(1e6, "1 MOhm")]
    [InlineData(950, "950 Ohm")]
    [InlineData(0, "0 Ohm")]
    [InlineData(0.5, "0.5 Ohm")]
    public void ToString_UsesLargestFittingPrefix(double ohms, string expected)
    {
        Assert.Equal(expected, Resistance.FromOhms(ohms).ToString());
    }

    [Theory]
    [InlineData(4700)]
    [InlineData(50)]
    [InlineData(1.5e6)]
    [InlineData(49.9)]
    public void ToString_ThenParse_RoundTrips(double ohms)
    {
        var resistance = Resistance.FromOhms(ohms);

        Assert.Equal(resistance, Resistance.Parse(resistance.ToString()).GetValueOrThrow());
    }

    [Theory]
    [InlineData(-1)]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    public void FromOhms_Invalid_Throws(double ohms)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Resistance.FromOhms(ohms));
    }

    [Fact]
    public void Factories_ScaleByPrefix()
    {
        Assert.Equal(4700, Resistance.FromKiloohms(4.7).Ohms, 9);
        Assert.Equal(1e6, Resistance.FromMegaohms(1).Ohms);
        Assert.Equal(4.7, Resistance.FromOhms(4700).Kiloohms, 12);
        Assert.Equal(1, Resistance.FromOhms(1e6).Megaohms, 12);
    }

    [Fact]
    public void Comparison_OrdersByOhms()
    {
        Assert.True(Resistance.FromOhms(450) < Resistance.FromOhms(950));
        Assert.True(Resistance.FromKiloohms(4.7) > Resistance.FromOhms(950));
        Assert.Equal(Resistance.Zero, Resistance.FromOhms(-0.0));
    }
}
