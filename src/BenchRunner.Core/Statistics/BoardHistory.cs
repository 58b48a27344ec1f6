namespace BenchRunner.Core.Statistics;

/// <summary>Every test of one board, oldest first; the last one is the board's verdict.</summary>
/// <param name="Serial">The board's serial number.</param>
/// <param name="Tests">Its tests in time order.</param>
public sealed record BoardHistory(string Serial, IReadOnlyList<BoardTest> Tests);
