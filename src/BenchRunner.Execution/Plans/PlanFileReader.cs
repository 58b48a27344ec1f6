using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Masks;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Core.Yaml;
using BenchRunner.Instruments.Kinds;
using static BenchRunner.Execution.Plans.PlanFileKeys;

namespace BenchRunner.Execution.Plans;

/// <summary>
/// Turns the YAML tree of a plan file into a <see cref="TestPlan"/>, checking everything that can
/// be checked without a bench (roles, traces, figures, units, limits) and collecting every problem.
/// </summary>
internal sealed partial class PlanFileReader
{
    private readonly YamlProblems _problems;
    private readonly string _source;
    private readonly string _folder;
    private readonly Dictionary<string, RoleRequirement> _roles = new(StringComparer.Ordinal);
    private readonly Dictionary<string, NamedTrace> _traces = new(StringComparer.Ordinal);
    private readonly Dictionary<string, SourceLocation> _names = new(StringComparer.Ordinal);

    private readonly PlanVocabulary _vocabulary;
    private readonly IReadOnlyList<string> _stepWords;
    private readonly IReadOnlyList<string> _stepKeys;

    private PlanFileReader(string source, string folder, PlanVocabulary vocabulary)
    {
        _problems = new YamlProblems(source);
        _source = source;
        _folder = folder;
        _vocabulary = vocabulary;
        _stepWords = vocabulary.StepWords;
        _stepKeys = [Name, .. _stepWords];
    }

    public static TestPlan Read(string text, string source, string folder, PlanVocabulary vocabulary)
    {
        var root = YamlTreeReader.Read(text, source)
            ?? throw new InputFormatException(new SourceLocation(source, 1, 1),
                "the file holds no plan; expected keys such as \"plan:\", \"roles:\" and \"steps:\"");
        var reader = new PlanFileReader(source, folder, vocabulary);
        var plan = reader.ReadPlan(root);
        reader._problems.ThrowIfAny();
        return plan ?? throw new InvalidOperationException("A plan with no problems was not built.");
    }

    private TestPlan? ReadPlan(YamlItem root)
    {
        var map = StrictMap.Open(root, "the plan", Top, _problems);
        if (map is null)
        {
            return null;
        }

        var name = map.Text(Plan, "every plan needs a name, e.g. \"plan: psf-137-check\"")?.Value.Trim();
        var description = map.Text(Description)?.Value.Trim();
        ReadRoles(map);
        var steps = map.List(Steps, "steps", "list what the plan does, e.g. \"- sweep:\" and \"- check-mask:\"") is { } list
            ? ReadSteps(list)
            : [];
        if (map.Get(Steps) is YamlList { Items.Count: 0 } empty)
        {
            _problems.Add(empty, $"\"{Steps}\" is empty; a plan needs at least one step");
        }

        CheckAnalyserSetBeforeOverloadCheck(steps);
        return _problems.Any ? null : new TestPlan(name!, description, [.. _roles.Values], steps, _source);
    }

    private void ReadRoles(StrictMap map)
    {
        var value = map.Require(Roles, "name the instruments the plan needs, e.g. \"vna: network-analyser\"");
        if (value is null)
        {
            return;
        }

        if (value is not YamlMap roles || roles.Entries.Count == 0)
        {
            _problems.Add(map.ValueLocation(Roles),
                $"expected \"{Roles}\" to be a mapping of role names to kinds, e.g. \"vna: network-analyser\"; found {StrictMap.Describe(value)}");
            return;
        }

        foreach (var (key, kindItem) in roles.Entries)
        {
            var role = key.Value.Trim();
            if (!RoleNames.IsValid(role))
            {
                _problems.Add(key, $"\"{role}\" is not a role name; expected {RoleNames.Rule}");
                continue;
            }

            if (kindItem is not YamlText { IsNull: false } text)
            {
                _problems.Add(kindItem is YamlText ? key.Location : kindItem.Location,
                    $"expected the kind of role \"{role}\": {string.Join(", ", _vocabulary.Kinds.Words.Select(k => k.Word))}; found {StrictMap.Describe(kindItem)}");
                continue;
            }

            if (_vocabulary.Kinds.WordOf(text, role, _problems) is { } kind)
            {
                _roles[role] = new RoleRequirement(role, kind, key.Location);
            }
        }
    }

    private List<PlanStep> ReadSteps(YamlList list)
    {
        var steps = new List<PlanStep>();
        foreach (var item in list.Items)
        {
            if (ReadStep(item) is { } step)
            {
                steps.Add(step);
            }
        }

        return steps;
    }

    private PlanStep? ReadStep(YamlItem item)
    {
        var map = StrictMap.Open(item, "a step", _stepKeys, _problems);
        if (map is null)
        {
            return null;
        }

        var words = _stepWords.Where(map.Has).ToList();
        if (words.Count != 1)
        {
            _problems.Add(words.Count == 0 ? map.MissingAt : map.Key(words[1])!.Location, words.Count == 0
                ? $"a step needs one of {string.Join(", ", _stepWords)}"
                : $"a step does one thing; this one has both \"{words[0]}\" and \"{words[1]}\" (start a new list item with \"- \")");
            return null;
        }

        var name = ReadName(map);
        var word = words[0];
        var at = map.Key(word)!.Location;
        return word switch
        {
            SetNetworkAnalyser => ReadNetwork(map, name, at),
            SetSpectrumAnalyser => ReadSpectrum(map, name, at),
            SetGenerator => ReadGenerator(map, name, at),
            Sweep => ReadSweep(map, name, at),
            CheckMask => ReadMaskCheck(map, name, at),
            CheckFigures => ReadFigureCheck(map, name, at),
            Wait => map.Parsed(Wait, DurationText.Parse) is { } d ? new WaitStep(name, at, d) : null,
            Message => map.Text(Message) is { } m ? new MessageStep(name, at, m.Value.Trim()) : null,
            CheckOverload => ReadOverloadCheck(map, name, at),
            Repeat => ReadRepeat(map, name, at),
            _ => ReadOwnStep(map, word, name, at),
        };
    }

    /// <summary>A step of a kind added to the vocabulary, read by the kind itself.</summary>
    private PlanStep? ReadOwnStep(StrictMap map, string word, string? name, SourceLocation at)
    {
        var kind = _vocabulary.Steps.First(s => s.Word == word);
        var reading = new StepReading(map, kind, name, at, _problems, (body, step, kinds) => ReadRole(body, step, kinds));
        return kind.Read!(reading);
    }

    private string? ReadName(StrictMap map)
    {
        var text = map.Text(Name);
        if (text is null)
        {
            return null;
        }

        var name = text.Value.Trim();
        if (_names.TryGetValue(name, out var first))
        {
            _problems.Add(text, $"the step name \"{name}\" is already used (line {first.Line}); step names must be unique");
        }
        else
        {
            _names[name] = text.Location;
        }

        return name;
    }

    private string? ReadRole(StrictMap map, string step, params InstrumentKind[] kinds)
    {
        var text = map.Text(Role, $"say which instrument, by its role in \"{Roles}\"");
        if (text is null)
        {
            return null;
        }

        var role = text.Value.Trim();
        var able = string.Join(" or ", kinds.Select(k => k.Word));
        if (!_roles.TryGetValue(role, out var declared))
        {
            var known = _roles.Count == 0 ? "none" : string.Join(", ", _roles.Keys);
            _problems.Add(text, $"unknown role \"{role}\"; the plan's \"{Roles}\" declares {known} (add \"{role}: {kinds[0].Word}\" there)");
            return null;
        }

        if (!kinds.Contains(declared.Kind))
        {
            _problems.Add(text, $"\"{step}\" needs a {able}, but role \"{role}\" is a {declared.Kind.Word}");
            return null;
        }

        return role;
    }

    private NetworkAnalyserSetup? ReadNetwork(StrictMap step, string? name, SourceLocation at)
    {
        var map = step.Mapping(SetNetworkAnalyser, NetworkKeys);
        if (map is null)
        {
            return null;
        }

        var role = ReadRole(map, SetNetworkAnalyser, InstrumentKind.NetworkAnalyser);
        var start = map.FrequencyWithUnit(Start, "the first frequency, e.g. \"127.5 MHz\"");
        var stop = map.FrequencyWithUnit(Stop, "the last frequency, e.g. \"147.5 MHz\"");
        var points = map.Integer(Points, 2, MaxPoints, "how many points, e.g. 401");
        var ifbw = Positive(map, IfBandwidth, map.FrequencyWithUnit(IfBandwidth));
        if (start is { } lo && stop is { } hi && hi <= lo)
        {
            _problems.Add(map.ValueLocation(Stop), $"\"{Stop}\" ({hi}) must be above \"{Start}\" ({lo})");
            return null;
        }

        return role is null || start is null || stop is null || points is null
            ? null
            : new NetworkAnalyserSetup(name, at, role, start.Value, stop.Value, points.Value, ifbw);
    }

    private SpectrumAnalyserSetup? ReadSpectrum(StrictMap step, string? name, SourceLocation at)
    {
        var map = step.Mapping(SetSpectrumAnalyser, SpectrumKeys);
        if (map is null)
        {
            return null;
        }

        var role = ReadRole(map, SetSpectrumAnalyser, InstrumentKind.SpectrumAnalyser);
        var rbw = Positive(map, Rbw, map.FrequencyWithUnit(Rbw));
        var attenuation = map.Parsed(Attenuation, Ratio.Parse);
        if (attenuation is { Decibels: < 0 })
        {
            _problems.Add(map.ValueLocation(Attenuation), $"\"{Attenuation}\" must be 0 dB or more");
        }

        var reference = map.Parsed(ReferenceLevel, Level.Parse);
        var edges = ReadSpan(map);
        return role is null || edges is not { } e ? null : new SpectrumAnalyserSetup(name, at, role, e.Start, e.Stop, rbw, attenuation, reference);
    }

    private (Frequency Start, Frequency Stop)? ReadSpan(StrictMap map)
    {
        bool byEdges = map.Has(Start) || map.Has(Stop);
        bool byCentre = map.Has(Centre) || map.Has(Span);
        if (byEdges == byCentre)
        {
            var key = byEdges ? map.Key(Centre) ?? map.Key(Span)! : null;
            _problems.Add(key?.Location ?? map.MissingAt, byEdges
                ? $"give the span as \"{Start}\" and \"{Stop}\", or as \"{Centre}\" and \"{Span}\", not both"
                : $"give the span as \"{Start}\" and \"{Stop}\", or as \"{Centre}\" and \"{Span}\", e.g. \"centre: 137.5 MHz\" and \"span: 2 MHz\"");
            return null;
        }

        if (byEdges)
        {
            var start = map.FrequencyWithUnit(Start, "the lower edge of the span");
            var stop = map.FrequencyWithUnit(Stop, "the upper edge of the span");
            if (start is { } lo && stop is { } hi && hi <= lo)
            {
                _problems.Add(map.ValueLocation(Stop), $"\"{Stop}\" ({hi}) must be above \"{Start}\" ({lo})");
                return null;
            }

            return start is null || stop is null ? null : (start.Value, stop.Value);
        }

        var centre = map.FrequencyWithUnit(Centre, "the centre of the span, e.g. \"137.5 MHz\"");
        var span = Positive(map, Span, map.FrequencyWithUnit(Span, "the width of the span, e.g. \"2 MHz\""));
        if (centre is not { } c || span is not { } s)
        {
            return null;
        }

        if (s.Hertz / 2 >= c.Hertz)
        {
            _problems.Add(map.ValueLocation(Span), $"a span of {s} around {c} would reach 0 Hz; narrow the span or raise the centre");
            return null;
        }

        return (Frequency.FromHertz(c.Hertz - s.Hertz / 2), Frequency.FromHertz(c.Hertz + s.Hertz / 2));
    }

    private Frequency? Positive(StrictMap map, string key, Frequency? value)
    {
        if (value is { Hertz: <= 0 })
        {
            _problems.Add(map.ValueLocation(key), $"\"{key}\" must be above 0 Hz");
            return null;
        }

        return value;
    }

    private GeneratorSetup? ReadGenerator(StrictMap step, string? name, SourceLocation at)
    {
        var map = step.Mapping(SetGenerator, GeneratorKeys);
        if (map is null)
        {
            return null;
        }

        var role = ReadRole(map, SetGenerator, InstrumentKind.SignalGenerator);
        var frequency = Positive(map, FrequencyKey, map.FrequencyWithUnit(FrequencyKey));
        var level = map.Parsed(LevelKey, Level.Parse);
        var output = map.Word(Output, OnOff);
        if (!map.Has(FrequencyKey) && !map.Has(LevelKey) && !map.Has(Output))
        {
            _problems.Add(map.MissingAt, $"\"{SetGenerator}\" sets nothing; give \"{FrequencyKey}\", \"{LevelKey}\" or \"{Output}\"");
        }

        return role is null ? null : new GeneratorSetup(name, at, role, frequency, level, output, map.ValueLocation(LevelKey));
    }

    private SweepStep? ReadSweep(StrictMap step, string? name, SourceLocation at)
    {
        var map = step.Mapping(Sweep, SweepKeys);
        if (map is null)
        {
            return null;
        }

        var role = ReadRole(map, Sweep, InstrumentKind.NetworkAnalyser, InstrumentKind.SpectrumAnalyser);
        var value = map.Require(Traces, "name the traces to acquire, e.g. \"S21: passband\"");
        if (value is null)
        {
            return null;
        }

        if (value is not YamlMap traces || traces.Entries.Count == 0)
        {
            _problems.Add(map.ValueLocation(Traces),
                $"expected \"{Traces}\" to map what is measured to a trace name, e.g. \"S21: passband\" (network analyser) or \"power: spectrum\" (spectrum analyser); found {StrictMap.Describe(value)}");
            return null;
        }

        var kind = role is null ? (InstrumentKind?)null : _roles[role].Kind;
        var acquired = new List<NamedTrace>();
        foreach (var (key, nameItem) in traces.Entries)
        {
            if (StrictMap.WordOf(key, Traces, Quantities, _problems) is not { } quantity)
            {
                continue;
            }

            if (kind == InstrumentKind.SpectrumAnalyser && quantity != TraceQuantity.Power)
            {
                _problems.Add(key, $"a spectrum-analyser measures \"power\", not {key.Value.Trim()}");
                continue;
            }

            if (kind == InstrumentKind.NetworkAnalyser && quantity == TraceQuantity.Power)
            {
                _problems.Add(key, "a network-analyser measures S-parameters (S11, S21, S12, S22), not power");
                continue;
            }

            if (nameItem is not YamlText { IsNull: false } text || !TraceNames.IsValid(text.Value.Trim()))
            {
                _problems.Add(nameItem is YamlText { IsNull: true } ? key.Location : nameItem.Location,
                    $"expected a name for the {key.Value.Trim()} trace ({RoleNames.Rule}); found {StrictMap.Describe(nameItem)}");
                continue;
            }

            var traceName = text.Value.Trim();
            if (_traces.TryGetValue(traceName, out var earlier) && earlier.Quantity != quantity)
            {
                _problems.Add(text, $"the trace name \"{traceName}\" already names the {earlier.Quantity} trace of line {earlier.Location.Line}; a name stands for one measured quantity");
                continue;
            }

            var trace = new NamedTrace(quantity, traceName, text.Location);
            _traces.TryAdd(traceName, trace);
            acquired.Add(trace);
        }

        return role is null ? null : new SweepStep(name, at, role, acquired);
    }

    private NamedTrace? ReadTraceName(StrictMap map, string step)
    {
        var text = map.Text(TraceKey, "name the trace, as a \"sweep\" step's \"traces\" names it");
        if (text is null)
        {
            return null;
        }

        var name = text.Value.Trim();
        if (!_traces.TryGetValue(name, out var trace))
        {
            var known = _traces.Count == 0 ? "no step acquires any trace before this one" : $"the traces acquired before it are {string.Join(", ", _traces.Keys)}";
            _problems.Add(text, $"\"{step}\" names the trace \"{name}\", but no earlier step acquires it; {known}");
            return null;
        }

        return trace;
    }

    private MaskCheck? ReadMaskCheck(StrictMap step, string? name, SourceLocation at)
    {
        var map = step.Mapping(CheckMask, MaskKeys);
        if (map is null)
        {
            return null;
        }

        var trace = ReadTraceName(map, CheckMask);
        var value = map.Require(Mask, "name a mask file, e.g. \"mask: psf-137-passband.yaml\", or write the mask inline");
        if (value is null)
        {
            return null;
        }

        LimitMask? mask;
        string? path = null;
        if (value is YamlText { IsNull: false } file)
        {
            path = file.Value.Trim();
            mask = LoadMask(file, path);
        }
        else if (value is YamlMap)
        {
            mask = Guard(() => MaskFile.Read(value, _source));
        }
        else
        {
            _problems.Add(map.ValueLocation(Mask), $"expected a mask file's name or an inline mask for \"{Mask}\", found {StrictMap.Describe(value)}");
            return null;
        }

        if (mask?.Parameter is { } applies && trace is not null && applies != trace.Quantity)
        {
            _problems.Add(map.ValueLocation(Mask), $"the mask \"{mask.Name}\" applies to {applies}, but the trace \"{trace.Name}\" is {trace.Quantity}");
            return null;
        }

        return trace is null || mask is null ? null : new MaskCheck(name, at, trace.Name, mask, path);
    }

    private LimitMask? LoadMask(YamlText at, string path)
    {
        var full = Path.Combine(_folder, path);
        if (!File.Exists(full))
        {
            _problems.Add(at, $"no mask file \"{path}\" (looked for {Path.GetFullPath(full)}; a relative path is taken from the plan file's folder)");
            return null;
        }

        var mask = Guard(() => MaskFile.Load(full));
        if (mask is null)
        {
            _problems.Add(at, $"the mask file \"{path}\" is not valid (its problem is given with its own file name)");
        }

        return mask;
    }

    private LimitMask? Guard(Func<LimitMask> read)
    {
        try
        {
            return read();
        }
        catch (InputFormatException ex)
        {
            foreach (var problem in ex.Problems)
            {
                _problems.Add(problem.Location, problem.Detail);
            }

            return null;
        }
    }

    private FigureCheck? ReadFigureCheck(StrictMap step, string? name, SourceLocation at)
    {
        var map = step.Mapping(CheckFigures, FigureKeys);
        if (map is null)
        {
            return null;
        }

        var trace = ReadTraceName(map, CheckFigures);
        var limits = ReadLimits(map, trace);
        return trace is null || limits is null ? null : new FigureCheck(name, at, trace.Name, limits);
    }

    private RepeatStep? ReadRepeat(StrictMap step, string? name, SourceLocation at)
    {
        var map = step.Mapping(Repeat, RepeatKeys);
        if (map is null)
        {
            return null;
        }

        var times = map.Integer(Times, 1, MaxPasses);
        var cap = map.Integer(AtMost, 1, MaxPasses);
        if (map.Has(Times) == map.Has(Until))
        {
            _problems.Add(map.Has(Times) ? map.Key(Until)!.Location : map.MissingAt, map.Has(Times)
                ? $"a repeat runs a fixed number of \"{Times}\" or \"{Until}\" a condition holds, not both"
                : $"say how often to repeat: \"{Times}: 3\", or \"{Until}:\" a condition with \"{AtMost}:\" a cap on the passes");
        }
        else if (map.Has(Until) && !map.Has(AtMost))
        {
            _problems.Add(map.Key(Until)!, $"a repeat \"{Until}\" a condition needs a cap, \"{AtMost}: N\", so that it ends even when the condition never holds");
        }
        else if (map.Has(Times) && map.Key(AtMost) is { } atMostKey)
        {
            _problems.Add(atMostKey, $"\"{AtMost}\" caps a repeat \"{Until}\" a condition; a repeat of fixed \"{Times}\" needs none");
        }

        var list = map.List(Steps, "steps", "list the steps to repeat");
        var steps = list is null ? [] : ReadSteps(list);
        if (list is { Items.Count: 0 })
        {
            _problems.Add(list, $"the repeat's \"{Steps}\" is empty");
        }

        // The condition is checked after each pass, so it may name traces acquired inside the block.
        FigureCondition? until = null;
        if (map.Mapping(Until, FigureKeys) is { } condition)
        {
            var trace = ReadTraceName(condition, Until);
            var limits = ReadLimits(condition, trace);
            until = trace is null || limits is null ? null : new FigureCondition(trace.Name, limits, map.Key(Until)!.Location);
        }

        var passes = times ?? cap;
        return passes is null || (map.Has(Until) && until is null) ? null : new RepeatStep(name, at, times, until, passes.Value, steps);
    }
}
