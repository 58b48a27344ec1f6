using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Daemon.Settings;

/// <summary>One schedule: run a plan every so often, each run held to a time limit.</summary>
/// <param name="Name">How logs and the status name the schedule.</param>
/// <param name="PlanPath">The plan file's full path; it is read again before every run, so edits take effect.</param>
/// <param name="Every">The time between due times. Due times keep their rhythm: a late start does not move the next one.</param>
/// <param name="TimeLimit">How long one run may take before it is stopped (as by the operator, keeping what it acquired).</param>
/// <param name="Location">Where the schedule was given (settings file line, or the command line).</param>
public sealed record ScheduleSettings(string Name, string PlanPath, TimeSpan Every, TimeSpan TimeLimit, SourceLocation Location);
