using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Yaml;
using static BenchRunner.Daemon.Settings.SettingsFileKeys;

namespace BenchRunner.Daemon.Settings;

/// <summary>Reads the daemon's YAML settings file strictly, collecting every problem with its file:line:column.</summary>
internal static class SettingsFileReader
{
    /// <summary>Reads <paramref name="path"/>; the problems found are added to <paramref name="problems"/> and what could be read is returned.</summary>
    public static SettingsFileContent Read(string path, List<InputProblem> problems)
    {
        var content = new SettingsFileContent();
        var folder = Path.GetDirectoryName(path) ?? ".";
        YamlItem? root;
        try
        {
            root = YamlTreeReader.Read(InputFile.ReadAllText(path), path);
        }
        catch (InputFormatException e)
        {
            problems.AddRange(e.Problems);
            return content;
        }

        if (root is null)
        {
            // An empty settings file is allowed: everything is then a default or given elsewhere.
            return content;
        }

        var found = new YamlProblems(path);
        var map = StrictMap.Open(root, "the settings file", Top, found);
        if (map is not null)
        {
            foreach (var key in Simple)
            {
                if (map.Text(key) is { } text)
                {
                    // Bench and plan paths are taken from the settings file's folder, folders from the home folder.
                    content.Values[key] = new SettingValue(text.Value.Trim(), text.Location, key is Bench or Home ? folder : null);
                }
            }

            if (map.Mapping(Timing, TimingKeys) is { } timing)
            {
                content.Settle = Duration(timing, Settle, TimeSpan.Zero, TimeSpan.FromMinutes(10));
                content.ScanEvery = Duration(timing, ScanEvery, TimeSpan.FromMilliseconds(100), TimeSpan.FromMinutes(1));
                content.StopWithin = Duration(timing, StopWithin, TimeSpan.FromSeconds(1), TimeSpan.FromMinutes(10));
            }

            if (map.Mapping(InstrumentRetry, RetryKeys) is { } retry)
            {
                content.RetryFirst = Duration(retry, First, TimeSpan.FromMilliseconds(100), TimeSpan.FromHours(1));
                content.RetryLongest = Duration(retry, Longest, TimeSpan.FromMilliseconds(100), TimeSpan.FromHours(24));
                content.RunAttempts = retry.Integer(Runs, 1, 100);
                var first = content.RetryFirst ?? DaemonDefaults.RetryFirst;
                var longest = content.RetryLongest ?? DaemonDefaults.RetryLongest;
                if (longest < first)
                {
                    found.Add(retry.ValueLocation(retry.Has(Longest) ? Longest : First),
                        $"\"{Longest}\" ({longest}) must not be shorter than \"{First}\" ({first})");
                }
            }

            if (map.List(Schedules, "schedules (each with \"plan:\" and \"every:\")") is { } list)
            {
                foreach (var item in list.Items)
                {
                    ReadSchedule(item, folder, found, content);
                }
            }
        }

        try
        {
            found.ThrowIfAny();
        }
        catch (InputFormatException e)
        {
            problems.AddRange(e.Problems);
        }

        return content;
    }

    private static void ReadSchedule(YamlItem item, string folder, YamlProblems found, SettingsFileContent content)
    {
        var schedule = StrictMap.Open(item, "a schedule", ScheduleKeys, found);
        if (schedule is null)
        {
            return;
        }

        var name = schedule.Text(Name)?.Value.Trim();
        var plan = schedule.Text(Plan, "a schedule names the plan file it runs, e.g. \"plan: plans/reference-filter.yaml\"");
        var every = Duration(schedule, Every, TimeSpan.FromSeconds(1), TimeSpan.FromDays(31), "a schedule says how often it runs, e.g. \"every: 1 h\"");
        var limit = Duration(schedule, TimeLimit, TimeSpan.FromSeconds(1), TimeSpan.FromDays(31));
        if (plan is not null && every is { } interval)
        {
            content.Schedules.Add((name, new SettingValue(plan.Value.Trim(), plan.Location, folder), interval, limit, schedule.Map.Location));
        }
    }

    private static TimeSpan? Duration(StrictMap map, string key, TimeSpan min, TimeSpan max, string? missingHint = null)
    {
        if (map.Parsed(key, DurationText.Parse, missingHint) is not { } value)
        {
            return null;
        }

        if (value < min || value > max)
        {
            map.Problems.Add(map.ValueLocation(key), $"\"{key}\" must be from {Words(min)} to {Words(max)}, found {Words(value)}");
            return null;
        }

        return value;
    }

    /// <summary>A duration in words for messages: <c>250 ms</c>, <c>20 s</c>, <c>5 min</c>, <c>2 h</c>.</summary>
    internal static string Words(TimeSpan span) => span switch
    {
        { TotalSeconds: < 1 } => $"{span.TotalMilliseconds:0.###} ms",
        { TotalMinutes: < 1 } => $"{span.TotalSeconds:0.###} s",
        { TotalHours: < 1 } => $"{span.TotalMinutes:0.###} min",
        _ => $"{span.TotalHours:0.###} h",
    };
}
