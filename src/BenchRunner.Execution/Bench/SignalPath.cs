using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Execution.Bench;

/// <summary>
/// The wiring from one instrument's output to another's input, with its total gain in dB:
/// negative through cables and attenuators, positive through an amplifier.
/// </summary>
/// <param name="From">The role whose output feeds the path (usually a generator).</param>
/// <param name="To">The role whose input the path reaches (usually an analyser).</param>
/// <param name="Gain">The path's gain; a loss of 21 dB is -21 dB.</param>
/// <param name="Location">Where the path is declared in the bench file.</param>
public sealed record SignalPath(string From, string To, Ratio Gain, SourceLocation Location)
{
    /// <summary>The path as the bench file writes it, e.g. <c>gen -> sa</c>.</summary>
    public string Label => $"{From} -> {To}";
}
