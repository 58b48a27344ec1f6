using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Yaml;
using BenchRunner.Instruments.Adapters;
using static BenchRunner.Instruments.Profiles.DriverProfileKeys;
using static BenchRunner.Instruments.Profiles.ScpiProfileKeys;

namespace BenchRunner.Instruments.Profiles;

/// <summary>
/// The keys of one adapter's profiles written into a profile of the other adapter: each is
/// reported with what to write instead, rather than as merely unknown, and then ignored.
/// </summary>
internal static class ForeignKeys
{
    private const string SweepRaw = "a raw profile sends the sweep with its \"setup\" commands ({start}, {stop}, {points})";
    private const string SpectrumRaw = "a raw profile sends span and settings with its \"setup\" commands ({start}, {stop}, {rbw}, {attenuation}, {reference}, {points})";
    private const string FrequencyColumn = "a raw profile reads the frequencies from a data column such as freq-hz";
    private const string TriggerHint = "a sweep is started with \"scpi: trigger\" and waited for with *OPC?";

    public static readonly IReadOnlyDictionary<string, string> RawInScpiTop = new Dictionary<string, string>
    {
        [Identity] = "a SCPI instrument is identified by its *IDN? reply",
        [ErrorReply] = "a SCPI instrument's errors are read from its error queue (\"scpi: drain-errors\", \"scpi: error-query\")",
        [BoolWordsKey] = "SCPI switches are sent as ON and OFF",
        [OnConnect] = "at connection a scpi profile sends *CLS, *IDN?, the data format and byte order, and *RST only with \"scpi: reset-on-connect\"",
    };

    public static readonly IReadOnlyDictionary<string, string> RawInScpiFraming = new Dictionary<string, string>
    {
        [Prompt] = "SCPI replies end at the line terminator, with no prompt",
        [Echo] = "SCPI instruments do not echo, and the echo of a setting, which draws no reply, would be taken for the next reply",
        [Acknowledgement] = "SCPI settings draw no reply; errors are read from the error queue",
    };

    public static readonly IReadOnlyDictionary<string, string> RawInScpiTiming = new Dictionary<string, string>
    {
        [SettleAfterSetting] = "a SCPI instrument is waited for with *OPC? (see \"sweep-timeout\"), not for a fixed time",
        [SettleBeforeRead] = "a SCPI instrument is waited for with *OPC? (see \"sweep-timeout\"), not for a fixed time",
    };

    public static readonly IReadOnlyDictionary<string, string> RawInScpiNetwork = new Dictionary<string, string>
    {
        [Setup] = "a scpi profile gives one command per setting: start, stop, points",
        [Averages] = "a scpi profile sets averaging with average-count and average-state",
        [Sweep] = TriggerHint,
        [Data] = "SCPI traces come back in the format of \"scpi: data-format\", as (real, imaginary) pairs",
    };

    public static readonly IReadOnlyDictionary<string, string> RawInScpiSpectrum = new Dictionary<string, string>
    {
        [Setup] = "a scpi profile gives one command per setting: start, stop, resolution-bandwidth, input-attenuation, reference-level, points",
        [Sweep] = TriggerHint,
        [Data] = "SCPI traces come back in the format of \"scpi: data-format\", one level in dBm per point",
        [DefaultPoints] = "a scpi profile asks the instrument for its point count with \"points-query\"",
    };

    public static readonly IReadOnlyDictionary<string, string> ScpiInRawTop = new Dictionary<string, string>
    {
        [ScpiProfileKeys.Scpi] = "write \"adapter: scpi\" for a SCPI instrument; a raw profile describes its dialect with \"framing\", \"identity\" and its sections",
    };

    public static readonly IReadOnlyDictionary<string, string> ScpiInRawNetwork = new Dictionary<string, string>
    {
        [Start] = SweepRaw,
        [Stop] = SweepRaw,
        [Points] = SweepRaw,
        [AverageCount] = "a raw profile sets averaging with \"averages\" ({averages})",
        [AverageState] = "a raw profile sets averaging with \"averages\" ({averages})",
        [FrequencyList] = FrequencyColumn,
    };

    public static readonly IReadOnlyDictionary<string, string> ScpiInRawSpectrum = new Dictionary<string, string>
    {
        [Start] = SpectrumRaw,
        [Stop] = SpectrumRaw,
        [Points] = SpectrumRaw,
        [ResolutionBandwidth] = SpectrumRaw,
        [InputAttenuation] = SpectrumRaw,
        [ReferenceLevel] = SpectrumRaw,
        [PointsQuery] = "a raw profile states the point count with \"default-points\"",
        [FrequencyList] = FrequencyColumn,
    };

    public static readonly IReadOnlyDictionary<string, string> Nothing = new Dictionary<string, string>();

    /// <summary>
    /// Opens <paramref name="item"/> like <see cref="StrictMap.Open"/>, after reporting and dropping
    /// every key of <paramref name="foreign"/>: the keys of the other adapter, each with its hint.
    /// </summary>
    public static StrictMap? Open(YamlItem item, string context, IReadOnlyList<string> keys, AdapterKind adapter,
        IReadOnlyDictionary<string, string> foreign, YamlProblems problems, SourceLocation? at = null)
    {
        if (item is YamlMap map && foreign.Count > 0)
        {
            var kept = new List<KeyValuePair<YamlText, YamlItem>>();
            foreach (var entry in map.Entries)
            {
                if (foreign.TryGetValue(entry.Key.Value, out var hint))
                {
                    problems.Add(entry.Key, Message(entry.Key.Value, adapter, hint));
                }
                else
                {
                    kept.Add(entry);
                }
            }

            item = new YamlMap(map.Location, kept);
        }

        return StrictMap.Open(item, context, keys, problems, at);
    }

    /// <summary>Opens the value of <paramref name="key"/> like <see cref="StrictMap.Mapping"/>, screening out <paramref name="foreign"/> keys.</summary>
    public static StrictMap? Mapping(StrictMap parent, string key, IReadOnlyList<string> keys, AdapterKind adapter,
        IReadOnlyDictionary<string, string> foreign, string? missingHint = null)
    {
        var value = missingHint is null ? parent.Get(key) : parent.Require(key, missingHint);
        return value is null ? null : Open(value, $"\"{key}\"", keys, adapter, foreign, parent.Problems, parent.Key(key)!.Location);
    }

    private static string Message(string key, AdapterKind adapter, string hint)
    {
        var mine = AdapterKindWords.InProfile(adapter);
        var other = AdapterKindWords.InProfile(adapter == AdapterKind.Scpi ? AdapterKind.Raw : AdapterKind.Scpi);
        return $"\"{key}\" is a key of adapter: {other} profiles, and this profile is adapter: {mine}; {hint}";
    }
}
