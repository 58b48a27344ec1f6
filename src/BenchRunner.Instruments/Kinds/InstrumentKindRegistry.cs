using BenchRunner.Core.Yaml;
using BenchRunner.Instruments.Profiles;

namespace BenchRunner.Instruments.Kinds;

/// <summary>
/// The kinds of instrument that bench, plan and profile files may name, in registration order.
/// A registry is immutable: <see cref="Add"/> returns a new registry and leaves the one it was
/// called on as it was, so <see cref="BuiltIn"/> is never changed by a caller (or a test) that
/// adds a kind of its own. Every lookup of a kind by word or by capability goes through here.
/// </summary>
public sealed class InstrumentKindRegistry
{
    private readonly IReadOnlyList<InstrumentKind> _kinds;

    private InstrumentKindRegistry(IReadOnlyList<InstrumentKind> kinds)
    {
        _kinds = kinds;
        Words = [.. kinds.Select(k => (k.Word, k))];
    }

    /// <summary>No kind at all; start here to build a registry without the built-in kinds.</summary>
    public static InstrumentKindRegistry Empty { get; } = new([]);

    /// <summary>
    /// The kinds BenchRunner knows: network analyser, spectrum analyser, signal generator. This is
    /// the one place where a kind that ships with BenchRunner is registered.
    /// </summary>
    public static InstrumentKindRegistry BuiltIn { get; } = Empty
        .Add(InstrumentKind.NetworkAnalyser)
        .Add(InstrumentKind.SpectrumAnalyser)
        .Add(InstrumentKind.SignalGenerator);

    /// <summary>The kinds, in registration order (the order of every list of words in messages).</summary>
    public IReadOnlyList<InstrumentKind> Kinds => _kinds;

    /// <summary>Each kind with its word, for reading files.</summary>
    public IReadOnlyList<(string Word, InstrumentKind Value)> Words { get; }

    /// <summary>The words as a message lists them: <c>network-analyser, spectrum-analyser or signal-generator</c>.</summary>
    public string Choices => _kinds.Count switch
    {
        0 => "(no kind is registered)",
        1 => _kinds[0].Word,
        _ => string.Join(", ", _kinds.Take(_kinds.Count - 1).Select(k => k.Word)) + " or " + _kinds[^1].Word,
    };

    /// <summary>A registry with the kinds of this one and <paramref name="kind"/> after them.</summary>
    /// <exception cref="ArgumentException">
    /// The kind's word (in any letter case) or its capability is registered already, or its word is
    /// a key of the driver profile format, where it could not be told from that key.
    /// </exception>
    public InstrumentKindRegistry Add(InstrumentKind kind)
    {
        ArgumentNullException.ThrowIfNull(kind);
        if (_kinds.FirstOrDefault(k => string.Equals(k.Word, kind.Word, StringComparison.OrdinalIgnoreCase)) is { } sameWord)
        {
            throw new ArgumentException($"A kind with the word \"{sameWord.Word}\" is registered already.", nameof(kind));
        }

        if (_kinds.FirstOrDefault(k => k.Capability == kind.Capability) is { } sameCapability)
        {
            throw new ArgumentException(
                $"The kind \"{kind.Word}\" provides {kind.Capability.Name}, which \"{sameCapability.Word}\" provides already; each capability belongs to one kind.",
                nameof(kind));
        }

        if (DriverProfileKeys.IsReserved(kind.Word))
        {
            throw new ArgumentException($"The kind word \"{kind.Word}\" is a key of the driver profile format and cannot name a kind.", nameof(kind));
        }

        return new InstrumentKindRegistry([.. _kinds, kind]);
    }

    /// <summary>The kind with the word <paramref name="word"/> (any letter case), or null.</summary>
    public InstrumentKind? Find(string word)
    {
        ArgumentNullException.ThrowIfNull(word);
        return _kinds.FirstOrDefault(k => string.Equals(k.Word, word.Trim(), StringComparison.OrdinalIgnoreCase));
    }

    /// <summary>The kind that provides the capability <paramref name="capability"/>, or null.</summary>
    public InstrumentKind? ForCapability(Type capability)
    {
        ArgumentNullException.ThrowIfNull(capability);
        return _kinds.FirstOrDefault(k => k.Capability == capability);
    }

    /// <summary>True when <paramref name="kind"/> is registered here.</summary>
    public bool Contains(InstrumentKind kind) => _kinds.Contains(kind);

    /// <summary>
    /// Reads <paramref name="text"/> as a kind's word (any letter case); anything else is reported
    /// as <see cref="StrictMap.WordOf{T}"/> reports an unknown word, with the registered words.
    /// </summary>
    public InstrumentKind? WordOf(YamlText text, string what, YamlProblems problems)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(problems);
        if (Find(text.Value) is { } kind)
        {
            return kind;
        }

        problems.Add(text.Location, $"unknown value \"{text.Value}\" for \"{what}\"; expected one of {string.Join(", ", _kinds.Select(k => k.Word))}");
        return null;
    }

    /// <summary>The value of <paramref name="key"/> in <paramref name="map"/> as a kind's word, like <see cref="StrictMap.Word{T}"/>.</summary>
    public InstrumentKind? Word(StrictMap map, string key, string? missingHint = null)
    {
        ArgumentNullException.ThrowIfNull(map);
        var text = map.Text(key, missingHint);
        return text is null ? null : WordOf(text, key, map.Problems);
    }
}
