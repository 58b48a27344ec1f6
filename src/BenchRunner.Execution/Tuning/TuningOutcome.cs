using BenchRunner.Execution.Running;

namespace BenchRunner.Execution.Tuning;

/// <summary>How a tuning session ended.</summary>
/// <param name="Run">The run as the runner ended it (id, status, every check of every sweep).</param>
/// <param name="Sweeps">How many sweeps were completed.</param>
/// <param name="FirstSettledAt">The sweep at which the session first settled, or null if it never did.</param>
/// <param name="Settled">Whether it was settled at its last sweep.</param>
/// <param name="Last">The last completed sweep, or null when none was.</param>
public sealed record TuningOutcome(RunOutcome Run, int Sweeps, int? FirstSettledAt, bool Settled, TuningPass? Last);
