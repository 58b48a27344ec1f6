using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Execution.Running;

namespace BenchRunner.Cli.Demo;

/// <summary>One demo board's run: its outcome and the figures of its passband trace.</summary>
public sealed record DemoBoardResult(string Serial, RunOutcome Outcome, IReadOnlyList<NamedFigure> Figures)
{
    /// <summary>The value of figure <paramref name="key"/>, or null.</summary>
    public Quantity? Figure(FigureKey key) => Figures.FirstOrDefault(f => f.Key == key)?.Value;

    /// <summary>The mask check's margin in dB, or null.</summary>
    public double? MaskMargin => Outcome.Checks.FirstOrDefault(c => c.Name.StartsWith("mask ", StringComparison.Ordinal))?.Margin;
}
