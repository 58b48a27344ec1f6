namespace BenchRunner.Storage;

/// <summary>
/// A board's verdict: the status of its latest single or batch run (tuning sessions do not
/// count). A row of the <c>latest_verdicts</c> view.
/// </summary>
/// <param name="DutSerial">The board's serial number.</param>
/// <param name="Lot">The lot of that latest run.</param>
/// <param name="RunId">The latest run.</param>
/// <param name="Verdict">Its status.</param>
/// <param name="StartedUtc">When it started.</param>
/// <param name="Runs">How many single or batch runs the board has had in all.</param>
public sealed record SerialVerdict(string DutSerial, string? Lot, long RunId, RunStatus Verdict, DateTimeOffset StartedUtc, int Runs);
