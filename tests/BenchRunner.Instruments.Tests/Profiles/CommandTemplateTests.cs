using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Profiles;

namespace BenchRunner.Instruments.Tests.Profiles;

public class CommandTemplateTests
{
    private static readonly IReadOnlyList<TemplateVariable> Variables =
    [
        new("f", TemplateValueKind.Frequency), new("level", TemplateValueKind.Level), new("att", TemplateValueKind.Ratio),
        new("n", TemplateValueKind.Count), new("on", TemplateValueKind.Switch),
    ];

    private static CommandTemplate Template(string text, BoolWords? words = null)
    {
        var (template, errors) = TemplateParser.Parse(text, "\"t\"", Variables, words ?? BoolWords.Default);
        Assert.Empty(errors);
        return template!;
    }

    private static string RenderFrequency(string type, Frequency f) => Template($"x {{f:{type}}}").Render(new TemplateArguments().Set("f", f))[2..];

    [Theory]
    [InlineData("hz", 137.5, "137500000")]
    [InlineData("khz", 137.5, "137500")]
    [InlineData("mhz", 137.5, "137.5")]
    [InlineData("ghz", 137.5, "0.1375")]
    [InlineData("hz", 21.4, "21400000")]
    [InlineData("khz", 21.4, "21400")]
    [InlineData("mhz", 21.4, "21.4")]
    [InlineData("mhz", 137.000001, "137.000001")]
    [InlineData("khz", 0.4555, "455.5")]
    public void Render_FrequencyTypes_WriteTheUnitWithoutTrailingZeros(string type, double megahertz, string expected)
    {
        Assert.Equal(expected, RenderFrequency(type, Frequency.FromMegahertz(megahertz)));
    }

    [Theory]
    [InlineData(1234.4, "1234")]
    [InlineData(1234.5, "1235")]
    [InlineData(1234.6, "1235")]
    public void Render_Hz_RoundsToWholeHertz(double hertz, string expected)
    {
        Assert.Equal(expected, RenderFrequency("hz", Frequency.FromHertz(hertz)));
    }

    [Theory]
    [InlineData(-20, "-20")]
    [InlineData(-3.25, "-3.25")]
    [InlineData(0, "0")]
    [InlineData(-0.0001, "0")]
    [InlineData(7.12345, "7.123")]
    public void Render_Dbm_WritesUpToThreeDecimals(double dbm, string expected)
    {
        Assert.Equal($"lvl {expected}", Template("lvl {level:dbm}").Render(new TemplateArguments().Set("level", Level.FromDbm(dbm))));
    }

    [Fact]
    public void Render_DbIntAndBool_WriteTheirValues()
    {
        var args = new TemplateArguments().Set("att", Ratio.FromDecibels(10)).Set("n", 401).Set("on", true);

        Assert.Equal("att 10 pts 401 rf on", Template("att {att:db} pts {n:int} rf {on:bool}").Render(args));
        Assert.Equal("rf 0", Template("rf {on}", new BoolWords("1", "0")).Render(new TemplateArguments().Set("on", false)));
    }

    [Fact]
    public void Render_PlaceholderWithoutType_UsesTheVariablesDefault()
    {
        var template = Template("{f} {level} {att} {n}");

        Assert.Equal([PlaceholderType.Hz, PlaceholderType.Dbm, PlaceholderType.Db, PlaceholderType.Int], template.Placeholders.Select(p => p.Type));
        var args = new TemplateArguments().Set("f", Frequency.FromMegahertz(1)).Set("level", Level.FromDbm(-1)).Set("att", Ratio.FromDecibels(2)).Set("n", 3);
        Assert.Equal("1000000 -1 2 3", template.Render(args));
    }

    [Fact]
    public void Render_DoubledBraces_AreLiteralBraces()
    {
        Assert.Equal("set {x} 5 }", Template("set {{x}} {n} }}").Render(new TemplateArguments().Set("n", 5)));
    }

    [Fact]
    public void Render_MissingValue_IsAnArgumentError()
    {
        var e = Assert.Throws<ArgumentException>(() => Template("pts {n}").Render(new TemplateArguments()));

        Assert.Contains("{n}", e.Message);
    }

    [Fact]
    public void Render_ValueOfAnotherKind_IsAnArgumentError()
    {
        Assert.Throws<ArgumentException>(() => Template("pts {n}").Render(new TemplateArguments().Set("n", Frequency.FromHertz(3))));
    }

    [Theory]
    [InlineData("go {x}", 4, "unknown placeholder \"x\"")]
    [InlineData("go { n }", 4, null)]
    [InlineData("go {n:float}", 6, "unknown placeholder type \"float\"")]
    [InlineData("go {level:db}", 10, "level is a level in dBm, which is written as dbm, not db")]
    [InlineData("go {on:int}", 7, "on is a switch, which is written as bool, not int")]
    [InlineData("go {}", 3, "an empty placeholder \"{}\"")]
    [InlineData("go {n", 3, "unclosed \"{\"")]
    [InlineData("go n}", 4, "a lone \"}\"")]
    public void Parse_BadPlaceholder_ReportsTheIndexOfTheOffendingPart(string text, int index, string? expected)
    {
        var (template, errors) = TemplateParser.Parse(text, "\"t\"", Variables, BoolWords.Default);

        if (expected is null)
        {
            // Spaces inside the braces are allowed around the name.
            Assert.Empty(errors);
            Assert.Equal("go 7", template!.Render(new TemplateArguments().Set("n", 7)));
            return;
        }

        Assert.Null(template);
        var (at, detail) = Assert.Single(errors);
        Assert.Equal(index, at);
        Assert.Contains(expected, detail);
    }
}
