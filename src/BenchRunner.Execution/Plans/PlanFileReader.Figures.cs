using System.Globalization;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Yaml;
using static BenchRunner.Execution.Plans.PlanFileKeys;

namespace BenchRunner.Execution.Plans;

internal sealed partial class PlanFileReader
{
    private List<FigureLimit>? ReadLimits(StrictMap map, NamedTrace? trace)
    {
        var value = map.Require(Figures, $"give the limits, e.g. \"{Core.Figures.FigureKeys.InsertionLoss.Word}: {{ max: 4 dB }}\"");
        if (value is null)
        {
            return null;
        }

        if (value is not YamlMap figures || figures.Entries.Count == 0)
        {
            _problems.Add(map.ValueLocation(Figures),
                $"expected \"{Figures}\" to map figure keys to limits, e.g. \"{Core.Figures.FigureKeys.CentreFrequency.Word}: {{ target: 137.5 MHz, tolerance: 0.3 MHz }}\"; found {StrictMap.Describe(value)}");
            return null;
        }

        var limits = new List<FigureLimit>();
        foreach (var (key, item) in figures.Entries)
        {
            var figureKey = key.Value.Trim();
            var figure = trace is null ? FigureCatalogue.FindAny(figureKey) : FigureCatalogue.Find(figureKey, trace.Quantity);
            if (figure is null)
            {
                var any = FigureCatalogue.FindAny(figureKey);
                var choices = string.Join(", ", (trace is null ? FigureCatalogue.All : FigureCatalogue.For(trace.Quantity)).Select(f => f.Key.Word).Distinct());
                _problems.Add(key, any is null || trace is null
                    ? $"unknown figure \"{figureKey}\"; expected one of {choices}"
                    : $"the figure \"{figureKey}\" is not computed for the {trace.Quantity} trace \"{trace.Name}\"; expected one of {choices}");
                continue;
            }

            if (ReadLimit(figure, key, item) is { } limit)
            {
                limits.Add(limit);
            }
        }

        return _problems.Any ? null : limits;
    }

    private FigureLimit? ReadLimit(FigureDefinition figure, YamlText key, YamlItem item)
    {
        var map = StrictMap.Open(item, $"the limit of \"{figure.Key}\"", LimitKeys, _problems, key.Location);
        if (map is null)
        {
            return null;
        }

        var count = _problems.Count;
        var min = Value(map, Min, figure, difference: false);
        var max = Value(map, Max, figure, difference: false);
        var target = Value(map, Target, figure, difference: false);
        var tolerance = Value(map, Tolerance, figure, difference: true);
        if (_problems.Count > count)
        {
            return null;
        }

        if (map.Has(Target) || map.Has(Tolerance))
        {
            if ((map.Key(Min) ?? map.Key(Max)) is { } both)
            {
                _problems.Add(both, $"give \"{figure.Key}\" either \"{Target}\" and \"{Tolerance}\" or \"{Min}\" / \"{Max}\", not both");
                return null;
            }

            if (target is null || tolerance is null)
            {
                var (given, missing) = target is null ? (Tolerance, Target) : (Target, Tolerance);
                _problems.Add(map.Key(given)!, $"\"{given}\" of \"{figure.Key}\" needs \"{missing}\" as well");
                return null;
            }

            if (tolerance < 0)
            {
                _problems.Add(map.ValueLocation(Tolerance), $"the tolerance of \"{figure.Key}\" must not be negative");
                return null;
            }

            return new FigureLimit(figure.Key, target - tolerance, target + tolerance, target, key.Location);
        }

        if (min is null && max is null)
        {
            _problems.Add(key, $"the limit of \"{figure.Key}\" gives no bound; expected \"{Min}\", \"{Max}\", or \"{Target}\" with \"{Tolerance}\"");
            return null;
        }

        if (min > max)
        {
            _problems.Add(map.ValueLocation(Min), $"the \"{Min}\" of \"{figure.Key}\" ({Show(min!.Value, figure.Unit)}) is above its \"{Max}\" ({Show(max!.Value, figure.Unit)}); no value could pass");
            return null;
        }

        return new FigureLimit(figure.Key, min, max, null, key.Location);
    }

    // A value in the figure's own unit; a tolerance on a level in dBm is a difference, in dB.
    private double? Value(StrictMap map, string key, FigureDefinition figure, bool difference)
    {
        var text = map.Text(key);
        if (text is null)
        {
            return null;
        }

        var raw = text.Value.Trim();
        var unit = difference && figure.Unit == QuantityUnit.DecibelMilliwatt ? QuantityUnit.Decibel : figure.Unit;
        double? value = unit switch
        {
            _ when unit == QuantityUnit.Hertz => Frequency.Parse(raw) is { Success: true } f && raw.EndsWith("hz", StringComparison.OrdinalIgnoreCase) ? f.Value.Hertz : null,
            _ when unit == QuantityUnit.Decibel => Ratio.Parse(raw) is { Success: true } r ? r.Value.Decibels : null,
            _ when unit == QuantityUnit.DecibelMilliwatt => Level.Parse(raw) is { Success: true } l ? l.Value.Dbm : null,
            _ when unit == QuantityUnit.None => double.TryParse(raw, NumberStyles.Float, CultureInfo.InvariantCulture, out var n) && double.IsFinite(n) ? n : null,
            _ => throw new InvalidOperationException($"No plan figure is in {unit.Symbol}."),
        };
        if (value is null)
        {
            var example = unit == QuantityUnit.Hertz ? "a frequency with its unit, such as \"137.5 MHz\""
                : unit == QuantityUnit.Decibel ? "a ratio in dB, such as \"4 dB\""
                : unit == QuantityUnit.DecibelMilliwatt ? "a level in dBm, such as \"-30 dBm\""
                : "a plain number without a unit, such as \"45\"";
            _problems.Add(text, $"\"{raw}\" is not right for the {key} of \"{figure.Key}\"; expected {example}");
        }

        return value;
    }

    // The value as written (up to 9 significant digits, or 6 decimals of a dB), not the rounded text of a measured figure.
    private static string Show(double value, QuantityUnit unit) =>
        unit == QuantityUnit.Decibel ? Ratio.FromDecibels(value).ToString()
        : unit == QuantityUnit.DecibelMilliwatt ? Level.FromDbm(value).ToString()
        : QuantityFormat.Format(value, unit, 9);
}
