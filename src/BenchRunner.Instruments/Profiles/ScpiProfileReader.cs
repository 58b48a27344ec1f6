using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Traces;
using BenchRunner.Core.Yaml;
using BenchRunner.Instruments.Adapters;
using BenchRunner.Instruments.Framing;
using BenchRunner.Instruments.Kinds;
using BenchRunner.Instruments.Scpi;
using static BenchRunner.Instruments.Profiles.ScpiProfileKeys;

namespace BenchRunner.Instruments.Profiles;

/// <summary>
/// Reads the SCPI parts of an <c>adapter: scpi</c> profile (the <c>scpi:</c> section and the
/// capability sections) into a <see cref="ScpiCommandSet"/> and <see cref="ScpiInstrumentOptions"/>.
/// Every command left out keeps its default. The commands are checked by
/// <see cref="ScpiCommandSet.Problems"/>, and each problem it finds is reported at the place in the
/// file where that command was written.
/// </summary>
internal sealed class ScpiProfileReader(YamlProblems problems)
{
    // Where each command was written, under the name ScpiCommandSet.Problems() gives it ("network.start").
    private readonly Dictionary<string, Place> _places = new(StringComparer.Ordinal);

    /// <summary>The command set and options, or null when a problem was found (all are reported).</summary>
    public (ScpiCommandSet Commands, ScpiInstrumentOptions Options)? Read(
        StrictMap profile, InstrumentKindRegistry registry, IReadOnlyCollection<InstrumentKind> kinds, FramingOptions framing, ProfileTiming timing)
    {
        var d = new ScpiCommandSet();
        var ds = new ScpiSessionOptions();
        // Every registered kind's section is read, enabled when the kind is listed; a section of an
        // unlisted kind is reported by the profile reader.
        var sections = new OrderedDictionary<InstrumentKind, IScpiCommandSection>();
        foreach (var kind in registry.Kinds)
        {
            sections[kind] = kind.ScpiSection(new ScpiSectionReader(this, kind, profile, kinds.Contains(kind)));
        }

        var s = Section(profile, ScpiProfileKeys.Scpi, ScpiKeys, ForeignKeys.Nothing);
        var commands = new ScpiCommandSet(registry)
        {
            Sections = sections,
            Trigger = Command(s, Trigger, "trigger", d.Trigger),
            DataFormat = s?.Word(DataFormat, DataFormats) ?? d.DataFormat,
            ByteOrder = s?.Word(ByteOrder, ByteOrders) ?? d.ByteOrder,
            DataFormatCommand = Command(s, DataFormatCommand, "dataFormatCommand", d.DataFormatCommand),
            ByteOrderCommand = Command(s, ByteOrderCommand, "byteOrderCommand", d.ByteOrderCommand),
            // No kind read means "kinds" is already reported; do not add "no capability is enabled" to it.
            IdentificationOnly = kinds.Count == 0,
        };

        var errorQuery = Command(s, ErrorQuery, "errorQuery", ds.ErrorQuery);
        var options = new ScpiInstrumentOptions
        {
            Session = new ScpiSessionOptions
            {
                CommandTimeout = timing.CommandTimeout,
                CompletionTimeout = timing.SweepTimeout,
                DrainErrors = s?.Bool(DrainErrors) ?? ds.DrainErrors,
                MaxErrorReads = s?.Integer(MaxErrorReads, 1, 1000) ?? ds.MaxErrorReads,
                ErrorQuery = errorQuery ?? ds.ErrorQuery,
            },
            Framing = framing,
            ResetOnConnect = s?.Bool(ResetOnConnect) ?? false,
        };

        var found = commands.Problems().ToList();
        ScpiCommandChecks.Check(found, "errorQuery", errorQuery, null, required: true, query: true);
        foreach (var problem in found)
        {
            Report(problem, profile.MissingAt);
        }

        return problems.Any ? null : (commands, options);
    }

    internal ScpiNetworkCommands ReadNetwork(ScpiSectionReader reader)
    {
        var (enabled, d) = (reader.Enabled, new ScpiNetworkCommands());
        var s = reader.Open(NetworkKeys, ForeignKeys.RawInScpiNetwork);
        const string at = "network";
        return new ScpiNetworkCommands
        {
            Enabled = enabled,
            Start = Command(s, Start, $"{at}.start", d.Start),
            Stop = Command(s, Stop, $"{at}.stop", d.Stop),
            Points = Command(s, Points, $"{at}.points", d.Points),
            IfBandwidth = Command(s, DriverProfileKeys.IfBandwidth, $"{at}.ifBandwidth", d.IfBandwidth),
            AverageCount = Command(s, AverageCount, $"{at}.averageCount", d.AverageCount),
            AverageState = Command(s, AverageState, $"{at}.averageState", d.AverageState),
            TraceQueries = ReadTraceQueries(s, d.TraceQueries),
            FrequencyListQuery = Command(s, FrequencyList, $"{at}.frequencyListQuery", d.FrequencyListQuery),
        };
    }

    internal ScpiSpectrumCommands ReadSpectrum(ScpiSectionReader reader)
    {
        var (enabled, d) = (reader.Enabled, new ScpiSpectrumCommands());
        var s = reader.Open(SpectrumKeys, ForeignKeys.RawInScpiSpectrum);
        const string at = "spectrum";
        return new ScpiSpectrumCommands
        {
            Enabled = enabled,
            Start = Command(s, Start, $"{at}.start", d.Start),
            Stop = Command(s, Stop, $"{at}.stop", d.Stop),
            ResolutionBandwidth = Command(s, ResolutionBandwidth, $"{at}.resolutionBandwidth", d.ResolutionBandwidth),
            InputAttenuation = Command(s, InputAttenuation, $"{at}.inputAttenuation", d.InputAttenuation),
            ReferenceLevel = Command(s, ReferenceLevel, $"{at}.referenceLevel", d.ReferenceLevel),
            Points = Command(s, Points, $"{at}.points", d.Points),
            PointsQuery = Command(s, PointsQuery, $"{at}.pointsQuery", d.PointsQuery),
            TraceQuery = Command(s, DriverProfileKeys.Read, $"{at}.traceQuery", d.TraceQuery),
            FrequencyListQuery = Command(s, FrequencyList, $"{at}.frequencyListQuery", d.FrequencyListQuery),
        };
    }

    internal ScpiGeneratorCommands ReadGenerator(ScpiSectionReader reader)
    {
        var (enabled, d) = (reader.Enabled, new ScpiGeneratorCommands());
        var s = reader.Open(GeneratorKeys);
        const string at = "generator";
        return new ScpiGeneratorCommands
        {
            Enabled = enabled,
            Frequency = Command(s, DriverProfileKeys.FrequencyKey, $"{at}.frequency", d.Frequency),
            Level = Command(s, DriverProfileKeys.LevelKey, $"{at}.level", d.Level),
            Output = Command(s, DriverProfileKeys.Output, $"{at}.output", d.Output),
        };
    }

    // "read" names the parameters it changes; the others keep their default queries, and "none" drops one.
    private Dictionary<TraceQuantity, string> ReadTraceQueries(StrictMap? section, Dictionary<TraceQuantity, string> defaults)
    {
        var queries = new Dictionary<TraceQuantity, string>(defaults);
        if (section?.Get(DriverProfileKeys.Read) is null)
        {
            return queries;
        }

        var keys = Parameters.Select(p => p.Word).ToList();
        var read = section.Mapping(DriverProfileKeys.Read, keys);
        if (read is null)
        {
            return queries;
        }

        _places["network.traceQueries"] = new Place(Described(section, DriverProfileKeys.Read), section.ValueLocation(DriverProfileKeys.Read), None: false);
        foreach (var (word, quantity) in Parameters)
        {
            if (!read.Has(word))
            {
                continue;
            }

            var query = Command(read, word, $"network.traceQueries.{quantity}", defaults.GetValueOrDefault(quantity),
                $"\"{DriverProfileKeys.Read}: {word}\" in {section.Context}");
            if (query is null)
            {
                queries.Remove(quantity);
            }
            else
            {
                queries[quantity] = query;
            }
        }

        return queries;
    }

    // An optional section: absent or empty (a bare "network-analyser:") keeps every default.
    internal StrictMap? Section(StrictMap profile, string key, IReadOnlyList<string> keys, IReadOnlyDictionary<string, string> foreign) =>
        profile.Get(key) is null or YamlText { IsNull: true }
            ? null
            : ForeignKeys.Mapping(profile, key, keys, AdapterKind.Scpi, foreign);

    /// <summary>
    /// The command under <paramref name="key"/>: the default when absent (or unreadable, which is
    /// reported), null for <c>none</c>, otherwise the text as written; its place is remembered
    /// under <paramref name="name"/>.
    /// </summary>
    internal string? Command(StrictMap? section, string key, string name, string? fallback, string? described = null)
    {
        var value = section?.Get(key);
        if (section is null || value is null)
        {
            return fallback;
        }

        described ??= Described(section, key);
        var at = section.ValueLocation(key);
        if (value is not YamlText { IsNull: false } text || string.IsNullOrWhiteSpace(text.Value))
        {
            problems.Add(at, $"expected a command, or {None} to leave it out, for {described}; found {StrictMap.Describe(value)}");
            return fallback;
        }

        bool none = text.Value.Trim().Equals(None, StringComparison.OrdinalIgnoreCase);
        _places[name] = new Place(described, at, none);
        return none ? null : text.Value;
    }

    private static string Described(StrictMap section, string key) => $"\"{key}\" in {section.Context}";

    private void Report(string problem, SourceLocation fallback)
    {
        int colon = problem.IndexOf(": ", StringComparison.Ordinal);
        if (colon <= 0 || !_places.TryGetValue(problem[..colon], out var place))
        {
            problems.Add(fallback, $"the SCPI command set: {problem}");
            return;
        }

        var detail = problem[(colon + 2)..];
        problems.Add(place.At, detail == "a command is required"
            ? $"{place.Key} is required{(place.None ? $"; only an optional command may be {None}" : "")}"
            : $"{place.Key}: {detail}");
    }

    private readonly record struct Place(string Key, SourceLocation At, bool None);
}
