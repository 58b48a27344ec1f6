using System.Globalization;
using System.Text;
using BenchRunner.Core.Text;
using BenchRunner.Execution.Running;
using BenchRunner.Storage;
using BenchRunner.Core.Runs;

namespace BenchRunner.Daemon.Work;

/// <summary>
/// The short result summary written beside a finished plan (<c>name.yaml.result.txt</c>): one
/// <c>key: value</c> per line (readable as YAML), then one line per failed check.
/// </summary>
internal static class RunSummary
{
    /// <summary>The summary of <paramref name="outcome"/>.</summary>
    public static string Text(PlanJob job, RunOutcome outcome, string database, DateTimeOffset started, DateTimeOffset ended, int attempt, string? stopReason)
    {
        var text = new StringBuilder();
        Line(text, "plan", job.Plan.Name);
        Line(text, "status", StatusWord(outcome.Status));
        Line(text, "run", outcome.RunId?.ToString(CultureInfo.InvariantCulture) ?? "not recorded");
        Line(text, "database", database);
        Line(text, "instruments", string.Join(", ", job.Instruments));
        Line(text, "started", started.UtcDateTime.ToString("yyyy-MM-ddTHH:mm:ssZ", CultureInfo.InvariantCulture));
        Line(text, "ended", ended.UtcDateTime.ToString("yyyy-MM-ddTHH:mm:ssZ", CultureInfo.InvariantCulture));
        Line(text, "checks", $"{outcome.Checks.Count(c => c.Passed)} of {outcome.Checks.Count} passed");
        if (attempt > 1)
        {
            Line(text, "attempts", attempt.ToString(CultureInfo.InvariantCulture));
        }

        if (stopReason is not null && outcome.Status == RunStatus.Stopped)
        {
            Line(text, "stopped", stopReason);
        }
        else if (outcome.Error is not null)
        {
            Line(text, "error", outcome.Error);
        }

        var failed = outcome.Checks.Where(c => !c.Passed).ToList();
        if (failed.Count > 0)
        {
            text.Append("failed:\n");
            foreach (var check in failed)
            {
                text.Append("  - ").Append(Quote($"{check.Name}: {check.Detail}")).Append('\n');
            }
        }

        return text.ToString();
    }

    /// <summary>One line for the status file's recent list.</summary>
    public static string OneLine(RunOutcome outcome, string? stopReason) =>
        $"{outcome.Checks.Count(c => c.Passed)} of {Counted.Of(outcome.Checks.Count, "check")} passed"
        + (outcome.Status == RunStatus.Stopped && stopReason is not null ? $"; stopped: {stopReason}" : outcome.Error is null ? "" : $"; {outcome.Error}");

    /// <summary>The lower-case word of a run status, as stored.</summary>
    public static string StatusWord(RunStatus status) => status.ToString().ToLowerInvariant();

    private static void Line(StringBuilder text, string key, string value) => text.Append(key).Append(": ").Append(Quote(value)).Append('\n');

    // Quoted only where YAML would misread the text.
    private static string Quote(string value) =>
        value.IndexOfAny([':', '#', '"', '\'', '[', ']', '{', '}', ',', '&', '*', '!', '|', '>', '%', '@', '`']) >= 0 || value.StartsWith('-') || value.StartsWith(' ')
            ? "\"" + value.Replace("\\", "\\\\", StringComparison.Ordinal).Replace("\"", "\\\"", StringComparison.Ordinal).Replace("\n", " ", StringComparison.Ordinal) + "\""
            : value;
}
