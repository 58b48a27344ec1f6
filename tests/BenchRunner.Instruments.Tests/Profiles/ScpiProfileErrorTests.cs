using BenchRunner.Core.Diagnostics;
using BenchRunner.Instruments.Profiles;
using static BenchRunner.Instruments.Tests.Profiles.ScpiProfileText;

namespace BenchRunner.Instruments.Tests.Profiles;

// Every malformed scpi profile must give an InputFormatException at the offending key or value
// (1-based line and column) saying what was expected. The command checks are those of
// ScpiCommandSet.Problems(), each reported where the command was written.
public class ScpiProfileErrorTests
{
    private const string Source = "p.yaml";

    public static TheoryData<string, string, int, int, string> Cases => new()
    {
        { "unknown placeholder", With("network-analyser:", "  start: SENSe:FREQuency:STARt {mhz}"), 5, 10,
            "\"start\" in \"network-analyser\": \"SENSe:FREQuency:STARt {mhz}\" has an unknown placeholder {mhz}; known: {hz}, {db}, {dbm}" },
        { "placeholder of another kind", With("network-analyser:", "  points: SENSe:SWEep:POINts {hz}"), 5, 11,
            "\"points\" in \"network-analyser\": \"SENSe:SWEep:POINts {hz}\" needs the placeholder {points}, not {hz}" },
        { "missing placeholder", With("network-analyser:", "  stop: SENSe:FREQuency:STOP"), 5, 9,
            "\"stop\" in \"network-analyser\": \"SENSe:FREQuency:STOP\" needs the placeholder {hz}" },
        { "two placeholders", With("network-analyser:", "  start: SENS:FREQ {hz} {hz}"), 5, 10, "has more than one placeholder; a command takes one value" },
        { "unclosed placeholder", With("network-analyser:", "  start: 'SENS:FREQ:STAR {hz'"), 5, 10, "\"SENS:FREQ:STAR {hz\" has a '{' with no '}' after it" },
        { "lone closing brace", With("network-analyser:", "  stop: SENS:FREQ:STOP hz}"), 5, 9, "\"SENS:FREQ:STOP hz}\" has a '}' with no '{' before it" },
        { "control character", With("network-analyser:", "  start: \"SENS:FREQ:STAR\\t{hz}\""), 5, 10, "holds a line break or control character; a template must be one command on one line" },
        { "trace query without a question mark", With("network-analyser:", "  read:", "    S21: TRACe:DATA S21"), 6, 10,
            "\"read: S21\" in \"network-analyser\": \"TRACe:DATA S21\" must be a query (with '?'), as a reply is read after it" },
        { "setting written as a query", With("network-analyser:", "  if-bandwidth: 'SENSe:BANDwidth? {hz}'"), 5, 17,
            "\"if-bandwidth\" in \"network-analyser\": \"SENSe:BANDwidth? {hz}\" must not be a query (no '?'), as no reply is read after it" },
        { "required command left out", With("network-analyser:", "  start: none"), 5, 10,
            "\"start\" in \"network-analyser\" is required; only an optional command may be none" },
        { "every trace query left out", With("network-analyser:", "  read: {S11: none, S21: none, S12: none, S22: none}"), 5, 9,
            "\"read\" in \"network-analyser\": at least one S-parameter query is required" },
        { "unknown parameter", With("network-analyser:", "  read: {S31: 'TRACe:DATA? S31'}"), 5, 10, "unknown key \"S31\" in \"read\"; expected one of S11, S21, S12, S22" },
        { "frequency list without a question mark", With("network-analyser:", "  frequency-list: SENSe:FREQuency:DATA"), 5, 19,
            "\"frequency-list\" in \"network-analyser\": \"SENSe:FREQuency:DATA\" must be a query" },
        { "empty command", With("network-analyser:", "  stop:"), 5, 3, "expected a command, or none to leave it out, for \"stop\" in \"network-analyser\"; found nothing" },
        { "command given as a list", With("network-analyser:", "  stop: [a, b]"), 5, 9, "expected a command, or none to leave it out, for \"stop\" in \"network-analyser\"; found a list" },
        { "section not a mapping", With("network-analyser: defaults"), 4, 19, "expected \"network-analyser\" to be a mapping with keys such as \"start:\", \"stop:\", \"points:\"" },
        { "unknown key in a section", With("network-analyser:", "  start-frequency: 'X {hz}'"), 5, 3,
            "unknown key \"start-frequency\" in \"network-analyser\"; expected one of start, stop, points, if-bandwidth, average-count, average-state, read, frequency-list" },
        { "trigger left out with an analyser", With("scpi:", "  trigger: none"), 5, 12, "\"trigger\" in \"scpi\" is required; only an optional command may be none" },
        { "trigger with a value", With("scpi:", "  trigger: INITiate {count}"), 5, 12, "\"trigger\" in \"scpi\": \"INITiate {count}\" takes no value, but has the placeholder {count}" },
        { "unknown data format", With("scpi:", "  data-format: real16"), 5, 16, "unknown value \"real16\" for \"data-format\"; expected one of ascii, real32, real64" },
        { "unknown byte order", With("scpi:", "  byte-order: little"), 5, 15, "unknown value \"little\" for \"byte-order\"; expected one of normal, swapped" },
        { "format command with the wrong placeholder", With("scpi:", "  data-format-command: FORMat:DATA {order}"), 5, 24,
            "\"data-format-command\" in \"scpi\": \"FORMat:DATA {order}\" needs the placeholder {format}, not {order}" },
        { "byte order command without its placeholder", With("scpi:", "  byte-order-command: FORMat:BORDer SWAPped"), 5, 23,
            "\"byte-order-command\" in \"scpi\": \"FORMat:BORDer SWAPped\" needs the placeholder {order}" },
        { "error query without a question mark", With("scpi:", "  error-query: SYSTem:ERRor"), 5, 16, "\"error-query\" in \"scpi\": \"SYSTem:ERRor\" must be a query" },
        { "error query left out", With("scpi:", "  error-query: none"), 5, 16, "\"error-query\" in \"scpi\" is required" },
        { "too few error reads", With("scpi:", "  max-error-reads: 0"), 5, 20, "\"max-error-reads\" must be from 1 to 1000, found 0" },
        { "drain-errors not a boolean", With("scpi:", "  drain-errors: often"), 5, 17, "expected true or false for \"drain-errors\", found \"often\"" },
        { "reset-on-connect not a boolean", With("scpi:", "  reset-on-connect: yes"), 5, 21, "expected true or false for \"reset-on-connect\", found \"yes\"" },
        { "unknown scpi key", With("scpi:", "  trigger-command: INIT"), 5, 3,
            "unknown key \"trigger-command\" in \"scpi\"; expected one of trigger, data-format, byte-order, data-format-command, byte-order-command, drain-errors, error-query, max-error-reads, reset-on-connect" },
        { "timeout over an hour", With("timing:", "  sweep-timeout: 2 h"), 5, 18, "\"sweep-timeout\" must be at most 1 h" },
        { "zero timeout", With("timing:", "  command-timeout: 0 s"), 5, 20, "\"command-timeout\" must be longer than 0 s" },
        { "duration without unit", With("timing:", "  command-timeout: 5"), 5, 20, "\"5\" has no unit; expected a duration" },
        { "empty command end", With("framing:", "  command-end: \"\""), 5, 16, "\"command-end\" must not be empty" },
        { "generator level with a frequency", Of("signal-generator", "signal-generator:", "  level: SOURce:POWer {hz}"), 5, 10,
            "\"level\" in \"signal-generator\": \"SOURce:POWer {hz}\" needs the placeholder {dbm}, not {hz}" },
        { "generator output without its switch", Of("signal-generator", "signal-generator:", "  output: OUTPut:STATe ON"), 5, 11,
            "\"output\" in \"signal-generator\": \"OUTPut:STATe ON\" needs the placeholder {state}" },
        { "spectrum trace query without a question mark", Of("spectrum-analyser", "spectrum-analyser:", "  read: TRACe:DATA POWer"), 5, 9,
            "\"read\" in \"spectrum-analyser\": \"TRACe:DATA POWer\" must be a query" },
        { "spectrum points query without a question mark", Of("spectrum-analyser", "spectrum-analyser:", "  points-query: SENSe:SWEep:POINts"), 5, 17,
            "\"points-query\" in \"spectrum-analyser\": \"SENSe:SWEep:POINts\" must be a query" },
        { "spectrum attenuation with a level", Of("spectrum-analyser", "spectrum-analyser:", "  input-attenuation: INPut:ATTenuation {dbm}"), 5, 22,
            "\"input-attenuation\" in \"spectrum-analyser\": \"INPut:ATTenuation {dbm}\" needs the placeholder {db}, not {dbm}" },
        { "section without its kind", With("signal-generator:", "  level: POW {dbm}"), 4, 1,
            "the profile has a \"signal-generator:\" section, but \"kinds\" does not list signal-generator" },
        { "kinds missing", ProfileText.Lines("profile: t", "adapter: scpi"), 1, 1, "missing key \"kinds\" in the profile" },
        { "unknown adapter", ProfileText.Lines("profile: t", "adapter: gpib", "kinds: [network-analyser]"), 2, 10,
            "unknown value \"gpib\" for \"adapter\"; expected raw (a line dialect described by the profile) or scpi (an IEEE 488.2 / SCPI instrument)" },
        { "adapter not text", ProfileText.Lines("profile: t", "adapter: [scpi]", "kinds: [network-analyser]"), 2, 10, "expected text for \"adapter\", found a list" },
        { "unknown top-level key", With("limit:", "  max-input-level: 0 dBm"), 4, 1,
            "unknown key \"limit\" in the profile; expected one of profile, description, adapter, kinds, framing, timing, limits, scpi, network-analyser, spectrum-analyser, signal-generator" },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Parse_MalformedScpiProfile_ReportsLineColumnAndExpectation(string name, string text, int line, int column, string expected)
    {
        var e = Assert.Throws<InputFormatException>(() => DriverProfile.Parse(text, Source));

        var problem = e.Problems.FirstOrDefault(p => p.Detail.Contains(expected, StringComparison.Ordinal));
        Assert.True(problem.Detail is not null, $"{name}: no problem says \"{expected}\"; got:\n{e.Message}");
        Assert.Equal((Source, line, column), (problem.Location.File, problem.Location.Line, problem.Location.Column));
    }

    [Fact]
    public void Parse_SeveralCommandProblems_ReportsThemAllInFileOrder()
    {
        var text = With(
            "scpi:",                                       // 4
            "  data-format: real16",                       // 5
            "network-analyser:",                           // 6
            "  start: 'SENS:FREQ:STAR {mhz}'",             // 7
            "  points: none",                              // 8
            "  read:",                                     // 9
            "    S21: TRACe:DATA S21");                    // 10

        var e = Assert.Throws<InputFormatException>(() => DriverProfile.Parse(text, Source));

        Assert.Equal([5, 7, 8, 10], e.Problems.Select(p => p.Location.Line));
        Assert.Equal(4, e.Message.Split('\n').Length);
        Assert.StartsWith("p.yaml:5:16: unknown value \"real16\"", e.Message);
        Assert.Contains("p.yaml:10:10: \"read: S21\" in \"network-analyser\": \"TRACe:DATA S21\" must be a query", e.Message);
    }

    [Fact]
    public void Parse_ProblemInADisabledSection_IsReportedOnlyAsTheMissingKind()
    {
        // A section whose kind is not listed is refused as such; its commands are not checked.
        var text = With("spectrum-analyser:", "  read: TRACe:DATA POWer");

        var e = Assert.Throws<InputFormatException>(() => DriverProfile.Parse(text, Source));

        var problem = Assert.Single(e.Problems);
        Assert.Contains("does not list spectrum-analyser", problem.Detail);
    }
}
