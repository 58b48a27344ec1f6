using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Tests.Quantities;

public class QuantityFormatTests
{
    // The prefixes (p, n, µ, m, k, M, G) and their powers of ten are the SI prefixes (BIPM, The
    // International System of Units, 9th edition 2019, table 7; from memory). The digits shown are
    // the project's own rule (QuantityFormat's remarks and docs/quantities.md), no source.
    [Theory]
    [InlineData(5e-9, "s", "5 ns")]
    [InlineData(159.2e-9, "s", "159.2 ns")]
    [InlineData(159.2449e-9, "s", "159.2 ns")] // 4 significant digits for time
    [InlineData(-2.5e-6, "s", "-2.5 \u00B5s")]
    [InlineData(125, "s", "125 s")] // seconds take no prefix above 1 s
    [InlineData(999.96e-9, "s", "1 \u00B5s")] // carries from n to µ (scales that are not exact in binary)
    [InlineData(999.96e-6, "s", "1 ms")]
    [InlineData(137.5642e6, "Hz", "137.5642 MHz")]
    [InlineData(137.56423e6, "Hz", "137.5642 MHz")] // 7 significant digits for frequency
    [InlineData(137.5e6, "Hz", "137.5 MHz")] // trailing zeros dropped
    [InlineData(2.5e3, "Hz", "2.5 kHz")]
    [InlineData(-131.519e3, "Hz", "-131.519 kHz")]
    [InlineData(999.9994e3, "Hz", "999.9994 kHz")]
    [InlineData(999.99996e3, "Hz", "1 MHz")] // rounding carries into the next prefix
    [InlineData(2.4e9, "Hz", "2.4 GHz")]
    [InlineData(0.5, "Hz", "0.5 Hz")] // hertz never take a prefix below 1 Hz
    [InlineData(1.2e3, "\u03A9", "1.2 k\u03A9")]
    [InlineData(0.05, "\u03A9", "50 m\u03A9")]
    [InlineData(-4.41, "dB", "-4.41 dB")]
    [InlineData(-4.4149, "dB", "-4.41 dB")] // 0.01 dB for logarithmic units
    [InlineData(-20.3, "dBm", "-20.3 dBm")]
    [InlineData(12000, "dB", "12000 dB")] // no prefix on a logarithmic unit
    [InlineData(45.7, "", "45.7")]
    [InlineData(123.456, "", "123.5")] // 4 significant digits for a pure number
    [InlineData(12345.6, "", "12346")] // ... but whole digits are never dropped
    [InlineData(0.00012344, "", "0.0001234")]
    [InlineData(0, "Hz", "0 Hz")]
    [InlineData(0, "s", "0 s")]
    [InlineData(0, "dB", "0 dB")]
    [InlineData(0, "", "0")]
    [InlineData(-0.0, "dBm", "0 dBm")]
    [InlineData(-0.001, "dB", "0 dB")] // rounds to zero: no minus sign
    [InlineData(-0.00001, "", "-0.00001")] // significant digits: a small number keeps its own
    public void Format_TableOfCases_ShowsTheRuleOfEachUnit(double value, string unit, string expected)
    {
        var text = QuantityFormat.Format(value, QuantityUnit.FromSymbol(unit)!);

        Assert.Equal(expected, text);
    }

    [Fact]
    public void Format_FourSignificantDigits_Rounds999Point95KilohertzUpToOneMegahertz()
    {
        Assert.Equal("1 MHz", QuantityFormat.Format(999.95e3, QuantityUnit.Hertz, 4));
        Assert.Equal("-1 MHz", QuantityFormat.Format(-999.95e3, QuantityUnit.Hertz, 4));
        Assert.Equal("999.9 kHz", QuantityFormat.Format(999.94e3, QuantityUnit.Hertz, 4));
    }

    [Fact]
    public void Format_NineSignificantDigits_KeepsWhatAFrequencyHolds()
    {
        Assert.Equal("137.512345 MHz", QuantityFormat.Format(137.512345e6, QuantityUnit.Hertz, 9));
        Assert.Equal("137.5123 MHz", QuantityFormat.Format(137.512345e6, QuantityUnit.Hertz));
    }

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    [InlineData(double.NegativeInfinity)]
    public void Format_NotFinite_IsRefused(double value)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => QuantityFormat.Format(value, QuantityUnit.Hertz));
        Assert.Throws<ArgumentOutOfRangeException>(() => QuantityFormat.Format(value, QuantityUnit.Decibel));
        Assert.Throws<ArgumentOutOfRangeException>(() => QuantityFormat.Format(value, "dBm"));
        Assert.Throws<ArgumentOutOfRangeException>(() => QuantityFormat.Signed(value, QuantityUnit.None));
    }

    [Theory]
    [InlineData(0)]
    [InlineData(16)]
    public void Format_SignificantDigitsOutOfRange_IsRefused(int digits)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => QuantityFormat.Format(1, QuantityUnit.Hertz, digits));
    }

    [Theory]
    [InlineData(1.2, "dB", "+1.2 dB")]
    [InlineData(-0.45, "dB", "-0.45 dB")]
    [InlineData(0, "dB", "0 dB")]
    [InlineData(0.004, "dB", "0 dB")] // shown as zero, so no sign
    [InlineData(10, "dBm", "+10 dBm")]
    [InlineData(31.2e3, "Hz", "+31.2 kHz")]
    public void Signed_Value_HasAPlusSignOnlyWhenShownAboveZero(double value, string unit, string expected)
    {
        Assert.Equal(expected, QuantityFormat.Signed(value, QuantityUnit.FromSymbol(unit)!));
        Assert.Equal(expected, QuantityFormat.Signed(value, unit));
    }

    [Theory]
    [InlineData(137.5e6, "Hz", "137.5 MHz")]
    [InlineData(-2.3149, "dB", "-2.31 dB")]
    [InlineData(45.66, "", "45.66")]
    [InlineData(45.66, null, "45.66")]
    [InlineData(1.5, "V", "1.5 V")] // a unit the program does not know is shown as written
    public void Format_StoredUnitText_UsesTheUnitItNames(double value, string? unit, string expected)
    {
        Assert.Equal(expected, QuantityFormat.Format(value, unit));
    }

    [Fact]
    public void Format_Quantity_UsesItsOwnUnit()
    {
        Assert.Equal("159.2 ns", QuantityFormat.Format(Quantity.Of(159.2e-9, QuantityUnit.Second)));
        Assert.Equal("-4.41 dB", Quantity.Of(-4.41, QuantityUnit.Decibel).ToString());
    }

    [Theory]
    [InlineData(137.5642e6, "Hz", 100)]
    [InlineData(2.5e3, "Hz", 0.001)]
    [InlineData(159.2e-9, "s", 1e-10)]
    [InlineData(-4.41, "dB", 0.01)]
    [InlineData(-120.5, "dBm", 0.01)]
    [InlineData(45.7, "", 0.01)]
    [InlineData(12345.6, "", 1)]
    [InlineData(0, "Hz", 0)]
    public void Resolution_Value_IsThePlaceOfTheLastDigitShown(double value, string unit, double expected)
    {
        Assert.Equal(expected, QuantityFormat.Resolution(value, QuantityUnit.FromSymbol(unit)!), expected * 1e-9);
    }
}
