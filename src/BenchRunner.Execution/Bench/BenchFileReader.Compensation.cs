using BenchRunner.Core.Quantities;
using BenchRunner.Core.Validity;
using BenchRunner.Core.Yaml;
using BenchRunner.Instruments.Kinds;
using static BenchRunner.Execution.Bench.BenchFileKeys;

namespace BenchRunner.Execution.Bench;

/// <summary>The <c>compensation</c> section: what lies between a probed point and each spectrum analyser's input.</summary>
internal sealed partial class BenchFileReader
{
    private Dictionary<string, InputCompensation> ReadCompensations(YamlItem item, StrictMap top, Dictionary<string, BenchInstrument> instruments)
    {
        var compensations = new Dictionary<string, InputCompensation>(StringComparer.Ordinal);
        if (item is not YamlMap map || map.Entries.Count == 0)
        {
            _problems.Add(top.ValueLocation(Compensation),
                $"expected \"{Compensation}\" to map a spectrum analyser's role to what lies before its input, e.g. \"sa:\" with \"{Probe}: 4.7 kOhm\"; found {StrictMap.Describe(item)}");
            return compensations;
        }

        foreach (var (key, value) in map.Entries)
        {
            var role = key.Value.Trim();
            if (!instruments.TryGetValue(role, out var instrument))
            {
                if (!Declared(top, role))
                {
                    _problems.Add(key, $"\"{Compensation}\" names \"{role}\", which is not an instrument of this bench");
                }

                continue;
            }

            if (instrument.Kind != InstrumentKind.SpectrumAnalyser)
            {
                _problems.Add(key, $"compensation is applied to spectrum traces; \"{role}\" is a {instrument.Kind.Word}");
                continue;
            }

            if (ReadCompensation(role, key, value) is { } compensation)
            {
                compensations[role] = compensation;
            }
        }

        return compensations;
    }

    private InputCompensation? ReadCompensation(string role, YamlText key, YamlItem value)
    {
        var map = StrictMap.Open(value, $"the compensation of \"{role}\"", CompensationKeys, _problems, key.Location);
        if (map is null)
        {
            return null;
        }

        int before = _problems.Count;
        if (map.Map.Entries.Count == 0)
        {
            _problems.Add(key, $"the compensation of \"{role}\" declares nothing; give \"{Probe}\", \"{Attenuators}\", \"{DcBlock}\" or \"{Cable}\"");
            return null;
        }

        var probe = map.Parsed(Probe, Resistance.Parse);
        if (probe is { Ohms: <= 0 })
        {
            _problems.Add(map.ValueLocation(Probe), $"the probe's series resistor must be above 0 Ohm");
        }

        var impedance = map.Parsed(Impedance, Resistance.Parse);
        if (impedance is { Ohms: <= 0 })
        {
            _problems.Add(map.ValueLocation(Impedance), $"\"{Impedance}\" (the analyser input's impedance) must be above 0 Ohm");
        }
        else if (impedance is not null && probe is null)
        {
            _problems.Add(map.Key(Impedance)!, $"\"{Impedance}\" is the impedance a probe works into; it needs \"{Probe}\"");
        }

        var attenuators = ReadAttenuators(map);
        var dcBlock = map.Has(DcBlock) ? Loss(map, DcBlock, "the DC block's insertion loss, e.g. \"0.2 dB\" (0 dB when negligible)") : null;
        var cable = map.Get(Cable) is { } c ? ReadCable(map, c) : [];
        if (_problems.Count > before)
        {
            return null;
        }

        return new InputCompensation(role, probe, impedance ?? Resistance.FromOhms(50), attenuators, dcBlock, cable, key.Location);
    }

    private List<Ratio> ReadAttenuators(StrictMap map)
    {
        var list = map.List(Attenuators, "attenuator losses such as \"10 dB\"");
        var losses = new List<Ratio>();
        foreach (var entry in list?.Items ?? [])
        {
            if (entry is YamlText { IsNull: false } text && LossOf(text, "an attenuator's loss") is { } loss)
            {
                losses.Add(loss);
            }
            else if (entry is not YamlText { IsNull: false })
            {
                _problems.Add(entry, $"expected an attenuator's loss such as \"10 dB\", found {StrictMap.Describe(entry)}");
            }
        }

        return losses;
    }

    private List<(Frequency, Ratio)> ReadCable(StrictMap map, YamlItem item)
    {
        var points = new List<(Frequency, Ratio)>();
        if (item is not YamlMap table || table.Entries.Count < 2)
        {
            _problems.Add(map.ValueLocation(Cable),
                $"expected \"{Cable}\" to map at least two frequencies to the cable's loss, e.g. \"50 MHz: 0.3 dB\" and \"500 MHz: 1.1 dB\"; found {StrictMap.Describe(item)}");
            return points;
        }

        foreach (var (key, value) in table.Entries)
        {
            var frequency = Frequency.Parse(key.Value);
            if (!frequency.Success || !key.Value.TrimEnd().EndsWith("hz", StringComparison.OrdinalIgnoreCase))
            {
                _problems.Add(key, frequency.Success
                    ? $"\"{key.Value.Trim()}\" has no unit; expected a frequency such as \"137.5 MHz\""
                    : frequency.Error!);
                continue;
            }

            if (value is not YamlText { IsNull: false } text)
            {
                _problems.Add(value is YamlText ? key.Location : value.Location, $"expected the cable's loss at {frequency.Value}, e.g. \"0.4 dB\"; found {StrictMap.Describe(value)}");
                continue;
            }

            if (LossOf(text, $"the cable's loss at {frequency.Value}") is { } loss)
            {
                points.Add((frequency.Value, loss));
            }
        }

        if (points.Count == table.Entries.Count && !CableLossTable.Create(points).Success)
        {
            _problems.Add(map.ValueLocation(Cable), CableLossTable.Create(points).Error!);
        }

        return points;
    }

    private Ratio? Loss(StrictMap map, string key, string hint)
    {
        var text = map.Text(key, hint);
        return text is null ? null : LossOf(text, hint);
    }

    // Losses are written as positive dB: a "-10 dB" attenuator is a mistake worth naming.
    private Ratio? LossOf(YamlText text, string what)
    {
        var parsed = Ratio.Parse(text.Value);
        if (!parsed.Success)
        {
            _problems.Add(text, $"{parsed.Error} ({what})");
            return null;
        }

        if (parsed.Value.Decibels < 0)
        {
            _problems.Add(text, $"{what} is written as a positive loss; found {parsed.Value} (write \"{-parsed.Value.Decibels} dB\")");
            return null;
        }

        return parsed.Value;
    }
}
