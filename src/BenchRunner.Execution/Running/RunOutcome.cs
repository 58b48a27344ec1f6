using BenchRunner.Storage;
using BenchRunner.Core.Runs;

namespace BenchRunner.Execution.Running;

/// <summary>How a run ended.</summary>
/// <param name="RunId">The run's id in the result store, when there is one.</param>
/// <param name="Status">Passed, failed, error or stopped.</param>
/// <param name="Checks">Every check, in order.</param>
/// <param name="Error">What went wrong, for <see cref="RunStatus.Error"/>.</param>
public sealed record RunOutcome(long? RunId, RunStatus Status, IReadOnlyList<CheckResult> Checks, string? Error);
