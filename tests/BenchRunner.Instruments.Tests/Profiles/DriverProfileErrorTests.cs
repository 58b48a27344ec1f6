using BenchRunner.Core.Diagnostics;
using BenchRunner.Instruments.Profiles;
using static BenchRunner.Instruments.Tests.Profiles.ProfileText;

namespace BenchRunner.Instruments.Tests.Profiles;

// Every malformed profile must give an InputFormatException at the offending token
// (1-based line and column) saying what was expected.
public class DriverProfileErrorTests
{
    private const string Source = "p.yaml";

    public static TheoryData<string, string, int, int, string> Cases => new()
    {
        { "empty file", "", 1, 1, "the file holds no profile" },
        { "not a mapping", "- a\n- b\n", 1, 1, "expected the profile to be a mapping with keys such as \"profile:\"" },
        { "missing name", Replace(1, "description: x"), 1, 1, "missing key \"profile\" in the profile; every profile needs a name" },
        { "unknown key", With("framng:", "  echo: true"), 9, 1, "unknown key \"framng\" in the profile; expected one of profile, description, adapter, kinds" },
        { "duplicate key", With("profile: u"), 9, 1, "duplicate key \"profile\" (first given at line 1)" },
        { "unknown kind", Replace(2, "kinds: [network]"), 2, 9, "unknown value \"network\" for \"kinds\"; expected one of network-analyser, spectrum-analyser, signal-generator" },
        { "kind twice", Replace(2, "kinds: [network-analyser, network-analyser]"), 2, 27, "\"network-analyser\" is listed twice in \"kinds\"" },
        { "kind without section", Replace(2, "kinds: [network-analyser, signal-generator]"), 2, 27, "\"kinds\" lists signal-generator, but the profile has no \"signal-generator:\" section" },
        { "section without kind", Replace(2, "kinds: [signal-generator]"), 4, 1, "the profile has a \"network-analyser:\" section, but \"kinds\" does not list network-analyser" },
        { "unknown adapter", With("adapter: serial"), 9, 10, "unknown value \"serial\" for \"adapter\"; expected raw (a line dialect described by the profile) or scpi" },
        { "unknown placeholder", Replace(5, "  setup: band {strt:hz} {stop:hz} {points}"), 5, 16, "unknown placeholder \"strt\" in \"setup\"; expected one of start, stop, centre, span, points" },
        { "unknown placeholder type", Replace(5, "  setup: band {start:hx} {stop:hz} {points}"), 5, 22, "unknown placeholder type \"hx\" in \"{start:hx}\"; expected one of hz, khz, mhz, ghz, dbm, db, int, bool" },
        { "placeholder type of another kind", Replace(5, "  setup: band {start:hz} {stop:hz} {points:hz}"), 5, 44, "\"{points:hz}\": points is a count, which is written as int, not hz" },
        { "unclosed placeholder", Replace(5, "  setup: band {start:hz} {stop:hz} {points"), 5, 36, "unclosed \"{\" in \"setup\"" },
        { "lone closing brace", Replace(5, "  setup: band {start:hz} {stop:hz} {points} }"), 5, 45, "a lone \"}\" in \"setup\"" },
        { "quoted template", Replace(5, "  setup: \"band {start:hz} {stop:khzz} {points}\""), 5, 33, "unknown placeholder type \"khzz\"" },
        { "placeholder where none are taken", With("on-connect: reset {start}"), 9, 20, "\"on-connect\" takes no placeholders, found \"{start}\"" },
        { "control character in a command", Replace(5, "  setup: \"band {start} {stop}\\t{points}\""), 5, 30, "\"setup\" contains the control character \\x09" },
        { "setup without points", Replace(5, "  setup: band {start:hz} {stop:hz}"), 5, 3, "the \"setup\" commands never send the number of points; use {points}" },
        { "setup without frequencies", Replace(5, "  setup: band {start:hz} {points}"), 5, 3, "the \"setup\" commands never send the frequencies; use {start} and {stop}, or {centre} and {span}" },
        { "unknown parameter", Replace(6, "  read: {S31: data s31}"), 6, 10, "unknown key \"S31\" in \"read\"; expected one of S11, S21, S12, S22" },
        { "missing data", Lines([.. MinimalVna[..6], "  sweep: go"]), 4, 1, "missing key \"data\" in \"network-analyser\"" },
        { "incomplete value columns", Replace(8, "    columns: [freq-hz, re]"), 8, 14, "the columns give no complete value; expected a pair: re and im, db and deg, or mag and deg" },
        { "mixed value columns", Replace(8, "    columns: [re, im, deg]"), 8, 14, "the columns mix two ways of writing a value" },
        { "power column for S-parameters", Replace(8, "    columns: [freq-hz, dbm]"), 8, 24, "a network analyser's data holds S-parameters; \"dbm\" is for a spectrum analyser's power" },
        { "unknown column", Replace(8, "    columns: [freq-hz, re, imag]"), 8, 28, "unknown value \"imag\" for \"columns\"; expected one of freq-hz, freq-khz" },
        { "column twice", Replace(8, "    columns: [freq-hz, re, im, re]"), 8, 32, "\"re\" is given twice in \"columns\"" },
        { "zero scale", WithData("columns: [freq-hz, {value: re, scale: 0}, im]"), 8, 43, "\"scale\" must not be 0" },
        { "unknown column key", WithData("columns: [freq-hz, {value: re, factor: 2}, im]"), 8, 36, "unknown key \"factor\" in a column; expected one of value, scale, offset" },
        { "end at a prompt without a prompt", WithData("columns: [freq-hz, re, im]", "end: prompt"), 9, 10, "\"end: prompt\" needs a prompt" },
        { "end line without its text", WithData("columns: [freq-hz, re, im]", "end: line"), 9, 10, "\"end: line\" needs \"end-line\"" },
        { "counted points on one line", WithData("layout: one-line", "columns: [freq-hz, re, im]", "end: points"), 10, 10, "\"end: points\" counts one line per point, but \"layout: one-line\"" },
        { "unknown end", WithData("columns: [freq-hz, re, im]", "end: eof"), 9, 10, "unknown value \"eof\" for \"end\"; expected one of prompt, points, line" },
        { "tolerance without frequency column", WithData("columns: [re, im]", "frequency-tolerance: 1 kHz"), 9, 5, "\"frequency-tolerance\" needs a frequency column" },
        { "negative header lines", WithData("columns: [re, im]", "header-lines: -1"), 9, 19, "\"header-lines\" must be from 0 to 1000, found -1" },
        { "bad ignore pattern", WithData("columns: [re, im]", "ignore-lines: '^(#'"), 9, 22, "not a valid pattern for \"ignore-lines\": insufficient closing parentheses" },
        { "duration without unit", With("timing:", "  command-timeout: 2"), 10, 20, "\"2\" has no unit; expected a duration" },
        { "zero timeout", With("timing:", "  sweep-timeout: 0 s"), 10, 18, "\"sweep-timeout\" must be longer than 0 s" },
        { "unknown timing key", With("timing:", "  settle: 1 s"), 10, 3, "unknown key \"settle\" in \"timing\"; expected one of command-timeout, sweep-timeout, settle-after-setting, settle-before-read" },
        { "echo not a boolean", With("framing:", "  echo: yes"), 10, 9, "expected true or false for \"echo\", found \"yes\"" },
        { "unknown terminator", With("framing:", "  command-end: lfcr"), 10, 16, "unknown terminator \"lfcr\" for \"command-end\"; expected lf, cr or crlf" },
        { "message size too small", With("framing:", "  max-message-bytes: 100"), 10, 22, "\"max-message-bytes\" must be from 1024 to 268435456, found 100" },
        { "echo without prompt or acknowledgement", With("framing:", "  echo: true"), 10, 3, "a device that echoes but has no prompt must acknowledge each setting" },
        { "framing not a mapping", With("framing: lf"), 9, 10, "expected \"framing\" to be a mapping with keys such as \"command-end:\"" },
        { "range with one end", With("limits:", "  lowest-frequency: 1 MHz"), 10, 3, "\"lowest-frequency\" needs \"highest-frequency\" as well" },
        { "frequency without unit", With("limits:", "  lowest-frequency: 100", "  highest-frequency: 1 GHz"), 10, 21, "\"100\" has no unit; expected a frequency such as \"137.5 MHz\"" },
        { "range upside down", With("limits:", "  lowest-frequency: 1 GHz", "  highest-frequency: 1 MHz"), 11, 22, "\"highest-frequency\" (1 MHz) must be above \"lowest-frequency\" (1 GHz)" },
        { "level without unit", With("limits:", "  max-input-level: 10"), 10, 20, "\"10\" has no unit; expected a level such as \"-20 dBm\"" },
        { "identity missing", Replace(3, "description: x"), 1, 1, "missing key \"identity\" in the profile" },
        { "identity empty", Replace(3, "identity: {}"), 3, 1, "\"identity\" gives no identity" },
        { "query without reply", Replace(3, "identity: {query: who}"), 3, 12, "\"query\" needs \"reply\"" },
        { "reply without query", Replace(3, "identity: {reply: '(?<model>.*)'}"), 3, 12, "\"reply\" needs \"query\"" },
        { "reply pattern invalid", Replace(3, "identity: {query: who, reply: '(?<model>\\S+'}"), 3, 43, "not a valid pattern for \"reply\"" },
        { "reply pattern with an unknown group", Replace(3, "identity: {query: who, reply: '(?<vendor>\\S+)'}"), 3, 31, "unknown group \"vendor\" in the pattern for \"reply\"; expected maker, model, serial, firmware" },
        { "reply pattern without a group", Replace(3, "identity: {query: who, reply: '\\S+'}"), 3, 31, "the pattern for \"reply\" has no group for the identity" },
        { "field fixed and matched", Replace(3, "identity: {query: who, reply: '(?<model>\\S+)', model: x}"), 3, 48, "\"model\" is given here and by the group (?<model>...) of \"reply\"; give it once" },
        { "error pattern with an unknown group", With("error-reply: '^err (?<number>\\d+)'"), 9, 14, "unknown group \"number\" in the pattern for \"error-reply\"; expected code, text" },
        { "three bool words", With("bool-words: [on, off, maybe]"), 9, 13, "\"bool-words\" takes two words" },
        {
            "generator output without its value",
            Lines("profile: g", "kinds: [signal-generator]", "identity: {model: g}", "signal-generator:", "  frequency: f {frequency}", "  level: l {level}", "  output: rf on"),
            7, 11, "\"output\" must send the value it sets; use {output}"
        },
        {
            "generator missing level",
            Lines("profile: g", "kinds: [signal-generator]", "identity: {model: g}", "signal-generator:", "  frequency: f {frequency}", "  output: rf {output}"),
            4, 1, "missing key \"level\" in \"signal-generator\"; the command that sets it"
        },
        {
            "spectrum points without a default",
            Lines("profile: s", "kinds: [spectrum-analyser]", "identity: {model: s}", "spectrum-analyser:", "  setup: span {start} {stop} {points}", "  read: trace",
                "  data: {columns: [dbm]}"),
            5, 3, "the \"setup\" commands send {points}; add \"default-points\""
        },
        {
            "spectrum data with S-parameters",
            Lines("profile: s", "kinds: [spectrum-analyser]", "identity: {model: s}", "spectrum-analyser:", "  setup: span {start} {stop}", "  read: trace",
                "  data: {columns: [re, im]}"),
            7, 20, "a spectrum analyser's data holds power; \"re\" is for S-parameters; expected dbm"
        },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Parse_MalformedProfile_ReportsLineColumnAndExpectation(string name, string text, int line, int column, string expected)
    {
        var e = Assert.Throws<InputFormatException>(() => DriverProfile.Parse(text, Source));

        var problem = e.Problems.FirstOrDefault(p => p.Detail.Contains(expected, StringComparison.Ordinal));
        Assert.True(problem.Detail is not null, $"{name}: no problem says \"{expected}\"; got:\n{e.Message}");
        Assert.Equal((Source, line, column), (problem.Location.File, problem.Location.Line, problem.Location.Column));
    }

    [Fact]
    public void Parse_SeveralProblems_ReportsThemAllInFileOrder()
    {
        var text = Lines(
            "profile: t",
            "kinds: [network-analyser]",
            "identity: {maker: workshop, model: test}",
            "timing: {command-timeout: fast}",
            "network-analyser:",
            "  setup: band {strt} {stop} {points}",
            "  read: {S21: data s21}",
            "  data:",
            "    columns: [freq-hz, re, imag]");

        var e = Assert.Throws<InputFormatException>(() => DriverProfile.Parse(text, Source));

        Assert.Equal([4, 6, 9], e.Problems.Select(p => p.Location.Line));
        Assert.Equal(3, e.Message.Split('\n').Length);
        Assert.StartsWith("p.yaml:4:27: \"fast\" does not start with a number", e.Message);
        Assert.Equal(e.Problems[0].Location, e.Location);
    }

    [Fact]
    public void Parse_MinimalProfile_IsValid()
    {
        var profile = DriverProfile.Parse(Lines(MinimalVna), Source);

        Assert.Equal(ReplyEnd.PointCount, profile.NetworkAnalyser!.Data.End);
        Assert.Equal("workshop,test,0,0", profile.Identity!.Fixed.ToString());
    }
}
