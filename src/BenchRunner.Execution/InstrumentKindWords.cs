using BenchRunner.Core.Yaml;
using BenchRunner.Instruments.Kinds;

namespace BenchRunner.Execution;

/// <summary>
/// The words bench and plan files use for the kinds of instrument: a view of
/// <see cref="InstrumentKindRegistry.BuiltIn"/>, the same words driver profiles use. Each kind's
/// word is its <see cref="InstrumentKind.Word"/>.
/// </summary>
public static class InstrumentKindWords
{
    /// <summary>The registry the words come from.</summary>
    public static InstrumentKindRegistry Registry => InstrumentKindRegistry.BuiltIn;

    /// <summary>Each kind with its word: network-analyser, spectrum-analyser, signal-generator.</summary>
    public static IReadOnlyList<(string Word, InstrumentKind Value)> All => Registry.Words;

    /// <summary>The word for <paramref name="kind"/>.</summary>
    public static string Of(InstrumentKind kind)
    {
        ArgumentNullException.ThrowIfNull(kind);
        return kind.Word;
    }

    /// <summary>Reads <paramref name="text"/> as a kind's word, reporting anything else (see <see cref="InstrumentKindRegistry.WordOf"/>).</summary>
    public static InstrumentKind? WordOf(YamlText text, string what, YamlProblems problems) => Registry.WordOf(text, what, problems);
}
