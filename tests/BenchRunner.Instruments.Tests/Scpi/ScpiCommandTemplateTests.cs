using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Instruments.Tests.Scpi;

public class ScpiCommandTemplateTests
{
    private static ScpiCommandTemplate Template(string text, ScpiPlaceholder? placeholder) =>
        ScpiCommandTemplate.Parse(text, placeholder).Value;

    [Fact]
    public void Render_Frequency_WritesWholeHertzWithoutUnit()
    {
        var command = Template("SENSe:FREQuency:STARt {hz}", ScpiPlaceholder.Hz).Render(Frequency.FromMegahertz(137.5));

        Assert.Equal("SENSe:FREQuency:STARt 137500000", command);
    }

    [Fact]
    public void Render_FractionalFrequency_KeepsEveryDigit()
    {
        Assert.Equal("F 21400000.5", Template("F {hz}", ScpiPlaceholder.Hz).Render(Frequency.FromHertz(21_400_000.5)));
    }

    [Fact]
    public void Render_Level_WritesDbm()
    {
        Assert.Equal("SOURce:POWer -20.5", Template("SOURce:POWer {dbm}", ScpiPlaceholder.Dbm).Render(Level.FromDbm(-20.5)));
    }

    [Fact]
    public void Render_Ratio_WritesDecibels()
    {
        Assert.Equal("INPut:ATTenuation 10", Template("INPut:ATTenuation {db}", ScpiPlaceholder.Db).Render(Ratio.FromDecibels(10)));
    }

    [Theory]
    [InlineData(true, "OUTPut:STATe ON")]
    [InlineData(false, "OUTPut:STATe OFF")]
    public void Render_State_WritesOnOrOff(bool on, string expected)
    {
        Assert.Equal(expected, Template("OUTPut:STATe {state}", ScpiPlaceholder.State).Render(on));
    }

    [Theory]
    [InlineData(ScpiDataFormat.Ascii, "FORMat:DATA ASCii")]
    [InlineData(ScpiDataFormat.Real32, "FORMat:DATA REAL,32")]
    [InlineData(ScpiDataFormat.Real64, "FORMat:DATA REAL,64")]
    public void Render_Format_WritesScpiFormatNames(ScpiDataFormat format, string expected)
    {
        Assert.Equal(expected, Template("FORMat:DATA {format}", ScpiPlaceholder.Format).Render(format));
    }

    [Theory]
    [InlineData(ScpiByteOrder.Normal, "FORMat:BORDer NORMal")]
    [InlineData(ScpiByteOrder.Swapped, "FORMat:BORDer SWAPped")]
    public void Render_Order_WritesScpiByteOrderNames(ScpiByteOrder order, string expected)
    {
        Assert.Equal(expected, Template("FORMat:BORDer {order}", ScpiPlaceholder.Order).Render(order));
    }

    [Fact]
    public void Render_PointsAndCount_FillWhicheverTheTemplateHas()
    {
        Assert.Equal("SENSe:SWEep:POINts 201", Template("SENSe:SWEep:POINts {points}", ScpiPlaceholder.Points).Render(201));
        Assert.Equal("SENSe:AVERage:COUNt 8", Template("SENSe:AVERage:COUNt {count}", ScpiPlaceholder.Count).Render(8));
    }

    [Fact]
    public void Render_ValueOfTheWrongType_Throws()
    {
        var template = Template("SOURce:POWer {dbm}", ScpiPlaceholder.Dbm);

        Assert.Throws<InvalidOperationException>(() => template.Render(Frequency.FromMegahertz(1)));
        Assert.Throws<InvalidOperationException>(() => template.Render());
    }

    [Fact]
    public void Parse_WrongPlaceholder_SaysWhichWasNeeded()
    {
        var result = ScpiCommandTemplate.Parse("SOURce:POWer {hz}", ScpiPlaceholder.Dbm);

        Assert.False(result.Success);
        Assert.Contains("needs the placeholder {dbm}, not {hz}", result.Error);
    }

    [Fact]
    public void Parse_MissingPlaceholder_Fails()
    {
        Assert.Contains("needs the placeholder {hz}", ScpiCommandTemplate.Parse("SENSe:FREQuency:STARt", ScpiPlaceholder.Hz).Error);
    }

    [Fact]
    public void Parse_PlaceholderWhereNoneIsTaken_Fails()
    {
        Assert.Contains("takes no value", ScpiCommandTemplate.Parse("INITiate {state}", null).Error);
    }

    [Theory]
    [InlineData("SENSe:FREQuency:STARt {Hz}", "unknown placeholder {Hz}")]
    [InlineData("SENSe:FREQuency:STARt {hz", "no '}'")]
    [InlineData("SENSe:FREQuency:STARt hz}", "no '{'")]
    [InlineData("SENSe:FREQuency:STARt {hz};STOP {hz}", "more than one placeholder")]
    [InlineData("SENSe:FREQuency:STARt {hz}\nSTOP 1", "one command on one line")]
    [InlineData("  ", "empty")]
    public void Parse_MalformedTemplate_SaysWhatIsWrong(string text, string expected)
    {
        var result = ScpiCommandTemplate.Parse(text, ScpiPlaceholder.Hz);

        Assert.False(result.Success);
        Assert.Contains(expected, result.Error);
    }
}
