using BenchRunner.Core.Yaml;
using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using static BenchRunner.Core.Masks.MaskFileKeys;

namespace BenchRunner.Core.Masks;

/// <summary>
/// Turns the YAML tree of a mask file into a <see cref="LimitMask"/>, checking everything the
/// mask's constructor would refuse so that each problem is reported at its token.
/// </summary>
internal sealed class MaskFileReader
{
    private const string CornerExample = "131 MHz: -25 dB";

    private readonly string _source;
    private MaskReference _reference;
    private MaskInterpolation _interpolation;
    private TraceQuantity? _parameter;
    private TraceUnit? _unit;
    private string? _unitOrigin;

    private MaskFileReader(string source) => _source = source;

    public static LimitMask Read(string text, string source)
    {
        var root = YamlTreeReader.Read(text, source)
            ?? throw new InputFormatException(new SourceLocation(source, 1, 1),
                "the file holds no mask; expected keys such as \"mask:\", \"upper:\" and \"lower:\"");
        return new MaskFileReader(source).ReadMask(root);
    }

    public static LimitMask ReadTree(YamlItem root, string source) => new MaskFileReader(source).ReadMask(root);

    private LimitMask ReadMask(YamlItem root)
    {
        if (root is not YamlMap map)
        {
            throw new InputFormatException(root.Location,
                $"expected a mask: a mapping with keys such as \"mask:\", \"upper:\" and \"lower:\"; found {Describe(root)}");
        }

        var entries = new Dictionary<string, KeyValuePair<YamlText, YamlItem>>(StringComparer.Ordinal);
        foreach (var entry in map.Entries)
        {
            if (!All.Contains(entry.Key.Value))
            {
                throw new InputFormatException(entry.Key.Location,
                    $"unknown key \"{entry.Key.Value}\"; expected one of {string.Join(", ", All)}");
            }

            entries.Add(entry.Key.Value, entry);
        }

        if (!entries.TryGetValue(Mask, out var nameEntry))
        {
            throw new InputFormatException(map.Location, $"missing key \"{Mask}\"; every mask needs a name, e.g. \"mask: psf-137-passband\"");
        }

        var name = ReadText(nameEntry);
        if (name.Contains('\n'))
        {
            throw new InputFormatException(nameEntry.Value.Location, "a mask's name must be on one line");
        }

        string? description = entries.TryGetValue(Description, out var d) ? ReadText(d) : null;
        _parameter = entries.TryGetValue(AppliesTo, out var a) ? ReadWord(a, QuantityWords) : null;
        _interpolation = entries.TryGetValue(Interpolation, out var i) ? ReadWord(i, Interpolations) : MaskInterpolation.Linear;
        _reference = entries.TryGetValue(Reference, out var r) ? ReadWord(r, References) : MaskReference.Absolute;
        if (_parameter is { } p)
        {
            _unit = p == TraceQuantity.Power ? TraceUnit.DecibelMilliwatt : TraceUnit.Decibel;
            _unitOrigin = $"\"{AppliesTo}: {WordFor(QuantityWords, p)}\"";
        }

        // Sides in file order, so that the first level written is the one that fixes the unit.
        LimitLine? upper = null, lower = null;
        foreach (var entry in map.Entries.Where(e => e.Key.Value is Upper or Lower))
        {
            var line = ReadLine(entry);
            if (entry.Key.Value == Upper) upper = line;
            else lower = line;
        }

        if (upper is null && lower is null)
        {
            throw new InputFormatException(map.Location,
                $"the mask \"{name}\" has no limit; add \"{Upper}:\" or \"{Lower}:\" with a list of corners such as \"- {CornerExample}\"");
        }

        if (_reference == MaskReference.Absolute && _unit is null)
        {
            // Unreachable: an absolute line always has a level that fixes the unit.
            throw new InvalidOperationException("An absolute mask was read without a unit.");
        }

        return new LimitMask(name, upper, lower, _reference == MaskReference.Absolute ? _unit : null,
            _reference, _interpolation, _parameter, description);
    }

    private static string ReadText(KeyValuePair<YamlText, YamlItem> entry)
    {
        if (entry.Value is not YamlText text || text.IsNull || string.IsNullOrWhiteSpace(text.Value))
        {
            throw new InputFormatException(ValueLocation(entry), $"expected text for \"{entry.Key.Value}\", found {Describe(entry.Value)}");
        }

        return text.Value.Trim();
    }

    private static T ReadWord<T>(KeyValuePair<YamlText, YamlItem> entry, IReadOnlyList<(string Word, T Value)> words)
        where T : struct, Enum
    {
        var choices = string.Join(", ", words.Select(w => w.Word));
        if (entry.Value is not YamlText text || text.IsNull)
        {
            throw new InputFormatException(ValueLocation(entry),
                $"expected one of {choices} for \"{entry.Key.Value}\", found {Describe(entry.Value)}");
        }

        foreach (var (word, value) in words)
        {
            if (string.Equals(word, text.Value.Trim(), StringComparison.OrdinalIgnoreCase))
            {
                return value;
            }
        }

        throw new InputFormatException(text.Location,
            $"unknown value \"{text.Value}\" for \"{entry.Key.Value}\"; expected one of {choices}");
    }

    private LimitLine ReadLine(KeyValuePair<YamlText, YamlItem> entry)
    {
        var side = entry.Key.Value;
        if (entry.Value is not YamlList list)
        {
            throw new InputFormatException(ValueLocation(entry),
                $"expected a list of corners under \"{side}\", one per line such as \"- {CornerExample}\"; found {Describe(entry.Value)}");
        }

        if (list.Items.Count == 0)
        {
            throw new InputFormatException(list.Location,
                $"\"{side}\" has no corners; a limit needs corners at two or more frequencies to cover a span");
        }

        var sections = new List<List<MaskCorner>>();
        var current = new List<MaskCorner>();
        (MaskCorner Corner, YamlText Key)? previous = null, sectionStart = null;
        YamlText? lastGap = null;
        int sameFrequency = 0;

        foreach (var item in list.Items)
        {
            if (item is YamlText { IsPlain: true, Value: Gap } gap)
            {
                if (current.Count == 0)
                {
                    throw new InputFormatException(gap.Location, sections.Count == 0
                        ? $"\"{side}\" cannot begin with \"{Gap}\"; a gap stands between two sections of corners"
                        : $"two gaps in a row; a gap stands between two sections of corners");
                }

                CheckSpan(current, sectionStart!.Value.Key, previous!.Value.Key, side);
                sections.Add(current);
                current = [];
                lastGap = gap;
                continue;
            }

            var (corner, key) = ReadCorner(item, side);
            if (previous is { } p)
            {
                if (corner.Frequency < p.Corner.Frequency)
                {
                    throw new InputFormatException(key.Location,
                        $"corner frequencies must not decrease: {corner.Frequency} after {p.Corner.Frequency}");
                }

                sameFrequency = corner.Frequency == p.Corner.Frequency ? sameFrequency + 1 : 1;
                if (sameFrequency > 2)
                {
                    throw new InputFormatException(key.Location,
                        $"a third corner at {corner.Frequency}; a vertical step is exactly two corners at one frequency");
                }
            }
            else
            {
                sameFrequency = 1;
            }

            if (current.Count == 0)
            {
                sectionStart = (corner, key);
            }

            current.Add(corner);
            previous = (corner, key);
        }

        if (current.Count == 0)
        {
            throw new InputFormatException(lastGap!.Location, $"\"{side}\" cannot end with \"{Gap}\"; a gap stands between two sections of corners");
        }

        CheckSpan(current, sectionStart!.Value.Key, previous!.Value.Key, side);
        sections.Add(current);
        return LimitLine.FromSections(sections);
    }

    private static void CheckSpan(List<MaskCorner> section, YamlText firstKey, YamlText lastKey, string side)
    {
        if (section.Count == 1)
        {
            throw new InputFormatException(firstKey.Location,
                $"only one corner in this section of \"{side}\"; a limit needs corners at two or more frequencies to cover a span");
        }

        if (section[0].Frequency == section[^1].Frequency)
        {
            throw new InputFormatException(lastKey.Location,
                $"this section of \"{side}\" covers only {section[0].Frequency}; a limit needs corners at two or more frequencies to cover a span");
        }
    }

    private (MaskCorner Corner, YamlText Key) ReadCorner(YamlItem item, string side)
    {
        if (item is not YamlMap map || map.Entries.Count == 0)
        {
            throw new InputFormatException(item.Location,
                $"expected a corner such as \"{CornerExample}\" (a space after the colon) or \"{Gap}\" in \"{side}\"; found {Describe(item)}");
        }

        if (map.Entries.Count > 1)
        {
            throw new InputFormatException(map.Entries[1].Key.Location, "one corner per list item; begin the next corner with \"- \"");
        }

        var (key, value) = map.Entries[0];
        var frequency = ReadFrequency(key);
        if (_interpolation == MaskInterpolation.Logarithmic && frequency.Hertz <= 0)
        {
            throw new InputFormatException(key.Location, "a corner at 0 Hz cannot be used with \"interpolation: log\"; start above 0 Hz");
        }

        if (value is not YamlText levelText || levelText.IsNull)
        {
            throw new InputFormatException(value is YamlText ? key.Location : value.Location,
                $"expected {ExpectedLevel()} for the corner at {frequency}; found {Describe(value)}");
        }

        return (new MaskCorner(frequency, ReadLevel(levelText)), key);
    }

    private static Frequency ReadFrequency(YamlText key)
    {
        const string expected = "a frequency such as \"137.5 MHz\"";
        var split = QuantityText.Split(key.Value, expected);
        if (split.Success && split.Value.Unit.Length == 0)
        {
            throw new InputFormatException(key.Location, $"\"{key.Value.Trim()}\" has no unit; expected {expected}");
        }

        var parsed = Frequency.Parse(key.Value);
        return parsed.Success ? parsed.Value : throw new InputFormatException(key.Location, parsed.Error);
    }

    private double ReadLevel(YamlText text)
    {
        var split = QuantityText.Split(text.Value, ExpectedLevel());
        if (!split.Success)
        {
            throw new InputFormatException(text.Location, split.Error);
        }

        var written = text.Value.Trim();
        TraceUnit unit;
        double value;
        switch (split.Value.Unit.ToLowerInvariant())
        {
            case "db":
                unit = TraceUnit.Decibel;
                value = Ratio.Parse(text.Value).GetValueOrThrow().Decibels;
                break;
            case "dbm":
                unit = TraceUnit.DecibelMilliwatt;
                value = Level.Parse(text.Value).GetValueOrThrow().Dbm;
                break;
            case "":
                throw new InputFormatException(text.Location, $"\"{written}\" has no unit; expected {ExpectedLevel()}");
            default:
                throw new InputFormatException(text.Location,
                    $"unknown level unit \"{split.Value.Unit}\" in \"{written}\"; expected {ExpectedLevel()}");
        }

        if (_reference == MaskReference.RelativeToPeak)
        {
            if (unit != TraceUnit.Decibel)
            {
                throw new InputFormatException(text.Location,
                    $"\"{written}\" is an absolute level, but \"{Reference}: peak\" takes levels in dB from the peak, such as \"-30 dB\"");
            }

            return value;
        }

        if (_unit is null)
        {
            _unit = unit;
            _unitOrigin = $"\"{written}\" at line {text.Location.Line}";
        }
        else if (_unit != unit)
        {
            throw new InputFormatException(text.Location,
                $"\"{written}\" is in {Symbol(unit)}, but this mask's levels are in {Symbol(_unit.Value)} (set by {_unitOrigin})");
        }

        return value;
    }

    private string ExpectedLevel() =>
        _reference == MaskReference.RelativeToPeak ? "a level in dB from the peak such as \"-30 dB\""
        : _unit == TraceUnit.DecibelMilliwatt ? "a level in dBm such as \"-30 dBm\""
        : _unit == TraceUnit.Decibel ? "a level in dB such as \"-25 dB\""
        : "a level such as \"-25 dB\" (S-parameters) or \"-30 dBm\" (power)";

    private static string Symbol(TraceUnit unit) => unit == TraceUnit.Decibel ? "dB" : "dBm";

    private static string Describe(YamlItem item) => item is YamlText { IsNull: false } t ? $"\"{t.Value}\"" : item.Kind;

    // An empty value's own mark lies after the key, often on the next line; the key is clearer.
    private static SourceLocation ValueLocation(KeyValuePair<YamlText, YamlItem> entry) =>
        entry.Value is YamlText { IsNull: true } ? entry.Key.Location : entry.Value.Location;
}
