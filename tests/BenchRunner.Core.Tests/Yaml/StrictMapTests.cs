using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Yaml;

namespace BenchRunner.Core.Tests.Yaml;

public class StrictMapTests
{
    private const string Source = "f.yaml";
    private static readonly string[] Keys = ["name", "count", "on", "level", "span", "inner", "items"];

    private static (StrictMap? Map, YamlProblems Problems) Open(string text)
    {
        var problems = new YamlProblems(Source);
        var root = YamlTreeReader.Read(text, Source)!;
        return (StrictMap.Open(root, "the file", Keys, problems), problems);
    }

    private static InputFormatException Problems(YamlProblems problems) =>
        Assert.Throws<InputFormatException>(problems.ThrowIfAny);

    [Fact]
    public void Open_UnknownKeys_AreEachReportedAtTheirKey()
    {
        var (map, problems) = Open("name: a\nnmae: b\ncuont: 3\n");

        Assert.NotNull(map);
        var e = Problems(problems);
        Assert.Equal(2, e.Problems.Count);
        Assert.Equal("f.yaml:2:1: unknown key \"nmae\" in the file; expected one of name, count, on, level, span, inner, items", e.Problems[0].ToString());
        Assert.Equal(new SourceLocation(Source, 3, 1), e.Problems[1].Location);
    }

    [Fact]
    public void Open_NotAMapping_IsReportedAndGivesNull()
    {
        var (map, problems) = Open("- a\n");

        Assert.Null(map);
        Assert.Contains("expected the file to be a mapping with keys such as \"name:\", \"count:\", \"on:\"; found a list", Problems(problems).Message);
    }

    [Fact]
    public void Text_MissingRequiredKey_IsReportedWithTheHint()
    {
        var (map, problems) = Open("count: 3\n");

        Assert.Null(map!.Text("name", "every file needs a name"));
        Assert.Equal("f.yaml:1:1: missing key \"name\" in the file; every file needs a name", Problems(problems).Message);
    }

    [Fact]
    public void Text_OptionalKeyAbsent_IsNullWithoutProblem()
    {
        var (map, problems) = Open("count: 3\n");

        Assert.Null(map!.Text("name"));
        Assert.False(problems.Any);
    }

    [Fact]
    public void Text_EmptyValue_IsReportedAtTheKey()
    {
        var (map, problems) = Open("count: 3\nname:\n");

        Assert.Null(map!.Text("name"));
        Assert.Equal("f.yaml:2:1: expected text for \"name\", found nothing", Problems(problems).Message);
    }

    [Fact]
    public void TypedReaders_GoodValues_AreRead()
    {
        var (map, problems) = Open("name: x\ncount: 12\non: true\nlevel: -20 dBm\nspan: 3 MHz\ninner: {name: y}\nitems: [a, b]\n");

        Assert.Equal("x", map!.Text("name")!.Value);
        Assert.Equal(12, map.Integer("count", 0, 100));
        Assert.True(map.Bool("on"));
        Assert.Equal(Level.FromDbm(-20), map.Parsed("level", Level.Parse));
        Assert.Equal(Frequency.FromMegahertz(3), map.FrequencyWithUnit("span"));
        Assert.Equal("y", map.Mapping("inner", ["name"])!.Text("name")!.Value);
        Assert.Equal(2, map.List("items", "words")!.Items.Count);
        Assert.False(problems.Any);
    }

    [Fact]
    public void TypedReaders_BadValues_AreAllReportedAtTheirValues()
    {
        var (map, problems) = Open("name: [x]\ncount: 101\non: yes\nlevel: -20\nspan: 3\ninner: {nom: y}\nitems: a\n");

        Assert.Null(map!.Text("name"));
        Assert.Null(map.Integer("count", 0, 100));
        Assert.Null(map.Bool("on"));
        Assert.Null(map.Parsed("level", Level.Parse));
        Assert.Null(map.FrequencyWithUnit("span"));
        map.Mapping("inner", ["name"]);
        Assert.Null(map.List("items", "words"));

        var e = Problems(problems);
        Assert.Equal(
        [
            "f.yaml:1:7: expected text for \"name\", found a list",
            "f.yaml:2:8: \"count\" must be from 0 to 100, found 101",
            "f.yaml:3:5: expected true or false for \"on\", found \"yes\"",
            "f.yaml:4:8: \"-20\" has no unit; expected a level such as \"-20 dBm\"",
            "f.yaml:5:7: \"3\" has no unit; expected a frequency such as \"137.5 MHz\"",
            "f.yaml:6:9: unknown key \"nom\" in \"inner\"; expected one of name",
            "f.yaml:7:8: expected a list of words for \"items\", found \"a\"",
        ], e.Problems.Select(p => p.ToString()));
        Assert.Equal(e.Problems[0].Location, e.Location);
        Assert.Equal(7, e.Message.Split('\n').Length);
    }

    [Fact]
    public void Word_UnknownValue_ListsTheChoices()
    {
        var (map, problems) = Open("name: cubic\n");

        Assert.Null(map!.Word("name", [("linear", 1), ("log", 2)]));
        Assert.Equal("f.yaml:1:7: unknown value \"cubic\" for \"name\"; expected one of linear, log", Problems(problems).Message);
    }

    [Fact]
    public void ThrowIfAny_NoProblems_DoesNothing()
    {
        new YamlProblems(Source).ThrowIfAny();
    }

    [Fact]
    public void ThrowIfAny_MoreThanTheLimit_SaysHowManyWereLeftOut()
    {
        var problems = new YamlProblems(Source);
        for (int i = 1; i <= YamlProblems.Limit + 3; i++)
        {
            problems.Add(new SourceLocation(Source, i, 1), "bad");
        }

        var e = Problems(problems);

        Assert.Equal(YamlProblems.Limit + 1, e.Problems.Count);
        Assert.Equal("f.yaml: 3 more problems not shown; correct these first", e.Problems[^1].ToString());
    }

    [Fact]
    public void Within_PlainAndQuotedText_GivesTheColumnOfTheCharacter()
    {
        var root = (YamlMap)YamlTreeReader.Read("a: one {x}\nb: \"two {y}\"\n", Source)!;
        var plain = (YamlText)root.Entries[0].Value;
        var quoted = (YamlText)root.Entries[1].Value;

        Assert.Equal(new SourceLocation(Source, 1, 8), YamlLocations.Within(plain, 4));
        Assert.Equal(new SourceLocation(Source, 2, 9), YamlLocations.Within(quoted, 4));
    }
}
