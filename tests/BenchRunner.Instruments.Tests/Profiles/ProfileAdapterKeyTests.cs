using BenchRunner.Core.Diagnostics;
using BenchRunner.Instruments.Profiles;

namespace BenchRunner.Instruments.Tests.Profiles;

// A key of one adapter's profiles in a profile of the other is refused at the key, saying which
// adapter it belongs to and what to write instead, and is not also reported as unknown.
public class ProfileAdapterKeyTests
{
    private const string Source = "p.yaml";
    private const string RawKeyInScpi = "is a key of adapter: raw profiles, and this profile is adapter: scpi; ";
    private const string ScpiKeyInRaw = "is a key of adapter: scpi profiles, and this profile is adapter: raw; ";

    private static readonly string[] RawSpectrum =
    [
        "profile: s",                       // 1
        "kinds: [spectrum-analyser]",       // 2
        "identity: {model: s}",             // 3
        "spectrum-analyser:",               // 4
        "  setup: span {start} {stop}",     // 5
        "  read: trace",                    // 6
        "  data: {columns: [dbm]}",         // 7
    ];

    public static TheoryData<string, string, int, int, string> Cases => new()
    {
        { "identity in scpi", ScpiProfileText.With("identity: {model: x}"), 4, 1, $"\"identity\" {RawKeyInScpi}a SCPI instrument is identified by its *IDN? reply" },
        { "error-reply in scpi", ScpiProfileText.With("error-reply: '^err (?<code>\\d+)'"), 4, 1, $"\"error-reply\" {RawKeyInScpi}a SCPI instrument's errors are read from its error queue" },
        { "bool-words in scpi", ScpiProfileText.With("bool-words: [on, off]"), 4, 1, $"\"bool-words\" {RawKeyInScpi}SCPI switches are sent as ON and OFF" },
        { "on-connect in scpi", ScpiProfileText.With("on-connect: 'OUTPut:STATe OFF'"), 4, 1, $"\"on-connect\" {RawKeyInScpi}at connection a scpi profile sends *CLS, *IDN?" },
        { "prompt in scpi", ScpiProfileText.With("framing:", "  prompt: '> '"), 5, 3, $"\"prompt\" {RawKeyInScpi}SCPI replies end at the line terminator" },
        { "echo in scpi", ScpiProfileText.With("framing:", "  echo: true"), 5, 3, $"\"echo\" {RawKeyInScpi}SCPI instruments do not echo" },
        { "acknowledgement in scpi", ScpiProfileText.With("framing:", "  acknowledgement: ok"), 5, 3, $"\"acknowledgement\" {RawKeyInScpi}SCPI settings draw no reply" },
        { "settle delay in scpi", ScpiProfileText.With("timing:", "  settle-after-setting: 10 ms"), 5, 3, $"\"settle-after-setting\" {RawKeyInScpi}a SCPI instrument is waited for with *OPC?" },
        { "settle before read in scpi", ScpiProfileText.With("timing:", "  settle-before-read: 10 ms"), 5, 3, $"\"settle-before-read\" {RawKeyInScpi}" },
        { "setup in scpi", ScpiProfileText.With("network-analyser:", "  setup: band {start} {stop} {points}"), 5, 3,
            $"\"setup\" {RawKeyInScpi}a scpi profile gives one command per setting: start, stop, points" },
        { "sweep in scpi", ScpiProfileText.With("network-analyser:", "  sweep: go"), 5, 3, $"\"sweep\" {RawKeyInScpi}a sweep is started with \"scpi: trigger\"" },
        { "data in scpi", ScpiProfileText.With("network-analyser:", "  data: {columns: [re, im]}"), 5, 3, $"\"data\" {RawKeyInScpi}SCPI traces come back in the format of \"scpi: data-format\"" },
        { "averages in scpi", ScpiProfileText.With("network-analyser:", "  averages: avg {averages}"), 5, 3, $"\"averages\" {RawKeyInScpi}a scpi profile sets averaging with average-count and average-state" },
        { "default points in scpi", ScpiProfileText.Of("spectrum-analyser", "spectrum-analyser:", "  default-points: 401"), 5, 3,
            $"\"default-points\" {RawKeyInScpi}a scpi profile asks the instrument for its point count with \"points-query\"" },
        { "spectrum setup in scpi", ScpiProfileText.Of("spectrum-analyser", "spectrum-analyser:", "  setup: span {start} {stop}"), 5, 3,
            $"\"setup\" {RawKeyInScpi}a scpi profile gives one command per setting: start, stop, resolution-bandwidth" },
        { "scpi section in raw", ProfileText.With("scpi:", "  trigger: INIT"), 9, 1, $"\"scpi\" {ScpiKeyInRaw}write \"adapter: scpi\" for a SCPI instrument" },
        { "start in raw", ProfileText.With("  start: SENS:FREQ:STAR {hz}"), 9, 3, $"\"start\" {ScpiKeyInRaw}a raw profile sends the sweep with its \"setup\" commands" },
        { "average count in raw", ProfileText.With("  average-count: AVER:COUN {count}"), 9, 3, $"\"average-count\" {ScpiKeyInRaw}a raw profile sets averaging with \"averages\"" },
        { "frequency list in raw", ProfileText.With("  frequency-list: 'FREQ:DATA?'"), 9, 3, $"\"frequency-list\" {ScpiKeyInRaw}a raw profile reads the frequencies from a data column" },
        { "resolution bandwidth in raw", ProfileText.Lines([.. RawSpectrum, "  resolution-bandwidth: BAND {hz}"]), 8, 3,
            $"\"resolution-bandwidth\" {ScpiKeyInRaw}a raw profile sends span and settings with its \"setup\" commands" },
        { "points query in raw", ProfileText.Lines([.. RawSpectrum, "  points-query: 'POIN?'"]), 8, 3, $"\"points-query\" {ScpiKeyInRaw}a raw profile states the point count with \"default-points\"" },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Parse_KeyOfTheOtherAdapter_IsRefusedAtTheKey(string name, string text, int line, int column, string expected)
    {
        var e = Assert.Throws<InputFormatException>(() => DriverProfile.Parse(text, Source));

        var problem = e.Problems.FirstOrDefault(p => p.Detail.Contains(expected, StringComparison.Ordinal));
        Assert.True(problem.Detail is not null, $"{name}: no problem says \"{expected}\"; got:\n{e.Message}");
        Assert.Equal((Source, line, column), (problem.Location.File, problem.Location.Line, problem.Location.Column));
        Assert.DoesNotContain(e.Problems, p => p.Detail.StartsWith("unknown key", StringComparison.Ordinal));
    }

    [Fact]
    public void Parse_ScpiProfileWithARawDialect_ReportsEachRawKeyOnce()
    {
        // A raw profile turned into a scpi one by changing its adapter alone.
        var text = ProfileText.Lines(
            "profile: t",                                      // 1
            "adapter: scpi",                                   // 2
            "kinds: [network-analyser]",                       // 3
            "framing: {prompt: 'br> ', echo: true}",           // 4
            "identity: {query: who, reply: '(?<model>.*)'}",   // 5
            "network-analyser:",                               // 6
            "  setup: band {start:hz} {stop:hz} {points}",     // 7
            "  sweep: go",                                     // 8
            "  read: {S21: 'TRACe:DATA? S21'}",                // 9
            "  data:",                                         // 10
            "    columns: [freq-hz, re, im]");                 // 11

        var e = Assert.Throws<InputFormatException>(() => DriverProfile.Parse(text, Source));

        Assert.Equal(
            [(4, "prompt"), (4, "echo"), (5, "identity"), (7, "setup"), (8, "sweep"), (10, "data")],
            e.Problems.Select(p => (p.Location.Line, p.Detail.Split('"')[1])));
        Assert.All(e.Problems, p => Assert.Contains(RawKeyInScpi, p.Detail));
    }

    [Fact]
    public void Parse_RawProfileWithoutAdapter_RefusesScpiKeys()
    {
        var text = ProfileText.With("  points: SENSe:SWEep:POINts {points}", "scpi: {data-format: ascii}");

        var e = Assert.Throws<InputFormatException>(() => DriverProfile.Parse(text, Source));

        Assert.Equal([(9, 3), (10, 1)], e.Problems.Select(p => (p.Location.Line, p.Location.Column)));
        Assert.All(e.Problems, p => Assert.Contains(ScpiKeyInRaw, p.Detail));
    }
}
