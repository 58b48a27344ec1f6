using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Execution.Bench;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Validation;
using Microsoft.Extensions.Logging;
using static BenchRunner.Daemon.Settings.SettingsFileKeys;

namespace BenchRunner.Daemon.Settings;

/// <summary>
/// Builds the daemon's settings from three sources, each overriding the one before: the settings
/// file (YAML, docs/daemon.md), environment variables (<c>BENCHRUNNER_HOME</c>, <c>BENCHRUNNER_BENCH</c>...)
/// and the command line. Then checks them all before anything starts: the bench file and every
/// scheduled plan are read and checked against each other, and the folders are created. Every
/// problem of every source is reported together, each naming where it was given.
/// </summary>
public static class DaemonSettingsLoader
{
    /// <summary>The environment variables read, by the setting they give.</summary>
    public static IReadOnlyList<(string Key, string Variable)> Variables { get; } =
    [
        (Home, "BENCHRUNNER_HOME"), (Bench, "BENCHRUNNER_BENCH"), (Database, "BENCHRUNNER_DATABASE"),
        (InboxKey, "BENCHRUNNER_INBOX"), (Logs, "BENCHRUNNER_LOGS"), (State, "BENCHRUNNER_STATE"), (LogLevelKey, "BENCHRUNNER_LOG_LEVEL"),
    ];

    private static readonly (string Word, LogLevel Value)[] LevelWords =
        [("debug", LogLevel.Debug), ("information", LogLevel.Information),
         ("warning", LogLevel.Warning), ("error", LogLevel.Error)];

    /// <summary>Reads and checks the settings.</summary>
    /// <param name="commandLine">What the command line gave.</param>
    /// <param name="environment">The environment variables (name to value).</param>
    /// <param name="currentFolder">The folder relative paths of the command line and environment are taken from.</param>
    /// <exception cref="InputFormatException">Every problem found, each with where it was given.</exception>
    public static DaemonSettings Load(CommandLineSettings commandLine, IReadOnlyDictionary<string, string> environment, string currentFolder)
    {
        ArgumentNullException.ThrowIfNull(commandLine);
        ArgumentNullException.ThrowIfNull(environment);
        var problems = new List<InputProblem>();

        var settingsFile = commandLine.SettingsFile ?? Variable(environment, DaemonDefaults.SettingsVariable);
        string? settingsPath = settingsFile is null ? null : Path.GetFullPath(settingsFile, currentFolder);
        var file = settingsPath is null ? new SettingsFileContent() : SettingsFileReader.Read(settingsPath, problems);

        var values = new Dictionary<string, SettingValue>(file.Values, StringComparer.Ordinal);
        foreach (var (key, variable) in Variables)
        {
            if (Variable(environment, variable) is { } text)
            {
                values[key] = new SettingValue(text, SourceLocation.OfFile($"environment {variable}"), currentFolder);
            }
        }

        Given(values, Home, commandLine.Home, "--home", currentFolder);
        Given(values, Bench, commandLine.Bench, "--bench", currentFolder);
        Given(values, Database, commandLine.Database, "--db", currentFolder);
        Given(values, InboxKey, commandLine.Inbox, "--inbox", currentFolder);
        Given(values, Logs, commandLine.Logs, "--logs", currentFolder);
        Given(values, State, commandLine.State, "--state", currentFolder);
        Given(values, LogLevelKey, commandLine.LogLevel, "--log-level", currentFolder);

        var home = values.TryGetValue(Home, out var h)
            ? Path.GetFullPath(h.Text, h.BaseFolder ?? currentFolder)
            : Path.GetDirectoryName(settingsPath) ?? Path.GetFullPath(currentFolder);
        var homeAt = values.TryGetValue(Home, out var hv) ? hv.At : SourceLocation.OfFile($"home folder {home}");
        Prepare(home, homeAt, problems);

        string PathOf(string key, string fallback) =>
            values.TryGetValue(key, out var v) ? Path.GetFullPath(v.Text, v.BaseFolder ?? home) : Path.Combine(home, fallback);
        SourceLocation AtOf(string key) => values.TryGetValue(key, out var v) ? v.At : homeAt;

        var folders = new[] { (InboxKey, DaemonDefaults.Inbox), (Done, DaemonDefaults.Done), (Rejected, DaemonDefaults.Rejected), (Logs, DaemonDefaults.Logs), (State, DaemonDefaults.State) }
            .ToDictionary(f => f.Item1, f => PathOf(f.Item1, f.Item2), StringComparer.Ordinal);
        foreach (var (key, folder) in folders)
        {
            Prepare(folder, AtOf(key), problems);
        }

        CheckDistinct(folders, AtOf, problems);
        var database = PathOf(Database, DaemonDefaults.Database);
        if (Directory.Exists(database))
        {
            problems.Add(new(AtOf(Database), $"the result database {database} is a folder; expected a file name such as \"results.db\""));
        }
        else if (Path.GetDirectoryName(database) is { } dbFolder)
        {
            Prepare(dbFolder, AtOf(Database), problems);
        }

        var level = LogLevel.Information;
        if (values.TryGetValue(LogLevelKey, out var lv))
        {
            var match = LevelWords.FirstOrDefault(w => w.Word.Equals(lv.Text.Trim(), StringComparison.OrdinalIgnoreCase));
            if (match.Word is null)
            {
                problems.Add(new(lv.At, $"unknown log level \"{lv.Text}\"; expected one of {string.Join(", ", LevelWords.Select(w => w.Word))}"));
            }
            else
            {
                level = match.Value;
            }
        }

        var bench = LoadBench(values, settingsPath, problems, out var benchPath);
        var schedules = ReadSchedules(file, commandLine, currentFolder, bench, problems);

        if (problems.Count > 0)
        {
            throw new InputFormatException(problems);
        }

        return new DaemonSettings
        {
            SettingsFile = settingsPath,
            Home = home,
            BenchPath = benchPath!,
            DatabasePath = database,
            InboxFolder = folders[InboxKey],
            DoneFolder = folders[Done],
            RejectedFolder = folders[Rejected],
            LogFolder = folders[Logs],
            StateFolder = folders[State],
            LogLevel = level,
            Settle = file.Settle ?? DaemonDefaults.Settle,
            ScanEvery = file.ScanEvery ?? DaemonDefaults.ScanEvery,
            StopWithin = file.StopWithin ?? DaemonDefaults.StopWithin,
            RetryFirst = file.RetryFirst ?? DaemonDefaults.RetryFirst,
            RetryLongest = file.RetryLongest ?? DaemonDefaults.RetryLongest,
            RunAttempts = file.RunAttempts ?? DaemonDefaults.RunAttempts,
            Schedules = schedules,
        };
    }

    private static string? Variable(IReadOnlyDictionary<string, string> environment, string name) =>
        environment.TryGetValue(name, out var value) && !string.IsNullOrWhiteSpace(value) ? value.Trim() : null;

    private static void Given(Dictionary<string, SettingValue> values, string key, string? text, string option, string currentFolder)
    {
        if (!string.IsNullOrWhiteSpace(text))
        {
            values[key] = new SettingValue(text.Trim(), SourceLocation.OfFile($"command line {option}"), currentFolder);
        }
    }

    private static void Prepare(string folder, SourceLocation at, List<InputProblem> problems)
    {
        try
        {
            if (File.Exists(folder))
            {
                problems.Add(new(at, $"{folder} is a file; expected a folder"));
                return;
            }

            Directory.CreateDirectory(folder);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            problems.Add(new(at, $"the folder {folder} cannot be created: {e.Message}"));
        }
    }

    private static void CheckDistinct(Dictionary<string, string> folders, Func<string, SourceLocation> atOf, List<InputProblem> problems)
    {
        // The inbox, done and rejected folders must differ, or a finished plan would be taken again.
        var watched = new[] { InboxKey, Done, Rejected };
        for (int i = 0; i < watched.Length; i++)
        {
            for (int j = i + 1; j < watched.Length; j++)
            {
                if (string.Equals(folders[watched[i]], folders[watched[j]], StringComparison.Ordinal))
                {
                    problems.Add(new(atOf(watched[j]), $"the {watched[j]} folder is the {watched[i]} folder ({folders[watched[i]]}); give each its own folder"));
                }
            }
        }
    }

    private static BenchDefinition? LoadBench(Dictionary<string, SettingValue> values, string? settingsPath, List<InputProblem> problems, out string? benchPath)
    {
        benchPath = null;
        if (!values.TryGetValue(Bench, out var given))
        {
            var at = settingsPath is null ? SourceLocation.OfFile("command line") : SourceLocation.OfFile(settingsPath);
            problems.Add(new(at, "no bench file given; name one with \"bench:\" in the settings file, BENCHRUNNER_BENCH or --bench (docs/examples/bench-virtual.yaml is the virtual bench)"));
            return null;
        }

        benchPath = Path.GetFullPath(given.Text, given.BaseFolder ?? ".");
        try
        {
            return BenchFile.Load(benchPath);
        }
        catch (InputFormatException e)
        {
            problems.Add(new(given.At, $"the bench file {benchPath} cannot be used:"));
            problems.AddRange(e.Problems);
            return null;
        }
    }

    private static List<ScheduleSettings> ReadSchedules(SettingsFileContent file, CommandLineSettings commandLine, string currentFolder,
        BenchDefinition? bench, List<InputProblem> problems)
    {
        var given = new List<(string? Name, SettingValue Plan, TimeSpan Every, TimeSpan? TimeLimit, SourceLocation At)>(file.Schedules);
        foreach (var text in commandLine.Schedules)
        {
            var at = SourceLocation.OfFile($"command line --schedule {text}");
            var split = text.IndexOf('=', StringComparison.Ordinal);
            var every = split > 0 ? DurationText.Parse(text[..split]) : default;
            if (split <= 0 || split == text.Length - 1)
            {
                problems.Add(new(at, "expected EVERY=PLAN, e.g. \"1h=plans/reference-filter.yaml\""));
            }
            else if (!every.Success)
            {
                problems.Add(new(at, every.Error));
            }
            else if (every.Value < TimeSpan.FromSeconds(1))
            {
                problems.Add(new(at, "a schedule must run at most once a second"));
            }
            else
            {
                given.Add((null, new SettingValue(text[(split + 1)..].Trim(), at, currentFolder), every.Value, null, at));
            }
        }

        var schedules = new List<ScheduleSettings>();
        var names = new HashSet<string>(StringComparer.Ordinal);
        foreach (var (name, plan, every, limit, at) in given)
        {
            var planPath = Path.GetFullPath(plan.Text, plan.BaseFolder ?? currentFolder);
            var scheduleName = name ?? Path.GetFileNameWithoutExtension(planPath);
            if (!names.Add(scheduleName))
            {
                problems.Add(new(at, $"a second schedule named \"{scheduleName}\"; give each schedule its own \"name:\""));
                continue;
            }

            try
            {
                var loaded = PlanFile.Load(planPath);
                if (bench is not null && PlanValidator.CheckAgainstBench(loaded, bench) is { Count: > 0 } mismatch)
                {
                    problems.AddRange(mismatch);
                    continue;
                }
            }
            catch (InputFormatException e)
            {
                problems.Add(new(plan.At, $"the scheduled plan {planPath} cannot be used:"));
                problems.AddRange(e.Problems);
                continue;
            }

            schedules.Add(new ScheduleSettings(scheduleName, planPath, every, limit ?? every, at));
        }

        return schedules;
    }
}
