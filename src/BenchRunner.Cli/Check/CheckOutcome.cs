using BenchRunner.Core.Figures;
using BenchRunner.Core.Masks;
using BenchRunner.Core.Traces;

namespace BenchRunner.Cli.Check;

/// <summary>What an offline check found: the trace checked, the mask, its verdict and the figures.</summary>
/// <param name="TracePath">The trace file as the user named it.</param>
/// <param name="MaskPath">The mask file as the user named it.</param>
/// <param name="Mask">The mask.</param>
/// <param name="Trace">The trace the mask was applied to.</param>
/// <param name="Evaluation">The mask's verdict on the trace.</param>
/// <param name="Figures">The figures computed from the trace.</param>
public sealed record CheckOutcome(
    string TracePath,
    string MaskPath,
    LimitMask Mask,
    Trace Trace,
    MaskEvaluation Evaluation,
    IReadOnlyList<NamedFigure> Figures);
