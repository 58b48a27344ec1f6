using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Masks;

namespace BenchRunner.Core.Tests.Masks;

// Every malformed file must give an InputFormatException at the offending token
// (1-based line and column) saying what was expected.
public class MaskFileErrorTests
{
    private const string Source = "mask.yaml";

    public static TheoryData<string, string, int, int, string> Cases => new()
    {
        {
            "unknown key",
            Lines("mask: psf", "applies-to: S21", "interpolaton: log", "upper:", "  - 1 MHz: -1 dB", "  - 2 MHz: -1 dB"),
            3, 1, "unknown key \"interpolaton\"; expected one of mask, description, applies-to, interpolation, reference, upper, lower"
        },
        {
            "duplicate key",
            Lines("mask: a", "upper:", "  - 1 MHz: -1 dB", "  - 2 MHz: -1 dB", "mask: b"),
            5, 1, "duplicate key \"mask\" (first given at line 1)"
        },
        {
            "name is a list",
            Lines("mask: [a, b]", "upper:", "  - 1 MHz: -1 dB", "  - 2 MHz: -1 dB"),
            1, 7, "expected text for \"mask\", found a list"
        },
        {
            "empty description",
            Lines("mask: a", "description:", "upper:", "  - 1 MHz: -1 dB", "  - 2 MHz: -1 dB"),
            2, 1, "expected text for \"description\", found nothing"
        },
        {
            "upper is text",
            Lines("mask: a", "upper: -25 dB"),
            2, 8, "expected a list of corners under \"upper\", one per line such as \"- 131 MHz: -25 dB\"; found \"-25 dB\""
        },
        {
            "upper is empty",
            Lines("mask: a", "upper:"),
            2, 1, "expected a list of corners under \"upper\""
        },
        {
            "upper is an empty list",
            Lines("mask: a", "upper: []"),
            2, 8, "\"upper\" has no corners"
        },
        {
            "unknown interpolation",
            Lines("mask: a", "interpolation: cubic", "upper:", "  - 1 MHz: -1 dB", "  - 2 MHz: -1 dB"),
            2, 16, "unknown value \"cubic\" for \"interpolation\"; expected one of linear, log"
        },
        {
            "unknown parameter",
            Lines("mask: a", "applies-to: S31", "upper:", "  - 1 MHz: -1 dB", "  - 2 MHz: -1 dB"),
            2, 13, "unknown value \"S31\" for \"applies-to\"; expected one of S11, S21, S12, S22, power"
        },
        {
            "corners out of order",
            Lines("mask: psf", "applies-to: S21", "upper:", "  - 127.5 MHz: -25 dB", "  - 131 MHz: -25 dB",
                "lower:", "  - 136.5 MHz: -4 dB", "  - 138.5 MHz: -4 dB", "  - 131 MHz: -4 dB"),
            9, 5, "corner frequencies must not decrease: 131 MHz after 138.5 MHz"
        },
        {
            "level without unit",
            Lines("mask: a", "applies-to: S21", "upper:", "  - 130 MHz: -25 dB", "  - 131 MHz: -25"),
            5, 14, "\"-25\" has no unit; expected a level in dB such as \"-25 dB\""
        },
        {
            "frequency without unit",
            Lines("mask: a", "applies-to: S21", "upper:", "  - 130 MHz: -25 dB", "  - 131: -25 dB"),
            5, 5, "\"131\" has no unit; expected a frequency such as \"137.5 MHz\""
        },
        {
            "negative frequency",
            Lines("mask: a", "upper:", "  - -1 MHz: -1 dB", "  - 2 MHz: -1 dB"),
            3, 5, "a frequency must not be negative"
        },
        {
            "unknown level unit",
            Lines("mask: a", "upper:", "  - 1 MHz: -30 dBc", "  - 2 MHz: -30 dBc"),
            3, 12, "unknown level unit \"dBc\" in \"-30 dBc\""
        },
        {
            "dBm on an S21 mask",
            Lines("mask: a", "applies-to: S21", "upper:", "  - 130 MHz: -25 dB", "  - 131 MHz: -25 dBm"),
            5, 14, "\"-25 dBm\" is in dBm, but this mask's levels are in dB (set by \"applies-to: S21\")"
        },
        {
            "dB on a power mask",
            Lines("mask: a", "applies-to: power", "upper:", "  - 130 MHz: -25 dB", "  - 131 MHz: -25 dB"),
            4, 14, "\"-25 dB\" is in dB, but this mask's levels are in dBm (set by \"applies-to: power\")"
        },
        {
            "mixed units",
            Lines("mask: a", "upper:", "  - 1 MHz: -25 dB", "  - 2 MHz: -20 dBm"),
            4, 12, "\"-20 dBm\" is in dBm, but this mask's levels are in dB (set by \"-25 dB\" at line 3)"
        },
        {
            "dBm on a relative mask",
            Lines("mask: a", "reference: peak", "lower:", "  - 1 MHz: -3 dBm", "  - 2 MHz: -3 dBm"),
            4, 12, "\"-3 dBm\" is an absolute level, but \"reference: peak\" takes levels in dB from the peak"
        },
        {
            "neither limit",
            Lines("mask: a", "description: nothing to check"),
            1, 1, "the mask \"a\" has no limit; add \"upper:\" or \"lower:\""
        },
        {
            "missing name",
            Lines("upper:", "  - 1 MHz: -1 dB", "  - 2 MHz: -1 dB"),
            1, 1, "missing key \"mask\""
        },
        {
            "single corner",
            Lines("mask: a", "upper:", "  - 131 MHz: -25 dB"),
            3, 5, "only one corner in this section of \"upper\"; a limit needs corners at two or more frequencies to cover a span"
        },
        {
            "single corner before a gap",
            Lines("mask: a", "upper:", "  - 1 MHz: -1 dB", "  - gap", "  - 3 MHz: -1 dB", "  - 4 MHz: -1 dB"),
            3, 5, "only one corner in this section of \"upper\""
        },
        {
            "section of one frequency",
            Lines("mask: a", "upper:", "  - 1 MHz: -1 dB", "  - 1 MHz: -5 dB"),
            4, 5, "this section of \"upper\" covers only 1 MHz"
        },
        {
            "three corners at one frequency",
            Lines("mask: a", "upper:", "  - 1 MHz: -1 dB", "  - 2 MHz: -1 dB", "  - 2 MHz: -5 dB", "  - 2 MHz: -9 dB"),
            6, 5, "a third corner at 2 MHz; a vertical step is exactly two corners at one frequency"
        },
        {
            "gap first",
            Lines("mask: a", "upper:", "  - gap", "  - 1 MHz: -1 dB", "  - 2 MHz: -1 dB"),
            3, 5, "\"upper\" cannot begin with \"gap\""
        },
        {
            "gap last",
            Lines("mask: a", "upper:", "  - 1 MHz: -1 dB", "  - 2 MHz: -1 dB", "  - gap"),
            5, 5, "\"upper\" cannot end with \"gap\""
        },
        {
            "two gaps",
            Lines("mask: a", "upper:", "  - 1 MHz: -1 dB", "  - 2 MHz: -1 dB", "  - gap", "  - gap", "  - 3 MHz: -1 dB", "  - 4 MHz: -1 dB"),
            6, 5, "two gaps in a row"
        },
        {
            "corner without a space after the colon",
            Lines("mask: a", "upper:", "  - 1 MHz:-1 dB", "  - 2 MHz: -1 dB"),
            3, 5, "expected a corner such as \"131 MHz: -25 dB\" (a space after the colon) or \"gap\" in \"upper\"; found \"1 MHz:-1 dB\""
        },
        {
            "corner as a list",
            Lines("mask: a", "upper:", "  - [1 MHz, -1 dB]", "  - 2 MHz: -1 dB"),
            3, 5, "expected a corner such as"
        },
        {
            "corner without a level",
            Lines("mask: a", "applies-to: S21", "upper:", "  - 131 MHz:", "  - 132 MHz: -1 dB"),
            4, 5, "expected a level in dB such as \"-25 dB\" for the corner at 131 MHz; found nothing"
        },
        {
            "two corners in one item",
            Lines("mask: a", "upper:", "  - 1 MHz: -1 dB", "    2 MHz: -1 dB"),
            4, 5, "one corner per list item"
        },
        {
            "zero hertz with log interpolation",
            Lines("mask: a", "interpolation: log", "upper:", "  - 0 Hz: -1 dB", "  - 2 MHz: -1 dB"),
            4, 5, "a corner at 0 Hz cannot be used with \"interpolation: log\""
        },
        {
            "unterminated quote",
            Lines("mask: 'abc", "upper:"),
            1, 7, "not valid YAML"
        },
        {
            "mapping inside a plain value",
            Lines("mask: a: b"),
            1, 8, "not valid YAML"
        },
        {
            "not YAML at all",
            Lines("freq,s21", "127.5e6,-30"),
            1, 1, "expected a mask: a mapping with keys such as \"mask:\", \"upper:\" and \"lower:\"; found \"freq,s21 127.5e6,-30\""
        },
        {
            "a list at the top",
            Lines("- mask: a"),
            1, 1, "expected a mask: a mapping"
        },
        {
            "empty file",
            "",
            1, 1, "the file holds no mask"
        },
        {
            "comments only",
            Lines("# nothing here"),
            1, 1, "the file holds no mask"
        },
        {
            "second document",
            Lines("mask: a", "upper:", "  - 1 MHz: -1 dB", "  - 2 MHz: -1 dB", "---", "mask: b"),
            5, 1, "a second YAML document starts here"
        },
        {
            "alias",
            Lines("mask: &n a", "description: *n", "upper:", "  - 1 MHz: -1 dB", "  - 2 MHz: -1 dB"),
            2, 14, "aliases (*n) are not accepted"
        },
        {
            "key that is a list",
            Lines("? [a, b]", ": c"),
            1, 3, "expected a key"
        },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Parse_MalformedFile_ReportsTheOffendingTokenAndWhatWasExpected(string scenario, string text, int line, int column, string detail)
    {
        var e = Assert.Throws<InputFormatException>(() => MaskFile.Parse(text, Source));

        Assert.True(e.Detail.Contains(detail, StringComparison.Ordinal), $"{scenario}: \"{e.Detail}\" does not contain \"{detail}\"");
        Assert.Equal(new SourceLocation(Source, line, column), e.Location);
    }

    [Fact]
    public void Parse_CornersOutOfOrder_GivesTheWholeOneLineMessage()
    {
        var text = Lines("mask: psf", "applies-to: S21", "upper:", "  - 127.5 MHz: -25 dB", "  - 131 MHz: -25 dB",
            "lower:", "  - 136.5 MHz: -4 dB", "  - 138.5 MHz: -4 dB", "  - 131 MHz: -4 dB");

        var e = Assert.Throws<InputFormatException>(() => MaskFile.Parse(text, Source));

        Assert.Equal("mask.yaml:9:5: corner frequencies must not decrease: 131 MHz after 138.5 MHz", e.Message);
    }

    [Fact]
    public void Load_MalformedFile_NamesThePathAsGiven()
    {
        var path = Path.Combine(Path.GetTempPath(), $"mask-{Guid.NewGuid():N}.yaml");
        File.WriteAllText(path, Lines("mask: a", "interpolaton: log"));
        try
        {
            var e = Assert.Throws<InputFormatException>(() => MaskFile.Load(path));

            Assert.Equal(new SourceLocation(path, 2, 1), e.Location);
        }
        finally
        {
            File.Delete(path);
        }
    }

    private static string Lines(params string[] lines) => string.Join("\n", lines) + "\n";
}
