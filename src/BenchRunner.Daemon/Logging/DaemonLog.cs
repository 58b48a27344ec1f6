using BenchRunner.Core.Text;
using Microsoft.Extensions.Logging;
using BenchRunner.Core.Runs;

namespace BenchRunner.Daemon.Logging;

/// <summary>
/// Every event the daemon logs, numbered, in one place. Each is structured: its named values
/// (run id, instrument, plan, verdict) are properties in the log files, not only words in a line.
/// </summary>
internal static partial class DaemonLog
{
    public static void Starting(ILogger log, string bench, string benchFile, string inbox, string database, int scheduleCount) =>
        LogStarting(log, bench, benchFile, inbox, database, scheduleCount, Counted.Noun(scheduleCount, "schedule"));

    [LoggerMessage(1, LogLevel.Information, "Daemon starting: bench {Bench} ({BenchFile}), inbox {Inbox}, results {Database}, {ScheduleCount} {ScheduleWord}", EventName = "Starting")]
    private static partial void LogStarting(ILogger log, string bench, string benchFile, string inbox, string database, int scheduleCount, string scheduleWord);

    [LoggerMessage(2, LogLevel.Warning, "Still marked running from before, now marked interrupted (their committed sweeps are kept): runs {RunIds}")]
    public static partial void InterruptedRuns(ILogger log, string runIds);

    public static void Stopping(ILogger log, int running, double stopWithinSeconds) =>
        LogStopping(log, running, Counted.Noun(running, "run"), stopWithinSeconds);

    [LoggerMessage(3, LogLevel.Information, "Daemon stopping: {Running} {RunWord} in progress, each finishing its sweep in flight (at most {StopWithinSeconds} s)", EventName = "Stopping")]
    private static partial void LogStopping(ILogger log, int running, string runWord, double stopWithinSeconds);

    public static void Stopped(ILogger log, int queued) => LogStopped(log, queued, Counted.Noun(queued, "plan"));

    [LoggerMessage(4, LogLevel.Information, "Daemon stopped; {Queued} queued {PlanWord} left in the inbox for the next start", EventName = "Stopped")]
    private static partial void LogStopped(ILogger log, int queued, string planWord);

    [LoggerMessage(5, LogLevel.Information, "Safety: {Caution}")]
    public static partial void SafetyCaution(ILogger log, string caution);

    [LoggerMessage(10, LogLevel.Information, "Job {JobId} queued: plan {Plan} from {Origin}, instruments {Instruments}")]
    public static partial void Queued(ILogger log, string jobId, string plan, string origin, string instruments);

    public static void Rejected(ILogger log, string planFile, int problemCount, string firstProblem, string target) =>
        LogRejected(log, planFile, problemCount, Counted.Noun(problemCount, "problem"), firstProblem, target);

    [LoggerMessage(11, LogLevel.Warning, "Plan file {PlanFile} rejected ({ProblemCount} {ProblemWord}, first: {FirstProblem}); moved to {Target}", EventName = "Rejected")]
    private static partial void LogRejected(ILogger log, string planFile, int problemCount, string problemWord, string firstProblem, string target);

    [LoggerMessage(12, LogLevel.Information, "Run {RunId} started: job {JobId}, plan {Plan}, instruments {Instruments}, attempt {Attempt}")]
    public static partial void RunStarted(ILogger log, long? runId, string jobId, string plan, string instruments, int attempt);

    public static void SweepStored(ILogger log, long? runId, string instruments, string trace, string instrument, string quantity, int points) =>
        LogSweepStored(log, runId, instruments, trace, instrument, quantity, points, Counted.Noun(points, "point"));

    [LoggerMessage(13, LogLevel.Information, "Run {RunId} on {Instruments}: sweep {Trace} from {Instrument} stored ({Quantity}, {Points} {PointWord})", EventName = "SweepStored")]
    private static partial void LogSweepStored(ILogger log, long? runId, string instruments, string trace, string instrument, string quantity, int points, string pointWord);

    [LoggerMessage(14, LogLevel.Information, "Run {RunId} on {Instruments}: check {Check} {Verdict}: {Detail}")]
    public static partial void CheckVerdict(ILogger log, long? runId, string instruments, string check, string verdict, string detail);

    public static void RunFinished(ILogger log, long? runId, string plan, string instruments, string status, int passedChecks, int checks, string errorText) =>
        LogRunFinished(log, runId, plan, instruments, status, passedChecks, checks, Counted.Noun(checks, "check"), errorText);

    [LoggerMessage(15, LogLevel.Information, "Run {RunId} finished: plan {Plan} on {Instruments} {Status}, {PassedChecks} of {Checks} {CheckWord} passed{ErrorText}", EventName = "RunFinished")]
    private static partial void LogRunFinished(ILogger log, long? runId, string plan, string instruments, string status, int passedChecks, int checks, string checkWord, string errorText);

    [LoggerMessage(16, LogLevel.Information, "Plan file {PlanFile} done; moved to {Target}")]
    public static partial void Filed(ILogger log, string planFile, string target);

    [LoggerMessage(17, LogLevel.Information, "Run {RunId} on {Instruments}: message: {Text}")]
    public static partial void OperatorMessage(ILogger log, long? runId, string instruments, string text);

    [LoggerMessage(18, LogLevel.Information, "Run {RunId} on {Instruments}: stopping ({Reason}); the sweep in flight is finished first")]
    public static partial void StopRequested(ILogger log, long? runId, string instruments, string reason);

    public static void WillRetry(ILogger log, string jobId, string plan, IReadOnlyCollection<string> instruments, int attempt, int attempts) =>
        LogWillRetry(log, jobId, plan, string.Join(", ", instruments), instruments.Count == 1 ? "answers" : "answer", attempt, attempts);

    [LoggerMessage(19, LogLevel.Warning, "Job {JobId} ({Plan}) will run again once {Instruments} {AnswerWord} (attempt {Attempt} of {Attempts})", EventName = "WillRetry")]
    private static partial void LogWillRetry(ILogger log, string jobId, string plan, string instruments, string answerWord, int attempt, int attempts);

    [LoggerMessage(20, LogLevel.Warning, "Instrument {Instrument} faulty: {Fault}; trying again in {WaitSeconds} s (failure {Faults})")]
    public static partial void InstrumentFaulty(ILogger log, string instrument, string fault, int faults, double waitSeconds);

    [LoggerMessage(21, LogLevel.Warning, "Instrument {Instrument} still faulty: {Fault}; trying again in {WaitSeconds} s (failure {Faults})")]
    public static partial void InstrumentStillFaulty(ILogger log, string instrument, string fault, int faults, double waitSeconds);

    [LoggerMessage(22, LogLevel.Information, "Instrument {Instrument} answers again")]
    public static partial void InstrumentBack(ILogger log, string instrument);

    [LoggerMessage(23, LogLevel.Warning, "Run {RunId} ended by an instrument fault on {Instruments}: {Error}")]
    public static partial void RunFault(ILogger log, long? runId, string instruments, string error);

    [LoggerMessage(24, LogLevel.Error, "Job {JobId} ({Plan}) failed unexpectedly: {Error}")]
    public static partial void JobFailed(ILogger log, string jobId, string plan, string error, Exception exception);

    [LoggerMessage(30, LogLevel.Information, "Schedule {Schedule} due at {DueUtc:u}; started {LateSeconds} s after its due time")]
    public static partial void ScheduleDue(ILogger log, string schedule, DateTimeOffset dueUtc, double lateSeconds);

    [LoggerMessage(31, LogLevel.Warning, "Schedule {Schedule} skipped its run due at {DueUtc:u}: the previous run (job {JobId}) has not finished")]
    public static partial void ScheduleSkipped(ILogger log, string schedule, DateTimeOffset dueUtc, string jobId);

    [LoggerMessage(32, LogLevel.Error, "Schedule {Schedule} cannot run its plan now: {Problem}")]
    public static partial void ScheduleInvalid(ILogger log, string schedule, string problem);

    [LoggerMessage(33, LogLevel.Warning, "Run {RunId} on {Instruments} reached its time limit of {LimitSeconds} s; stopping it")]
    public static partial void TimeLimit(ILogger log, long? runId, string instruments, double limitSeconds);

    [LoggerMessage(40, LogLevel.Warning, "The status file {StatusFile} cannot be written: {Error}")]
    public static partial void StatusUnwritable(ILogger log, string statusFile, string error);

    [LoggerMessage(41, LogLevel.Warning, "The inbox {Inbox} cannot be read or a plan moved: {Error}")]
    public static partial void InboxTrouble(ILogger log, string inbox, string error);
}
