using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Masks;

/// <summary>
/// A run of consecutive measured points that break the same limit. It runs from the first to
/// the last failing point's frequency, both included (a single failing point gives
/// <paramref name="Start"/> = <paramref name="Stop"/>); the true crossing lies somewhere between
/// that point and its passing neighbour, which the measurement cannot resolve.
/// </summary>
/// <param name="Start">The frequency of the first failing point.</param>
/// <param name="Stop">The frequency of the last failing point.</param>
/// <param name="Side">The limit that is broken.</param>
/// <param name="WorstMarginDb">The most negative margin within the span, in dB.</param>
public sealed record FailingSpan(Frequency Start, Frequency Stop, LimitSide Side, double WorstMarginDb);
