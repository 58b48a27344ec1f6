using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Yaml;
using BenchRunner.Instruments.Adapters;
using BenchRunner.Instruments.Connections;
using BenchRunner.Instruments.Kinds;
using BenchRunner.Instruments.Profiles;
using static BenchRunner.Execution.Bench.BenchFileKeys;

namespace BenchRunner.Execution.Bench;

/// <summary>
/// Turns the YAML tree of a bench file into a <see cref="BenchDefinition"/>, collecting every
/// problem (its own and those of the profiles it names) and throwing them together at the end.
/// </summary>
internal sealed partial class BenchFileReader
{
    private readonly YamlProblems _problems;
    private readonly string _folder;
    private readonly InstrumentKindRegistry _kinds;

    private BenchFileReader(string source, string folder, InstrumentKindRegistry kinds)
    {
        _problems = new YamlProblems(source);
        _folder = folder;
        _kinds = kinds;
    }

    public static BenchDefinition Read(string text, string source, string folder, InstrumentKindRegistry kinds)
    {
        var root = YamlTreeReader.Read(text, source)
            ?? throw new InputFormatException(new SourceLocation(source, 1, 1),
                "the file holds no bench; expected keys such as \"bench:\" and \"instruments:\"");
        var reader = new BenchFileReader(source, folder, kinds);
        var bench = reader.ReadBench(root, source);
        reader._problems.ThrowIfAny();
        return bench ?? throw new InvalidOperationException("A bench with no problems was not built.");
    }

    private BenchDefinition? ReadBench(YamlItem root, string source)
    {
        var map = StrictMap.Open(root, "the bench file", Top, _problems);
        if (map is null)
        {
            return null;
        }

        var name = map.Text(BenchName, "every bench needs a name, e.g. \"bench: virtual-bench\"")?.Value.Trim();
        var description = map.Text(Description)?.Value.Trim();
        var instruments = new Dictionary<string, BenchInstrument>(StringComparer.Ordinal);
        if (map.Require(InstrumentMap, "list the instruments by role name, e.g. \"vna:\" with its \"kind:\" and \"connection:\"") is { } item)
        {
            ReadInstruments(item, map, instruments);
        }

        var paths = map.Get(Paths) is { } p ? ReadPaths(p, map, instruments) : [];
        var compensations = map.Get(Compensation) is { } c ? ReadCompensations(c, map, instruments) : [];
        return _problems.Any ? null : new BenchDefinition(name!, description, instruments, paths, source) { Compensations = compensations, Kinds = _kinds };
    }

    private void ReadInstruments(YamlItem item, StrictMap top, Dictionary<string, BenchInstrument> into)
    {
        if (item is not YamlMap map || map.Entries.Count == 0)
        {
            _problems.Add(top.ValueLocation(InstrumentMap),
                $"expected \"{InstrumentMap}\" to be a mapping of role names to instruments, e.g. \"vna:\" with \"kind: network-analyser\"; found {StrictMap.Describe(item)}");
            return;
        }

        foreach (var (key, value) in map.Entries)
        {
            var role = key.Value.Trim();
            if (!RoleNames.IsValid(role))
            {
                _problems.Add(key, $"\"{role}\" is not a role name; expected {RoleNames.Rule}");
                continue;
            }

            if (ReadInstrument(role, key, value) is { } instrument)
            {
                into[role] = instrument;
            }
        }
    }

    private BenchInstrument? ReadInstrument(string role, YamlText key, YamlItem value)
    {
        var map = StrictMap.Open(value, $"instrument \"{role}\"", InstrumentKeys, _problems, key.Location);
        if (map is null)
        {
            return null;
        }

        var kind = _kinds.Word(map, Kind, $"say what it is: {_kinds.Choices}");
        var adapter = map.Word(Adapter, AdapterKindWords.InBenches,
            $"say how it is spoken to: {AdapterKindWords.Scpi}, or {AdapterKindWords.RawInBench} (with \"{Profile}:\" naming the profile file)");
        var connection = ReadConnection(map);
        var profile = ReadProfile(map, role, kind, adapter);
        var (maxInput, maxOutput) = ReadLimits(map, role, kind);
        if (kind is not { } k || adapter is not { } a || connection is null)
        {
            return null;
        }

        return new BenchInstrument(role, k, a, connection, profile,
            Lower(maxInput, profile?.Limits.MaxInputLevel),
            Lower(maxOutput, profile?.Limits.MaxOutputLevel),
            key.Location);
    }

    // The bench narrows what the profile declares: the lower of the two is the one that holds.
    private static Level? Lower(Level? a, Level? b) =>
        a is { } x && b is { } y ? (x < y ? x : y) : a ?? b;

    private ConnectionSpec? ReadConnection(StrictMap map)
    {
        var text = map.Text(Connection, "say where it is reached, e.g. \"sim:vna\", \"serial:/dev/ttyUSB0?baud=115200\" or \"tcp:192.0.2.10:5025\"");
        if (text is null)
        {
            return null;
        }

        var parsed = ConnectionSpec.Parse(text.Value.Trim());
        if (!parsed.Success)
        {
            _problems.Add(text, parsed.Error);
            return null;
        }

        return parsed.Value;
    }

    private DriverProfile? ReadProfile(StrictMap map, string role, InstrumentKind? kind, AdapterKind? adapter)
    {
        var text = map.Text(Profile);
        if (text is null)
        {
            if (adapter == AdapterKind.Raw && !map.Has(Profile))
            {
                _problems.Add(map.Key(Adapter)!, $"instrument \"{role}\" uses \"{Adapter}: {AdapterKindWords.RawInBench}\" but names no profile file; add \"{Profile}: FILE\"");
            }

            return null;
        }

        var path = Path.Combine(_folder, text.Value.Trim());
        if (!File.Exists(path))
        {
            _problems.Add(text, $"no profile file \"{text.Value.Trim()}\" (looked for {Path.GetFullPath(path)}; a relative path is taken from the bench file's folder)");
            return null;
        }

        DriverProfile profile;
        try
        {
            profile = DriverProfile.Load(path, _kinds);
        }
        catch (InputFormatException ex)
        {
            foreach (var problem in ex.Problems)
            {
                _problems.Add(problem.Location, problem.Detail);
            }

            _problems.Add(text, $"the profile \"{text.Value.Trim()}\" of instrument \"{role}\" is not valid (its problems are listed with its own file name)");
            return null;
        }

        if (kind is { } k && !profile.Kinds.Contains(k))
        {
            _problems.Add(text, $"the profile \"{profile.Name}\" describes {string.Join(", ", profile.Kinds.Select(p => p.Word))}, not {k.Word} as instrument \"{role}\" is declared");
        }

        if (adapter is { } a && profile.AdapterKind != a)
        {
            var other = a == AdapterKind.Scpi ? AdapterKind.Raw : AdapterKind.Scpi;
            _problems.Add(text,
                $"the profile \"{profile.Name}\" is a {AdapterKindWords.InProfile(profile.AdapterKind)} profile, but instrument \"{role}\" uses \"{Adapter}: {AdapterKindWords.InBench(a)}\"; " +
                $"use \"{Adapter}: {AdapterKindWords.InBench(other)}\" or a {AdapterKindWords.InProfile(a)} profile");
        }

        return profile;
    }

    private (Level? MaxInput, Level? MaxOutput) ReadLimits(StrictMap map, string role, InstrumentKind? kind)
    {
        var limits = map.Mapping(Limits, LimitKeys);
        if (limits is null)
        {
            return (null, null);
        }

        var maxInput = limits.Parsed(MaxInputLevel, Level.Parse);
        var maxOutput = limits.Parsed(MaxOutputLevel, Level.Parse);
        if (kind is { HasProtectedInput: false } && limits.Key(MaxInputLevel) is { } inputKey)
        {
            _problems.Add(inputKey, $"instrument \"{role}\" is a {kind.Word} and has no RF input to protect" +
                (kind.HasOutput ? $"; declare \"{MaxOutputLevel}\" instead" : ""));
        }

        if (kind is { HasOutput: false } && limits.Key(MaxOutputLevel) is { } outputKey)
        {
            _problems.Add(outputKey, $"instrument \"{role}\" is a {kind.Word} and has no output" +
                (kind.HasProtectedInput ? $"; declare \"{MaxInputLevel}\" instead" : ""));
        }

        return (maxInput, maxOutput);
    }

    private List<SignalPath> ReadPaths(YamlItem item, StrictMap top, Dictionary<string, BenchInstrument> instruments)
    {
        var paths = new List<SignalPath>();
        if (item is not YamlMap map)
        {
            _problems.Add(top.ValueLocation(Paths),
                $"expected \"{Paths}\" to be a mapping of paths to their gain, e.g. \"gen -> sa: -1 dB\"; found {StrictMap.Describe(item)}");
            return paths;
        }

        foreach (var (key, value) in map.Entries)
        {
            var ends = key.Value.Split(Arrow);
            if (ends.Length != 2 || ends.Any(e => !RoleNames.IsValid(e.Trim())))
            {
                _problems.Add(key, $"\"{key.Value}\" is not a path; expected two role names joined by \"{Arrow}\", e.g. \"gen -> sa: -1 dB\"");
                continue;
            }

            var (from, to) = (ends[0].Trim(), ends[1].Trim());
            var known = true;
            foreach (var end in new[] { from, to }.Distinct())
            {
                if (!instruments.ContainsKey(end) && !Declared(top, end))
                {
                    _problems.Add(key, $"path \"{key.Value.Trim()}\" names \"{end}\", which is not an instrument of this bench");
                    known = false;
                }
            }

            if (from == to)
            {
                _problems.Add(key, $"path \"{key.Value.Trim()}\" leads from an instrument to itself");
                known = false;
            }

            if (paths.Any(p => p.From == from && p.To == to))
            {
                _problems.Add(key, $"path \"{from} {Arrow} {to}\" is declared twice");
                continue;
            }

            var gain = ReadGain(key, value);
            if (known && gain is { } g)
            {
                paths.Add(new SignalPath(from, to, g, key.Location));
            }
        }

        return paths;
    }

    // An instrument with problems of its own is still declared; a path to it is not a further problem.
    private static bool Declared(StrictMap top, string role) =>
        top.Get(InstrumentMap) is YamlMap m && m.Entries.Any(e => e.Key.Value.Trim() == role);

    private Ratio? ReadGain(YamlText key, YamlItem value)
    {
        if (value is not YamlText { IsNull: false } text)
        {
            _problems.Add(value is YamlText ? key.Location : value.Location,
                $"expected the gain of path \"{key.Value.Trim()}\" in dB, e.g. \"-21 dB\" (a loss) or \"+20 dB\" (an amplifier); found {StrictMap.Describe(value)}");
            return null;
        }

        var parsed = Ratio.Parse(text.Value);
        if (!parsed.Success)
        {
            _problems.Add(text, $"{parsed.Error} (the gain of path \"{key.Value.Trim()}\"; a loss is negative)");
            return null;
        }

        return parsed.Value;
    }
}
