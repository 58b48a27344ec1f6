using System.Text.Json.Nodes;
using BenchRunner.Execution.Running;
using BenchRunner.Storage;
using BenchRunner.Core.Runs;

namespace BenchRunner.Cli.Run;

/// <summary>What the verbs that run a plan once say alike about its outcome: exit code, the head of the JSON document, and where to look at the stored run.</summary>
public static class RunOutcomeView
{
    /// <summary>The exit code for a run's status: 0 passed, 1 failed, 130 stopped, 3 otherwise (docs/cli.md).</summary>
    public static int ExitCode(RunStatus status) => status switch
    {
        RunStatus.Passed => ExitCodes.Success,
        RunStatus.Failed => ExitCodes.CheckFailed,
        RunStatus.Stopped => ExitCodes.Stopped,
        _ => ExitCodes.InstrumentFailure,
    };

    /// <summary>A JSON object starting with <c>run_id</c>, <c>database</c>, <c>status</c>, <c>passed</c> and <c>error</c>; the verb adds its own fields after them.</summary>
    public static JsonObject JsonHead(RunOutcome outcome, string db) => new()
    {
        ["run_id"] = outcome.RunId,
        ["database"] = db,
        ["status"] = outcome.Status.ToString().ToLowerInvariant(),
        ["passed"] = outcome.Status == RunStatus.Passed,
        ["error"] = outcome.Error,
    };

    /// <summary>The command that shows a stored run, in brackets: <c>(benchrunner results --db FILE --run ID)</c>.</summary>
    public static string ResultsHint(string db, long? runId) => $"(benchrunner results --db {db} --run {runId})";
}
