using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Yaml;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Framing;
using static BenchRunner.Instruments.Profiles.DriverProfileKeys;

namespace BenchRunner.Instruments.Profiles;

/// <summary>
/// Turns the YAML tree of a profile into a <see cref="DriverProfile"/>, collecting every problem
/// with its location and throwing them together at the end.
/// </summary>
internal sealed class DriverProfileReader
{
    private readonly ProfileReadContext _context;
    private readonly YamlProblems _problems;

    private DriverProfileReader(string source)
    {
        _problems = new YamlProblems(source);
        _context = new ProfileReadContext(_problems);
    }

    public static DriverProfile Read(string text, string source)
    {
        var root = YamlTreeReader.Read(text, source)
            ?? throw new InputFormatException(new SourceLocation(source, 1, 1),
                "the file holds no profile; expected keys such as \"profile:\", \"kinds:\" and \"identity:\"");
        var reader = new DriverProfileReader(source);
        var profile = reader.ReadProfile(root);
        reader._problems.ThrowIfAny();
        return profile ?? throw new InvalidOperationException("A profile with no problems was not built.");
    }

    private DriverProfile? ReadProfile(YamlItem root)
    {
        var map = StrictMap.Open(root, "the profile", Top, _problems);
        if (map is null)
        {
            return null;
        }

        var name = OneLine(map, Profile, "every profile needs a name, e.g. \"profile: bench-vna\"");
        var description = map.Text(Description)?.Value.Trim();
        var adapter = ReadAdapter(map);
        var kinds = ReadKinds(map);
        _context.Words = ReadBoolWords(map);
        var (framing, acknowledgement) = ReadFraming(map);
        _context.Prompt = framing.Prompt;
        var timing = ReadTiming(map);
        var limits = ReadLimits(map);
        var identity = ReadIdentity(map);
        var errorReply = map.Text(ErrorReply) is { } e && PatternReader.Read(e, ErrorReply, ["code", "text"], _problems) is { } pattern
            ? new ErrorReplyRule(pattern)
            : null;
        var onConnect = _context.Commands(map, OnConnect, TemplateVariables.None) ?? [];

        var sections = new CapabilitySectionReader(_context);
        var network = map.Has(NetworkAnalyser) ? sections.ReadNetworkAnalyser(map) : null;
        var spectrum = map.Has(SpectrumAnalyser) ? sections.ReadSpectrumAnalyser(map) : null;
        var generator = map.Has(SignalGenerator) ? sections.ReadSignalGenerator(map) : null;
        CheckKindsAgainstSections(map, kinds);

        if (_problems.Any)
        {
            return null;
        }

        return new DriverProfile(name!, description, adapter, kinds.Select(k => k.Kind).ToList(), framing, acknowledgement, timing,
            identity!, limits, errorReply, _context.Words, onConnect, network, spectrum, generator);
    }

    private string? OneLine(StrictMap map, string key, string? missingHint = null)
    {
        var text = map.Text(key, missingHint);
        if (text is null)
        {
            return null;
        }

        if (text.Value.Trim().Contains('\n'))
        {
            _problems.Add(text, $"\"{key}\" must be on one line");
            return null;
        }

        return text.Value.Trim();
    }

    private string ReadAdapter(StrictMap map)
    {
        var text = map.Text(Adapter);
        if (text is null || string.Equals(text.Value.Trim(), DriverProfile.RawAdapter, StringComparison.OrdinalIgnoreCase))
        {
            return DriverProfile.RawAdapter;
        }

        _problems.Add(text, string.Equals(text.Value.Trim(), "scpi", StringComparison.OrdinalIgnoreCase)
            ? "\"adapter: scpi\" is not available yet: SCPI profiles arrive in a later version; this version reads \"adapter: raw\" profiles only"
            : $"unknown value \"{text.Value}\" for \"{Adapter}\"; expected raw (scpi profiles arrive in a later version)");
        return DriverProfile.RawAdapter;
    }

    private List<(InstrumentKind Kind, YamlItem Item)> ReadKinds(StrictMap map)
    {
        var kinds = new List<(InstrumentKind, YamlItem)>();
        var value = map.Require(Kinds, "say what the instrument is, e.g. \"kinds: [network-analyser]\"");
        if (value is null)
        {
            return kinds;
        }

        var choices = string.Join(", ", KindWords.Select(k => k.Word));
        var items = value is YamlList list ? list.Items : [value];
        if (items.Count == 0)
        {
            _problems.Add(value, $"\"{Kinds}\" is empty; expected one or more of {choices}");
        }

        foreach (var item in items)
        {
            if (item is not YamlText { IsNull: false } text)
            {
                _problems.Add(item is YamlText ? map.ValueLocation(Kinds) : item.Location,
                    $"expected a kind of instrument ({choices}) in \"{Kinds}\", found {StrictMap.Describe(item)}");
                continue;
            }

            if (StrictMap.WordOf(text, Kinds, KindWords, _problems) is { } kind)
            {
                if (kinds.Any(k => k.Item1 == kind))
                {
                    _problems.Add(text, $"\"{text.Value}\" is listed twice in \"{Kinds}\"");
                }
                else
                {
                    kinds.Add((kind, text));
                }
            }
        }

        return kinds;
    }

    private void CheckKindsAgainstSections(StrictMap map, List<(InstrumentKind Kind, YamlItem Item)> kinds)
    {
        foreach (var (word, kind) in KindWords)
        {
            var listed = kinds.FirstOrDefault(k => k.Kind == kind);
            if (listed.Item is not null && !map.Has(word))
            {
                _problems.Add(listed.Item, $"\"{Kinds}\" lists {word}, but the profile has no \"{word}:\" section with its commands");
            }
            else if (listed.Item is null && map.Key(word) is { } key && map.Has(Kinds))
            {
                _problems.Add(key, $"the profile has a \"{word}:\" section, but \"{Kinds}\" does not list {word}");
            }
        }
    }

    private BoolWords ReadBoolWords(StrictMap map)
    {
        if (map.List(BoolWordsKey, "two words, the one for on and the one for off, e.g. [on, off]") is not { } list)
        {
            return BoolWords.Default;
        }

        var words = list.Items.OfType<YamlText>().Where(t => !t.IsNull && t.Value.Trim().Length > 0).Select(t => t.Value.Trim()).ToList();
        if (list.Items.Count != 2 || words.Count != 2)
        {
            _problems.Add(list, $"\"{BoolWordsKey}\" takes two words, the one for on and the one for off, e.g. [on, off]");
            return BoolWords.Default;
        }

        if (words[0] == words[1])
        {
            _problems.Add(list.Items[1], $"the two words of \"{BoolWordsKey}\" must differ");
            return BoolWords.Default;
        }

        return new BoolWords(words[0], words[1]);
    }

    private (FramingOptions Framing, string? Acknowledgement) ReadFraming(StrictMap map)
    {
        var defaults = new FramingOptions();
        var f = map.Mapping(FramingKey, FramingKeys);
        if (f is null)
        {
            return (defaults, null);
        }

        var commandEnd = ReadTerminator(f, CommandEnd, allowEmpty: true) ?? defaults.WriteTerminator;
        var replyEnd = ReadTerminator(f, ReplyEndKey, allowEmpty: false) ?? defaults.ReadTerminator;
        string? prompt = null;
        if (f.Get(Prompt) is { } promptItem)
        {
            if (promptItem is YamlText { IsNull: false } p && p.Value.Length > 0 && !p.Value.Contains('\n') && !p.Value.Contains('\r'))
            {
                prompt = p.Value;
            }
            else
            {
                _problems.Add(f.ValueLocation(Prompt), $"expected the prompt's text for \"{Prompt}\", in quotes when it ends with a space (\"br> \"); found {StrictMap.Describe(promptItem)}");
            }
        }

        var echo = f.Bool(Echo) ?? false;
        var maxBytes = f.Integer(MaxMessageBytes, 1024, 256 * 1024 * 1024) ?? FramingOptions.DefaultMaxMessageBytes;
        var acknowledgement = f.Text(Acknowledgement)?.Value.Trim();
        if (echo && prompt is null && acknowledgement is null && f.Key(Echo) is { } echoKey)
        {
            _problems.Add(echoKey, $"a device that echoes but has no prompt must acknowledge each setting (\"{Acknowledgement}\"), or the echo of a setting cannot be told from a late reply");
        }

        return (new FramingOptions
        {
            WriteTerminator = commandEnd,
            ReadTerminator = replyEnd,
            Prompt = prompt,
            Echo = echo,
            MaxMessageBytes = maxBytes,
        }, acknowledgement);
    }

    private string? ReadTerminator(StrictMap map, string key, bool allowEmpty)
    {
        var item = map.Get(key);
        if (item is null)
        {
            return null;
        }

        const string expected = "lf, cr or crlf, or the characters in double quotes such as \"\\r\\n\"";
        if (item is not YamlText text || (text.IsNull && !allowEmpty))
        {
            _problems.Add(map.ValueLocation(key), $"expected a terminator for \"{key}\": {expected}; found {StrictMap.Describe(item)}");
            return null;
        }

        if (!text.IsPlain)
        {
            if (text.Value.Length == 0 && !allowEmpty)
            {
                _problems.Add(text, $"\"{key}\" must not be empty; expected {expected}");
                return null;
            }

            return text.Value;
        }

        if (text.IsNull)
        {
            return "";
        }

        foreach (var (word, value) in Terminators)
        {
            if (string.Equals(word, text.Value.Trim(), StringComparison.OrdinalIgnoreCase))
            {
                return value;
            }
        }

        _problems.Add(text, $"unknown terminator \"{text.Value}\" for \"{key}\"; expected {expected}");
        return null;
    }

    private ProfileTiming ReadTiming(StrictMap map)
    {
        var d = ProfileTiming.Default;
        var t = map.Mapping(Timing, TimingKeys);
        if (t is null)
        {
            return d;
        }

        return new ProfileTiming(
            Timeout(t, CommandTimeout) ?? d.CommandTimeout,
            Timeout(t, SweepTimeout) ?? d.SweepTimeout,
            t.Parsed(SettleAfterSetting, DurationText.Parse) ?? d.SettleAfterSetting,
            t.Parsed(SettleBeforeRead, DurationText.Parse) ?? d.SettleBeforeRead);
    }

    private TimeSpan? Timeout(StrictMap map, string key)
    {
        var value = map.Parsed(key, DurationText.Parse);
        if (value is { } v && v <= TimeSpan.Zero)
        {
            _problems.Add(map.ValueLocation(key), $"\"{key}\" must be longer than 0 s");
            return null;
        }

        return value;
    }

    private InstrumentLimits ReadLimits(StrictMap map)
    {
        var l = map.Mapping(Limits, LimitKeys);
        if (l is null)
        {
            return InstrumentLimits.None;
        }

        var lowest = l.FrequencyWithUnit(LowestFrequency);
        var highest = l.FrequencyWithUnit(HighestFrequency);
        FrequencyRange? range = null;
        if (l.Has(LowestFrequency) != l.Has(HighestFrequency))
        {
            var (given, missing) = l.Has(LowestFrequency) ? (LowestFrequency, HighestFrequency) : (HighestFrequency, LowestFrequency);
            _problems.Add(l.Key(given)!, $"\"{given}\" needs \"{missing}\" as well: the frequency range is declared with both ends");
        }
        else if (lowest is { } lo && highest is { } hi)
        {
            if (hi <= lo)
            {
                _problems.Add(l.ValueLocation(HighestFrequency), $"\"{HighestFrequency}\" ({hi}) must be above \"{LowestFrequency}\" ({lo})");
            }
            else
            {
                range = FrequencyRange.Between(lo, hi);
            }
        }

        var maxInput = l.Parsed(MaxInputLevel, Level.Parse);
        var maxOutput = l.Parsed(MaxOutputLevel, Level.Parse);
        var minOutput = l.Parsed(MinOutputLevel, Level.Parse);
        if (minOutput is { } min && maxOutput is { } max && min > max)
        {
            _problems.Add(l.ValueLocation(MinOutputLevel), $"\"{MinOutputLevel}\" ({min}) is above \"{MaxOutputLevel}\" ({max})");
        }

        return new InstrumentLimits(range, maxInput, maxOutput, minOutput);
    }

    private IdentityRule? ReadIdentity(StrictMap map)
    {
        var id = map.Mapping(Identity, IdentityKeys,
            "say how the instrument is identified: \"query:\" and \"reply:\" (a pattern with groups such as (?<model>...)), or fixed \"maker:\" and \"model:\"");
        if (id is null)
        {
            return null;
        }

        var queryText = id.Text(Query);
        var query = queryText is null ? null : _context.Template(queryText, $"\"{Query}\"", TemplateVariables.None);
        var replyText = id.Text(Reply);
        var reply = replyText is null ? null : PatternReader.Read(replyText, Reply, IdentityRule.Fields, _problems);
        if (queryText is not null && !id.Has(Reply))
        {
            _problems.Add(id.Key(Query)!, $"\"{Query}\" needs \"{Reply}\": a pattern for the answer with groups such as (?<maker>...) and (?<model>...)");
        }
        else if (replyText is not null && !id.Has(Query))
        {
            _problems.Add(id.Key(Reply)!, $"\"{Reply}\" needs \"{Query}\": the command that asks for the identity");
        }

        var groups = reply is null ? [] : PatternReader.NamedGroups(reply).ToList();
        if (reply is not null && groups.Count == 0)
        {
            _problems.Add(replyText!, $"the pattern for \"{Reply}\" has no group for the identity; name one or more of {string.Join(", ", IdentityRule.Fields)}, e.g. (?<model>\\S+)");
        }

        var values = new Dictionary<string, string>();
        foreach (var field in IdentityRule.Fields)
        {
            if (OneLine(id, field) is not { } value)
            {
                continue;
            }

            if (groups.Contains(field))
            {
                _problems.Add(id.Key(field)!, $"\"{field}\" is given here and by the group (?<{field}>...) of \"{Reply}\"; give it once");
            }

            values[field] = value;
        }

        if (!id.Has(Query) && !id.Has(Reply) && values.Count == 0)
        {
            _problems.Add(id.MissingAt, $"\"{Identity}\" gives no identity; expected \"query:\" and \"reply:\", or fixed values such as \"maker:\" and \"model:\"");
        }

        string Fixed(string field) => values.TryGetValue(field, out var v) ? v : "0";
        return new IdentityRule(query, reply, new InstrumentIdentity(Fixed("maker"), Fixed("model"), Fixed("serial"), Fixed("firmware")));
    }
}
