using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Yaml;
using BenchRunner.Instruments.Adapters;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Framing;
using BenchRunner.Instruments.Kinds;
using BenchRunner.Instruments.Scpi;
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
    private readonly InstrumentKindRegistry _kinds;

    private DriverProfileReader(string source, InstrumentKindRegistry kinds)
    {
        _problems = new YamlProblems(source);
        _context = new ProfileReadContext(_problems);
        _kinds = kinds;
    }

    public static DriverProfile Read(string text, string source, InstrumentKindRegistry kinds)
    {
        var root = YamlTreeReader.Read(text, source)
            ?? throw new InputFormatException(new SourceLocation(source, 1, 1),
                "the file holds no profile; expected keys such as \"profile:\", \"kinds:\" and \"identity:\"");
        var reader = new DriverProfileReader(source, kinds);
        var profile = reader.ReadProfile(root);
        reader._problems.ThrowIfAny();
        return profile ?? throw new InvalidOperationException("A profile with no problems was not built.");
    }

    private DriverProfile? ReadProfile(YamlItem root)
    {
        var adapter = ReadAdapter(root);
        bool scpi = adapter == AdapterKind.Scpi;
        var map = ForeignKeys.Open(root, "the profile", scpi ? ScpiProfileKeys.Top(_kinds) : Top(_kinds), adapter,
            scpi ? ForeignKeys.RawInScpiTop : ForeignKeys.ScpiInRawTop, _problems);
        if (map is null)
        {
            return null;
        }

        var name = OneLine(map, Profile, "every profile needs a name, e.g. \"profile: bench-vna\"");
        var description = map.Text(Description)?.Value.Trim();
        var kinds = ReadKinds(map);
        var (framing, acknowledgement) = ReadFraming(map, adapter);
        var timing = ReadTiming(map, adapter);
        var limits = ReadLimits(map);
        CheckKindsAgainstSections(map, kinds, sectionRequired: !scpi);
        var kindList = kinds.Select(k => k.Kind).ToList();
        if (scpi)
        {
            var read = new ScpiProfileReader(_problems).Read(map, _kinds, kindList, framing, timing);
            return _problems.Any || read is not { } set
                ? null
                : DriverProfile.ForScpi(name!, description, kindList, timing, limits, set.Commands, set.Options);
        }

        _context.Words = ReadBoolWords(map);
        _context.Prompt = framing.Prompt;
        var identity = ReadIdentity(map);
        var errorReply = map.Text(ErrorReply) is { } e && PatternReader.Read(e, ErrorReply, ["code", "text"], _problems) is { } pattern
            ? new ErrorReplyRule(pattern)
            : null;
        var onConnect = _context.Commands(map, OnConnect, TemplateVariables.None) ?? [];

        // Every section written is read, listed or not, so that its own problems are reported too.
        var sections = new Dictionary<InstrumentKind, object>();
        foreach (var kind in _kinds.Kinds.Where(k => map.Has(k.Word)))
        {
            if (kind.RawSection(new ProfileSectionReader(kind, map, _context)) is { } section)
            {
                sections[kind] = section;
            }
        }

        if (_problems.Any)
        {
            return null;
        }

        var listedSections = kindList.Where(sections.ContainsKey).ToDictionary(k => k, k => sections[k]);
        return DriverProfile.ForRaw(name!, description, kindList, framing, acknowledgement, timing,
            identity!, limits, errorReply, _context.Words, onConnect, listedSections);
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

    // Read before the profile's keys are checked, as the adapter decides which keys are allowed.
    private AdapterKind ReadAdapter(YamlItem root)
    {
        if (root is not YamlMap map || map.Entries.FirstOrDefault(e => e.Key.Value == Adapter) is not { Key: not null } entry)
        {
            return AdapterKind.Raw;
        }

        const string expected = $"expected {AdapterKindWords.RawInProfile} (a line dialect described by the profile) or {AdapterKindWords.Scpi} (an IEEE 488.2 / SCPI instrument)";
        if (entry.Value is not YamlText { IsNull: false } text || string.IsNullOrWhiteSpace(text.Value))
        {
            _problems.Add(entry.Value is YamlText ? entry.Key.Location : entry.Value.Location,
                $"expected text for \"{Adapter}\", found {StrictMap.Describe(entry.Value)}; {expected}");
            return AdapterKind.Raw;
        }

        var word = text.Value.Trim();
        foreach (var (adapterWord, adapter) in AdapterKindWords.InProfiles)
        {
            if (string.Equals(word, adapterWord, StringComparison.OrdinalIgnoreCase))
            {
                return adapter;
            }
        }

        _problems.Add(text, $"unknown value \"{text.Value}\" for \"{Adapter}\"; {expected}");
        return AdapterKind.Raw;
    }

    private List<(InstrumentKind Kind, YamlItem Item)> ReadKinds(StrictMap map)
    {
        var kinds = new List<(InstrumentKind, YamlItem)>();
        var value = map.Require(DriverProfileKeys.Kinds, "say what the instrument is, e.g. \"kinds: [network-analyser]\"");
        if (value is null)
        {
            return kinds;
        }

        var choices = string.Join(", ", _kinds.Kinds.Select(k => k.Word));
        var items = value is YamlList list ? list.Items : [value];
        if (items.Count == 0)
        {
            _problems.Add(value, $"\"{DriverProfileKeys.Kinds}\" is empty; expected one or more of {choices}");
        }

        foreach (var item in items)
        {
            if (item is not YamlText { IsNull: false } text)
            {
                _problems.Add(item is YamlText ? map.ValueLocation(DriverProfileKeys.Kinds) : item.Location,
                    $"expected a kind of instrument ({choices}) in \"{DriverProfileKeys.Kinds}\", found {StrictMap.Describe(item)}");
                continue;
            }

            if (_kinds.WordOf(text, DriverProfileKeys.Kinds, _problems) is { } kind)
            {
                if (kinds.Any(k => k.Item1 == kind))
                {
                    _problems.Add(text, $"\"{text.Value}\" is listed twice in \"{DriverProfileKeys.Kinds}\"");
                }
                else
                {
                    kinds.Add((kind, text));
                }
            }
        }

        return kinds;
    }

    // A raw profile needs each kind's section; a scpi profile may leave one out to keep every default.
    private void CheckKindsAgainstSections(StrictMap map, List<(InstrumentKind Kind, YamlItem Item)> kinds, bool sectionRequired)
    {
        foreach (var (word, kind) in _kinds.Words)
        {
            var listed = kinds.FirstOrDefault(k => k.Kind == kind);
            if (listed.Item is not null && !map.Has(word) && sectionRequired)
            {
                _problems.Add(listed.Item, $"\"{DriverProfileKeys.Kinds}\" lists {word}, but the profile has no \"{word}:\" section with its commands");
            }
            else if (listed.Item is null && map.Key(word) is { } key && map.Has(DriverProfileKeys.Kinds))
            {
                _problems.Add(key, $"the profile has a \"{word}:\" section, but \"{DriverProfileKeys.Kinds}\" does not list {word}");
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

    // A scpi profile has no prompt, echo or acknowledgement, and its commands must end with a terminator.
    private (FramingOptions Framing, string? Acknowledgement) ReadFraming(StrictMap map, AdapterKind adapter)
    {
        var defaults = new FramingOptions();
        var f = adapter == AdapterKind.Scpi
            ? ForeignKeys.Mapping(map, FramingKey, ScpiProfileKeys.FramingKeys, adapter, ForeignKeys.RawInScpiFraming)
            : map.Mapping(FramingKey, FramingKeys);
        if (f is null)
        {
            return (defaults, null);
        }

        var commandEnd = ReadTerminator(f, CommandEnd, allowEmpty: adapter == AdapterKind.Raw) ?? defaults.WriteTerminator;
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

    // A scpi profile's timeouts are those of its session (defaults 5 s and 60 s, at most 1 h); it has no settle delays.
    private ProfileTiming ReadTiming(StrictMap map, AdapterKind adapter)
    {
        bool scpi = adapter == AdapterKind.Scpi;
        var d = scpi ? ScpiTimingDefault : ProfileTiming.Default;
        var t = scpi
            ? ForeignKeys.Mapping(map, Timing, ScpiProfileKeys.TimingKeys, adapter, ForeignKeys.RawInScpiTiming)
            : map.Mapping(Timing, TimingKeys);
        if (t is null)
        {
            return d;
        }

        var max = scpi ? ScpiSessionOptions.MaxTimeout : (TimeSpan?)null;
        return new ProfileTiming(
            Timeout(t, CommandTimeout, max) ?? d.CommandTimeout,
            Timeout(t, SweepTimeout, max) ?? d.SweepTimeout,
            t.Parsed(SettleAfterSetting, DurationText.Parse) ?? d.SettleAfterSetting,
            t.Parsed(SettleBeforeRead, DurationText.Parse) ?? d.SettleBeforeRead);
    }

    private static ProfileTiming ScpiTimingDefault
    {
        get
        {
            var session = new ScpiSessionOptions();
            return new ProfileTiming(session.CommandTimeout, session.CompletionTimeout, TimeSpan.Zero, TimeSpan.Zero);
        }
    }

    private TimeSpan? Timeout(StrictMap map, string key, TimeSpan? max)
    {
        var value = map.Parsed(key, DurationText.Parse);
        if (value is { } v && v <= TimeSpan.Zero)
        {
            _problems.Add(map.ValueLocation(key), $"\"{key}\" must be longer than 0 s");
            return null;
        }

        if (value > max)
        {
            _problems.Add(map.ValueLocation(key), $"\"{key}\" must be at most {DurationText.Format(max.Value)}");
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
