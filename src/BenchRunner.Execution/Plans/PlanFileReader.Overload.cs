using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Core.Yaml;
using BenchRunner.Instruments.Kinds;
using static BenchRunner.Execution.Plans.PlanFileKeys;

namespace BenchRunner.Execution.Plans;

/// <summary>The <c>check-overload</c> step.</summary>
internal sealed partial class PlanFileReader
{
    private OverloadCheckStep? ReadOverloadCheck(StrictMap step, string? name, SourceLocation at)
    {
        var map = step.Mapping(CheckOverload, OverloadKeys);
        if (map is null)
        {
            return null;
        }

        var role = ReadRole(map, CheckOverload, InstrumentKind.SpectrumAnalyser);
        var trace = ReadAcquiredPowerTrace(map);
        var raiseBy = map.Parsed(RaiseBy, Ratio.Parse) ?? OverloadCheckStep.DefaultRaiseBy;
        var threshold = map.Parsed(Threshold, Level.Parse) ?? OverloadCheckStep.DefaultThreshold;
        var tolerance = map.Parsed(Tolerance, Ratio.Parse)?.Decibels ?? OverloadCheckStep.DefaultToleranceDb;
        if (raiseBy.Decibels <= 0)
        {
            _problems.Add(map.ValueLocation(RaiseBy), $"\"{RaiseBy}\" must be above 0 dB; the second sweep needs more attenuation than the first");
        }
        else if (tolerance < 0 || raiseBy.Decibels <= 2 * tolerance)
        {
            _problems.Add(map.ValueLocation(map.Has(Tolerance) ? Tolerance : RaiseBy),
                $"a {raiseBy} step cannot tell real lines from analyser-made ones with a ±{tolerance} dB tolerance; the step must be more than twice the tolerance (and the tolerance not negative)");
        }

        var carriers = ReadFrequencies(map, Carriers) ?? [];
        var lines = ReadFrequencies(map, Lines);
        return role is null || trace is null ? null
            : new OverloadCheckStep(name, at, role, trace, raiseBy, threshold, tolerance, carriers, lines);
    }

    // The step acquires its trace, as a sweep does, so the name follows the sweep's rule.
    private NamedTrace? ReadAcquiredPowerTrace(StrictMap map)
    {
        var text = map.Text(TraceKey, "name the trace the first sweep is kept as, e.g. \"trace: harmonics\"");
        if (text is null)
        {
            return null;
        }

        var traceName = text.Value.Trim();
        if (!TraceNames.IsValid(traceName))
        {
            _problems.Add(text, $"\"{traceName}\" is not a trace name; expected {RoleNames.Rule}");
            return null;
        }

        if (_traces.TryGetValue(traceName, out var earlier) && earlier.Quantity != TraceQuantity.Power)
        {
            _problems.Add(text, $"the trace name \"{traceName}\" already names the {earlier.Quantity} trace of line {earlier.Location.Line}; a name stands for one measured quantity");
            return null;
        }

        var trace = new NamedTrace(TraceQuantity.Power, traceName, text.Location);
        _traces.TryAdd(traceName, trace);
        return trace;
    }

    private List<Frequency>? ReadFrequencies(StrictMap map, string key)
    {
        var list = map.List(key, "frequencies such as \"137.5 MHz\"");
        if (list is null)
        {
            return null;
        }

        var frequencies = new List<Frequency>();
        foreach (var item in list.Items)
        {
            var parsed = item is YamlText { IsNull: false } text ? Frequency.Parse(text.Value) : ParseResult<Frequency>.Fail("");
            if (item is not YamlText { IsNull: false } t || !parsed.Success || !t.Value.TrimEnd().EndsWith("hz", StringComparison.OrdinalIgnoreCase) || parsed.Value.Hertz <= 0)
            {
                _problems.Add(item, $"expected a frequency above 0 Hz with its unit, such as \"137.5 MHz\", in \"{key}\"; found {StrictMap.Describe(item)}");
                continue;
            }

            frequencies.Add(parsed.Value);
        }

        if (list.Items.Count == 0)
        {
            _problems.Add(list, $"\"{key}\" is empty; leave it out instead");
        }

        return frequencies;
    }

    /// <summary>A check-overload step sweeps at the analyser's present settings, so some earlier step must have set them.</summary>
    private void CheckAnalyserSetBeforeOverloadCheck(IEnumerable<PlanStep> steps)
    {
        var setUp = new HashSet<string>(StringComparer.Ordinal);
        foreach (var step in new TestPlan("", null, [], [.. steps], _source).AllSteps())
        {
            if (step is SpectrumAnalyserSetup sa)
            {
                setUp.Add(sa.Role);
            }
            else if (step is OverloadCheckStep overload && !setUp.Contains(overload.Role))
            {
                _problems.Add(overload.Location, $"\"{CheckOverload}\" sweeps \"{overload.Role}\" at its present settings, but no earlier \"{SetSpectrumAnalyser}\" step sets them; add one before it");
            }
        }
    }
}
