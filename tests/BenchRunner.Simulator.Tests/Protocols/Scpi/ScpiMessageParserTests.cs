using BenchRunner.Simulator.Protocols.Scpi;

namespace BenchRunner.Simulator.Tests.Protocols.Scpi;

// Program message syntax: IEEE 488.2 §7 (units separated by ';', header, white space, parameters
// separated by ','; decimal numeric data §7.7.2 with suffixes §7.7.3; strings §7.7.5), from memory.
public class ScpiMessageParserTests
{
    [Fact]
    public void SplitUnits_SemicolonInsideAString_DoesNotSplit()
    {
        var units = ScpiMessageParser.SplitUnits("SYST:ERR?;DISP:TEXT \"a;b\";*OPC?");

        Assert.Equal(["SYST:ERR?", "DISP:TEXT \"a;b\"", "*OPC?"], units);
    }

    [Fact]
    public void ParseUnit_CompoundQuery_ReadsKeywordsSuffixesAndQuery()
    {
        var unit = ScpiMessageParser.ParseUnit(":disp:WIND2:trac:y:rlev?");

        Assert.True(unit.IsRooted);
        Assert.True(unit.IsQuery);
        Assert.False(unit.IsCommon);
        Assert.Equal([new("DISP", null), new("WIND", 2), new("TRAC", null), new("Y", null), new("RLEV", null)], unit.Mnemonics);
        Assert.Empty(unit.Parameters);
    }

    [Fact]
    public void ParseUnit_CommonQuery_IsCommon()
    {
        var unit = ScpiMessageParser.ParseUnit("*idn?");

        Assert.True(unit.IsCommon);
        Assert.True(unit.IsQuery);
        Assert.Equal("IDN", Assert.Single(unit.Mnemonics).Name);
    }

    [Theory]
    [InlineData("137.5MHZ", 137.5, "MHZ")]
    [InlineData("137.5 MHz", 137.5, "MHZ")]
    [InlineData("-20DBM", -20, "DBM")]
    [InlineData("1e6", 1e6, null)]
    [InlineData("+.5", 0.5, null)]
    [InlineData("2.5E-3 khz", 2.5e-3, "KHZ")]
    public void ParseUnit_NumericParameter_ReadsNumberAndSuffix(string parameter, double number, string? suffix)
    {
        var p = Assert.Single(ScpiMessageParser.ParseUnit("FREQ " + parameter).Parameters);

        Assert.Equal(ScpiParameterKind.Numeric, p.Kind);
        Assert.Equal(number, p.Number, 12);
        Assert.Equal(suffix, p.Suffix);
    }

    [Fact]
    public void ParseUnit_SeveralParameters_ReadsEachKind()
    {
        var parameters = ScpiMessageParser.ParseUnit("FORM:DATA REAL , 32,'it''s',\"say \"\"hi\"\"\"").Parameters;

        Assert.Equal([ScpiParameterKind.Character, ScpiParameterKind.Numeric, ScpiParameterKind.String, ScpiParameterKind.String],
            parameters.Select(p => p.Kind));
        Assert.Equal("REAL", parameters[0].Word);
        Assert.Equal(32, parameters[1].Number);
        Assert.Equal("it's", parameters[2].Word);
        Assert.Equal("say \"hi\"", parameters[3].Word);
    }

    [Theory]
    [InlineData("SENS::FREQ 1")]          // empty keyword
    [InlineData("SENS:FR-EQ 1")]          // not a program mnemonic
    [InlineData("SENS?:FREQ")]            // '?' inside the header
    [InlineData("FREQ 1,,2")]             // empty parameter
    [InlineData("FREQ 12abc3")]           // not a number
    [InlineData("TEXT \"open")]           // unterminated string
    [InlineData("TEXT \"a\"b")]           // text after the closing quote
    [InlineData("*ID1?")]                 // a common header is letters only
    [InlineData("FREQ #H1F")]             // non-decimal data is not supported
    public void ParseUnit_Malformed_IsSyntaxError(string unit)
    {
        var e = Assert.Throws<ScpiCommandException>(() => ScpiMessageParser.ParseUnit(unit));

        // REFERENCES: SCPI-1999 Vol 2 §21.8, -102 "Syntax error".
        Assert.Equal(-102, e.Error.Code);
        Assert.Equal("Syntax error", e.Error.Text);
    }
}
