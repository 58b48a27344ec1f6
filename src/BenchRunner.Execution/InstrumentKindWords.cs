using BenchRunner.Instruments.Profiles;

namespace BenchRunner.Execution;

/// <summary>The words bench and plan files use for the kinds of instrument, the same as driver profiles use.</summary>
public static class InstrumentKindWords
{
    /// <summary>Each kind with its word: network-analyser, spectrum-analyser, signal-generator.</summary>
    public static readonly IReadOnlyList<(string Word, InstrumentKind Value)> All =
    [
        ("network-analyser", InstrumentKind.NetworkAnalyser),
        ("spectrum-analyser", InstrumentKind.SpectrumAnalyser),
        ("signal-generator", InstrumentKind.SignalGenerator),
    ];

    /// <summary>The word for <paramref name="kind"/>.</summary>
    public static string Of(InstrumentKind kind) => All.First(k => k.Value == kind).Word;

    /// <summary>True for the kinds with an RF input that a declared maximum input level protects.</summary>
    public static bool IsAnalyser(InstrumentKind kind) => kind is InstrumentKind.NetworkAnalyser or InstrumentKind.SpectrumAnalyser;
}
