using BenchRunner.Core.Masks;
using BenchRunner.Core.Traces;

namespace BenchRunner.Execution.Tuning;

/// <summary>What one sweep of a tuning session showed, for the live view and the log.</summary>
/// <param name="Sweep">The sweep's number in the session: 1, 2, ...</param>
/// <param name="At">When the pass finished (the session's clock).</param>
/// <param name="Elapsed">The time since the session started.</param>
/// <param name="Trace">The trace being tuned (see <see cref="TuningTargets.Trace"/>), or null when it was not acquired.</param>
/// <param name="Mask">The evaluation of that trace against its mask, or null when the plan checks it against none.</param>
/// <param name="Figures">The figures that matter, with their change and target.</param>
/// <param name="FailedChecks">The names of this pass's checks that failed (empty when all were inside).</param>
/// <param name="Settle">Where the session stands on settling.</param>
public sealed record TuningPass(int Sweep, DateTimeOffset At, TimeSpan Elapsed, Trace? Trace, MaskEvaluation? Mask,
    IReadOnlyList<TuningFigure> Figures, IReadOnlyList<string> FailedChecks, SettleProgress Settle);
