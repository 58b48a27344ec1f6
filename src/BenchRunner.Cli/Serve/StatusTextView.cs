using System.Globalization;
using BenchRunner.Daemon.Status;

namespace BenchRunner.Cli.Serve;

/// <summary>The daemon's status as a short text report for <c>benchrunner status</c>.</summary>
public static class StatusTextView
{
    /// <summary>Writes <paramref name="status"/>; <paramref name="verdict"/> says whether the daemon is alive.</summary>
    public static void Write(DaemonStatus status, string verdict, DateTimeOffset now, TextWriter writer)
    {
        writer.WriteLine($"Daemon   {verdict}");
        writer.WriteLine($"         process {status.ProcessId} on {status.Host}, started {Time(status.StartedUtc)}, status written {Ago(status.UpdatedUtc, now)}");
        writer.WriteLine($"Bench    {status.Bench}; results in {status.Database}; inbox {status.Inbox}");

        writer.WriteLine($"Running  {(status.Running.Count == 0 ? "nothing" : status.Running.Count.ToString(CultureInfo.InvariantCulture))}");
        foreach (var job in status.Running)
        {
            var attempt = job.Attempt > 1 ? $", attempt {job.Attempt}" : "";
            writer.WriteLine($"  {job.Job,-5} {job.Plan} ({job.Origin}) run {job.RunId?.ToString(CultureInfo.InvariantCulture) ?? "-"} on {string.Join(", ", job.Instruments)}, step {job.Step ?? "-"}, since {Ago(job.StartedUtc ?? job.QueuedUtc, now)}{attempt}");
        }

        writer.WriteLine($"Queued   {(status.Queue.Count == 0 ? "nothing" : status.Queue.Count.ToString(CultureInfo.InvariantCulture))}");
        foreach (var job in status.Queue)
        {
            writer.WriteLine($"  {job.Job,-5} {job.Plan} ({job.Origin}) needs {string.Join(", ", job.Instruments)}; waiting for {job.WaitingFor ?? "its turn"} since {Ago(job.QueuedUtc, now)}");
        }

        writer.WriteLine("Instruments");
        foreach (var instrument in status.Instruments)
        {
            var use = instrument.InUseBy is null ? "free" : $"in use by {instrument.InUseBy}";
            var fault = instrument.Health == "faulty"
                ? $"; {instrument.Faults} failed tries, next {(instrument.NextTryUtc is { } next ? Time(next) : "-")}: {instrument.LastFault}"
                : "";
            writer.WriteLine($"  {instrument.Name,-8} {instrument.Health,-8} {use} ({instrument.Connection}){fault}");
        }

        if (status.Schedules.Count > 0)
        {
            writer.WriteLine("Schedules");
            foreach (var schedule in status.Schedules)
            {
                var last = schedule.LastStartedUtc is { } started
                    ? $"last {Time(started)} {schedule.LastStatus ?? "running"}{(schedule.LastRunId is { } id ? $" (run {id})" : "")}"
                    : "not run yet";
                writer.WriteLine($"  {schedule.Name} every {schedule.EverySeconds.ToString("0.###", CultureInfo.InvariantCulture)} s: {last}; next {(schedule.NextDueUtc is { } due ? Time(due) : "-")}; {schedule.Skipped} skipped");
            }
        }

        if (status.Recent.Count > 0)
        {
            writer.WriteLine("Recent");
            foreach (var done in status.Recent.Take(10))
            {
                writer.WriteLine($"  {done.Job,-5} {done.Plan} ({done.Origin}) {done.Status}{(done.RunId is { } id ? $" run {id}" : "")} {Time(done.EndedUtc)}: {done.Summary}");
            }
        }
    }

    private static string Time(DateTimeOffset at) => at.UtcDateTime.ToString("yyyy-MM-dd HH:mm:ss'Z'", CultureInfo.InvariantCulture);

    private static string Ago(DateTimeOffset at, DateTimeOffset now)
    {
        var seconds = Math.Max(0, (now - at).TotalSeconds);
        return seconds < 120 ? $"{seconds:0} s ago" : seconds < 7200 ? $"{seconds / 60:0} min ago" : $"{seconds / 3600:0.#} h ago";
    }
}
