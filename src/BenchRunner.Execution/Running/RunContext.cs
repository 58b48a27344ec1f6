using BenchRunner.Storage;
using BenchRunner.Core.Runs;

namespace BenchRunner.Execution.Running;

/// <summary>What is recorded with a run besides the plan itself.</summary>
/// <param name="PlanText">The plan file's text (stored with its SHA-256).</param>
/// <param name="BenchText">The bench file's text, if any.</param>
/// <param name="SoftwareVersion">BenchRunner's version.</param>
/// <param name="Host">The computer's name.</param>
public sealed record RunContext(string PlanText, string? BenchText, string SoftwareVersion, string Host)
{
    /// <summary>Who ran it.</summary>
    public string? Operator { get; init; }

    /// <summary>The board's serial number.</summary>
    public string? DutSerial { get; init; }

    /// <summary>The lot the board belongs to.</summary>
    public string? Lot { get; init; }

    /// <summary>Whether this board was tested before.</summary>
    public bool IsRetest { get; init; }

    /// <summary>The kind of run recorded; <see cref="RunMode.Single"/> by default.</summary>
    public RunMode Mode { get; init; } = RunMode.Single;

    /// <summary>
    /// Asked when the run is stopped by cancellation: the text recorded as why, e.g.
    /// <c>stopped: the time limit of 600 s was reached</c>. Null, or a null or blank answer,
    /// records <see cref="PlanRunner.StoppedByOperator"/>.
    /// </summary>
    public Func<string?>? StopReason { get; init; }

    /// <summary>
    /// A gentle stop: when cancelled, the run stops at the next step boundary. A step that drives an
    /// instrument (<see cref="Plans.StepKind.DrivesInstrument"/>) finishes first, so a sweep in flight is
    /// completed and kept; a wait or any other step ends at once. The token given to the run itself
    /// cuts it short at once. None by default.
    /// </summary>
    public CancellationToken StopAtNextStep { get; init; }

    /// <summary>
    /// Told the run's id in the result store as soon as its start is recorded (a status board, a log),
    /// or null when the start could not be recorded or nothing is recorded. Called once.
    /// </summary>
    public Action<long?>? Recorded { get; init; }
}
