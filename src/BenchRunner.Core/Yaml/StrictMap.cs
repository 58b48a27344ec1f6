using System.Globalization;
using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Yaml;

/// <summary>
/// A strict view of one YAML mapping for file readers (profiles, plans, bench files): only the
/// keys it is given are allowed, required keys must be present, and each value must be of the
/// expected kind. Every problem goes to a <see cref="YamlProblems"/> with its location, and the
/// reading methods return null for a missing or wrong value, so that a reader can carry on and
/// report all problems of a file at once.
/// </summary>
public sealed class StrictMap
{
    private readonly Dictionary<string, KeyValuePair<YamlText, YamlItem>> _entries;

    private StrictMap(YamlMap map, string context, SourceLocation missingAt, YamlProblems problems,
        Dictionary<string, KeyValuePair<YamlText, YamlItem>> entries)
    {
        Map = map;
        Context = context;
        MissingAt = missingAt;
        Problems = problems;
        _entries = entries;
    }

    /// <summary>The mapping read.</summary>
    public YamlMap Map { get; }

    /// <summary>How messages name the mapping, e.g. <c>"framing"</c> or <c>the profile</c>.</summary>
    public string Context { get; }

    /// <summary>Where a missing key is reported: the mapping's own key, or its start.</summary>
    public SourceLocation MissingAt { get; }

    /// <summary>Where problems go.</summary>
    public YamlProblems Problems { get; }

    /// <summary>
    /// Opens <paramref name="item"/> as a mapping whose keys must be among <paramref name="keys"/>.
    /// Reports a non-mapping (and returns null) and every unknown key (which is then ignored).
    /// </summary>
    /// <param name="item">The node to read.</param>
    /// <param name="context">How messages name the mapping, e.g. <c>"framing"</c> (with quotes) or <c>the profile</c>.</param>
    /// <param name="keys">The keys allowed, in the order messages list them.</param>
    /// <param name="problems">Where problems go.</param>
    /// <param name="at">Where to report a wrong kind or a missing key; the item's own start by default.</param>
    public static StrictMap? Open(YamlItem item, string context, IReadOnlyList<string> keys, YamlProblems problems, SourceLocation? at = null)
    {
        ArgumentNullException.ThrowIfNull(item);
        ArgumentNullException.ThrowIfNull(keys);
        ArgumentNullException.ThrowIfNull(problems);
        if (item is not YamlMap map)
        {
            var some = string.Join(", ", keys.Take(3).Select(k => $"\"{k}:\""));
            problems.Add(item is YamlText { IsNull: true } && at is { } place ? place : item.Location,
                $"expected {context} to be a mapping with keys such as {some}; found {Describe(item)}");
            return null;
        }

        var entries = new Dictionary<string, KeyValuePair<YamlText, YamlItem>>(StringComparer.Ordinal);
        foreach (var entry in map.Entries)
        {
            if (keys.Contains(entry.Key.Value, StringComparer.Ordinal))
            {
                entries.Add(entry.Key.Value, entry);
            }
            else
            {
                problems.Add(entry.Key.Location, $"unknown key \"{entry.Key.Value}\" in {context}; expected one of {string.Join(", ", keys)}");
            }
        }

        return new StrictMap(map, context, at ?? map.Location, problems, entries);
    }

    /// <summary>Describes a node for messages: its text in quotes, or its kind ("a list", "nothing").</summary>
    public static string Describe(YamlItem item) =>
        item is YamlText { IsNull: false } t ? $"\"{t.Value}\"" : item.Kind;

    /// <summary>True when <paramref name="key"/> is present (with any value).</summary>
    public bool Has(string key) => _entries.ContainsKey(key);

    /// <summary>The key node of <paramref name="key"/>, or null when absent.</summary>
    public YamlText? Key(string key) => _entries.TryGetValue(key, out var e) ? e.Key : null;

    /// <summary>The value of <paramref name="key"/>, or null when absent.</summary>
    public YamlItem? Get(string key) => _entries.TryGetValue(key, out var e) ? e.Value : null;

    /// <summary>
    /// Where to report a problem with the value of <paramref name="key"/>: the value, or the key
    /// when the value is empty (an empty value's own mark lies after the key, often on the next line).
    /// </summary>
    public SourceLocation ValueLocation(string key) =>
        _entries.TryGetValue(key, out var e)
            ? e.Value is YamlText { IsNull: true } ? e.Key.Location : e.Value.Location
            : MissingAt;

    /// <summary>Reports <paramref name="key"/> as missing when absent; returns its value otherwise.</summary>
    public YamlItem? Require(string key, string hint)
    {
        var value = Get(key);
        if (value is null)
        {
            Problems.Add(MissingAt, $"missing key \"{key}\" in {Context}; {hint}");
        }

        return value;
    }

    /// <summary>
    /// The value of <paramref name="key"/> as one non-empty piece of text. Null when absent
    /// (reported when <paramref name="missingHint"/> is given, which makes the key required) or
    /// not text (reported).
    /// </summary>
    public YamlText? Text(string key, string? missingHint = null)
    {
        var value = Find(key, missingHint);
        if (value is null)
        {
            return null;
        }

        if (value is YamlText { IsNull: false } text && !string.IsNullOrWhiteSpace(text.Value))
        {
            return text;
        }

        Problems.Add(ValueLocation(key), $"expected text for \"{key}\", found {Describe(value)}");
        return null;
    }

    /// <summary>The value of <paramref name="key"/> as a strict mapping with the allowed <paramref name="keys"/>.</summary>
    public StrictMap? Mapping(string key, IReadOnlyList<string> keys, string? missingHint = null)
    {
        var value = Find(key, missingHint);
        return value is null ? null : Open(value, $"\"{key}\"", keys, Problems, Key(key)!.Location);
    }

    /// <summary>The value of <paramref name="key"/> as a list; <paramref name="expected"/> says of what, for messages.</summary>
    public YamlList? List(string key, string expected, string? missingHint = null)
    {
        var value = Find(key, missingHint);
        if (value is null)
        {
            return null;
        }

        if (value is YamlList list)
        {
            return list;
        }

        Problems.Add(ValueLocation(key), $"expected a list of {expected} for \"{key}\", found {Describe(value)}");
        return null;
    }

    /// <summary>The value of <paramref name="key"/> as one of <paramref name="words"/> (any letter case).</summary>
    public T? Word<T>(string key, IReadOnlyList<(string Word, T Value)> words, string? missingHint = null)
        where T : struct
    {
        var text = Text(key, missingHint);
        return text is null ? null : WordOf(text, key, words, Problems);
    }

    /// <summary>Reads <paramref name="text"/> as one of <paramref name="words"/> (any letter case); reports anything else.</summary>
    public static T? WordOf<T>(YamlText text, string what, IReadOnlyList<(string Word, T Value)> words, YamlProblems problems)
        where T : struct
    {
        foreach (var (word, value) in words)
        {
            if (string.Equals(word, text.Value.Trim(), StringComparison.OrdinalIgnoreCase))
            {
                return value;
            }
        }

        problems.Add(text.Location, $"unknown value \"{text.Value}\" for \"{what}\"; expected one of {string.Join(", ", words.Select(w => w.Word))}");
        return null;
    }

    /// <summary>The value of <paramref name="key"/> as <c>true</c> or <c>false</c>.</summary>
    public bool? Bool(string key, string? missingHint = null)
    {
        var text = Text(key, missingHint);
        if (text is null)
        {
            return null;
        }

        switch (text.Value.Trim().ToLowerInvariant())
        {
            case "true": return true;
            case "false": return false;
            default:
                Problems.Add(text.Location, $"expected true or false for \"{key}\", found \"{text.Value}\"");
                return null;
        }
    }

    /// <summary>The value of <paramref name="key"/> as a whole number from <paramref name="min"/> to <paramref name="max"/>.</summary>
    public int? Integer(string key, int min, int max, string? missingHint = null)
    {
        var text = Text(key, missingHint);
        if (text is null)
        {
            return null;
        }

        if (!int.TryParse(text.Value.Trim(), NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var value))
        {
            Problems.Add(text.Location, $"expected a whole number for \"{key}\", found \"{text.Value}\"");
            return null;
        }

        if (value < min || value > max)
        {
            Problems.Add(text.Location, $"\"{key}\" must be from {min} to {max}, found {value}");
            return null;
        }

        return value;
    }

    /// <summary>The value of <paramref name="key"/> as a finite number (invariant culture, optional exponent).</summary>
    public double? Number(string key, string? missingHint = null)
    {
        var text = Text(key, missingHint);
        if (text is null)
        {
            return null;
        }

        if (double.TryParse(text.Value.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out var value) && double.IsFinite(value))
        {
            return value;
        }

        Problems.Add(text.Location, $"expected a number such as \"0.01\" or \"-3.5\" for \"{key}\", found \"{text.Value}\"");
        return null;
    }

    /// <summary>
    /// The value of <paramref name="key"/> parsed by <paramref name="parse"/> (for example
    /// <see cref="Level.Parse"/> or <see cref="DurationText.Parse"/>); a failure is reported with the parser's message.
    /// </summary>
    public T? Parsed<T>(string key, Func<string, ParseResult<T>> parse, string? missingHint = null)
        where T : struct
    {
        ArgumentNullException.ThrowIfNull(parse);
        var text = Text(key, missingHint);
        if (text is null)
        {
            return null;
        }

        var result = parse(text.Value);
        if (result.Success)
        {
            return result.Value;
        }

        Problems.Add(text.Location, result.Error);
        return null;
    }

    /// <summary>
    /// The value of <paramref name="key"/> as a frequency with its unit (<c>137.5 MHz</c>); a bare
    /// number is refused, because a forgotten <c>MHz</c> would silently mean hertz.
    /// </summary>
    public Frequency? FrequencyWithUnit(string key, string? missingHint = null)
    {
        var text = Text(key, missingHint);
        if (text is null)
        {
            return null;
        }

        var result = Frequency.Parse(text.Value);
        if (!result.Success)
        {
            Problems.Add(text.Location, result.Error);
            return null;
        }

        if (!text.Value.TrimEnd().EndsWith("hz", StringComparison.OrdinalIgnoreCase))
        {
            Problems.Add(text.Location, $"\"{text.Value.Trim()}\" has no unit; expected a frequency such as \"137.5 MHz\"");
            return null;
        }

        return result.Value;
    }

    private YamlItem? Find(string key, string? missingHint) =>
        missingHint is null ? Get(key) : Require(key, missingHint);
}
