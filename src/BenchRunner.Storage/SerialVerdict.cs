using BenchRunner.Core.Runs;
namespace BenchRunner.Storage;

/// <summary>
/// A board's verdict: the status of its latest single or batch run that ended passed or failed
/// (stopped or unfinished runs and tuning sessions give no verdict). A row of the
/// <c>latest_verdicts</c> view.
/// </summary>
/// <param name="DutSerial">The board's serial number.</param>
/// <param name="Lot">The lot of that run.</param>
/// <param name="RunId">The run whose verdict counts.</param>
/// <param name="Verdict">Its status: <see cref="RunStatus.Passed"/> or <see cref="RunStatus.Failed"/>.</param>
/// <param name="StartedUtc">When it started.</param>
/// <param name="Runs">How many single or batch runs the board has had in all, with or without a verdict.</param>
public sealed record SerialVerdict(string DutSerial, string? Lot, long RunId, RunStatus Verdict, DateTimeOffset StartedUtc, int Runs);
